import { Suspense } from 'react';
import { Navigate, Outlet, useNavigate } from 'react-router-dom';
import { useSuspenseQuery } from '@tanstack/react-query';
import { AppLayout } from '../../components/layouts/app-layout';
import { LoadingState } from '../../components/ui/loading-state';
import { roleLabels } from '../../lib/roles';
import { meQueryOptions } from '../../features/auth/api';
import { SessionProvider } from '../../features/auth/session-context';
import { SignOutButton } from '../../features/auth/components/sign-out-button';
import { WorkspaceSwitcher } from '../../features/auth/components/workspace-switcher';

/** Every signed-in screen sits in here; losing the session anywhere leads to sign-in. */
export function AppShell() {
  const { data: session } = useSuspenseQuery(meQueryOptions());
  const navigate = useNavigate();

  if (!session) return <Navigate to="/signin" replace />;

  return (
    <SessionProvider session={session}>
      <AppLayout
        role={session.role}
        account={
          <>
            <WorkspaceSwitcher session={session} />
            <p className="text-sm">
              <span className="font-medium text-ink">{session.user.name}</span>
              <span className="text-muted"> · {roleLabels[session.role]}</span>
            </p>
            <SignOutButton onSignedOut={() => navigate('/signin', { replace: true })} />
          </>
        }
      >
        <Suspense fallback={<LoadingState />}>
          <Outlet />
        </Suspense>
      </AppLayout>
    </SessionProvider>
  );
}
