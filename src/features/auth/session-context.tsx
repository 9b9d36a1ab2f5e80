import { createContext, useContext, type ReactNode } from 'react';
import type { Session } from './api';

const SessionContext = createContext<Session | null>(null);

/** Seats the signed-in session for every screen inside the app shell. */
export function SessionProvider({ session, children }: { session: Session; children: ReactNode }) {
  return <SessionContext.Provider value={session}>{children}</SessionContext.Provider>;
}

/** The signed-in session; only screens inside the app shell may ask. */
export function useSession(): Session {
  const session = useContext(SessionContext);
  if (!session) throw new Error('useSession is used outside the signed-in app shell');
  return session;
}
