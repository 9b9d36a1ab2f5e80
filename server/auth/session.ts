import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import pg from 'pg';
import type { Knex } from 'knex';
import type { Logger } from 'pino';
import type { Request } from 'express';
import type { Role } from '../../src/shared/schemas/common';
import type { Config } from '../config';
import { usersRepo } from './repository';
import { verifyPassword, dummyHash } from './passwords';

const PgStore = connectPgSimple(session);

/** A session's expiry is written back at most this often (sessions last 14 days). */
const TOUCH_EVERY_MS = 10 * 60 * 1000;

const MEMBERSHIP = Symbol('membership read with the session');

/** The signed-in user's role in the session's workspace, as read with the session. */
export interface SessionMembership {
  userId: string;
  workspaceId: string;
  /** Null when the user is no longer a member of that workspace. */
  role: Role | null;
}

/** The membership read in the same statement as this request's session, if it was. */
export const membershipReadWithSession = (req: Request): SessionMembership | undefined => (req as Request & { [MEMBERSHIP]?: SessionMembership })[MEMBERSHIP];

// Ids are bigints written as text in the session; anything else matches no membership.
const idIn = (path: string) => `CASE WHEN ${path} ~ '^[0-9]{1,18}$' THEN (${path})::bigint END`;
const SESSION_WITH_MEMBERSHIP = `
  SELECT s.sess, m.role FROM session s
    LEFT JOIN memberships m ON m.user_id = ${idIn("s.sess -> 'passport' ->> 'user'")} AND m.workspace_id = ${idIn("s.sess ->> 'workspaceId'")}
   WHERE s.sid = $1 AND s.expire >= to_timestamp($2)`;

/**
 * The PostgreSQL store, with two savings on every request:
 * - The session is read with the user's role in its workspace in one statement (the role
 *   is still read on every request, so a change applies at once).
 * - A session's new expiry is written at most every ten minutes, not on every request:
 *   express-session touches the store each time and holds the response until the UPDATE
 *   commits. Each server remembers only when it last wrote which session; forgetting (a
 *   restart, another server) just means one more write.
 */
class SessionStore extends PgStore {
  private touched = new Map<string, number>();

  constructor(
    private readonly pool: pg.Pool,
    options: ConstructorParameters<typeof PgStore>[0],
  ) {
    super({ ...options, pool });
  }

  override get(sid: string, fn: (err: unknown, sess?: session.SessionData | null) => void) {
    this.pool.query(SESSION_WITH_MEMBERSHIP, [sid, Math.ceil(Date.now() / 1000)]).then(
      ({ rows }) => {
        const row = rows[0] as { sess: session.SessionData & { passport?: { user?: unknown }; workspaceId?: unknown }; role: Role | null } | undefined;
        if (!row) return fn(null, null);
        const { sess } = row;
        if (sess.passport?.user !== undefined && sess.workspaceId !== undefined) {
          const membership: SessionMembership = { userId: String(sess.passport.user), workspaceId: String(sess.workspaceId), role: row.role };
          Object.defineProperty(sess, MEMBERSHIP, { value: membership, enumerable: false });
        }
        fn(null, sess);
      },
      (err: unknown) => fn(err),
    );
  }

  override createSession(req: Request, sess: session.SessionData): session.Session & Partial<session.SessionData> {
    const membership = (sess as session.SessionData & { [MEMBERSHIP]?: SessionMembership })[MEMBERSHIP];
    const created = super.createSession(req, sess);
    if (membership) (req as Request & { [MEMBERSHIP]?: SessionMembership })[MEMBERSHIP] = membership;
    return created;
  }

  private remember(sid: string) {
    if (this.touched.size >= 100_000) this.touched.clear();
    this.touched.set(sid, Date.now());
  }

  override set(sid: string, sess: session.SessionData, fn?: (err?: unknown) => void) {
    this.remember(sid);
    super.set(sid, sess, fn);
  }

  override touch(sid: string, sess: session.SessionData, fn?: (err?: unknown) => void) {
    const last = this.touched.get(sid);
    if (last !== undefined && Date.now() - last < TOUCH_EVERY_MS) return fn?.();
    this.remember(sid);
    super.touch(sid, sess, fn);
  }

  override destroy(sid: string, fn?: (err?: unknown) => void) {
    this.touched.delete(sid);
    super.destroy(sid, fn);
  }
}

/** Sessions live in PostgreSQL so any app server can serve any request. */
export function createSessionMiddleware(config: Config, logger: Logger) {
  const pool = new pg.Pool({ connectionString: config.DATABASE_URL, max: 5, connectionTimeoutMillis: 5000 });
  // An idle client that loses its server (the database restarted) must not crash the process.
  pool.on('error', () => undefined);
  const store = new SessionStore(pool, {
    tableName: 'session',
    pruneSessionInterval: config.NODE_ENV === 'test' ? false : 15 * 60,
    errorLog: (...args: unknown[]) => logger.warn({ detail: args.map(String).join(' ') }, 'session store error'),
  });
  const secure = config.PUBLIC_URL.startsWith('https://');
  const middleware = session({
    name: 'farthing.sid',
    store,
    secret: config.SESSION_SECRET,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: secure,
    cookie: { httpOnly: true, sameSite: 'lax', secure, maxAge: 14 * 24 * 3600 * 1000 },
  });
  return {
    middleware,
    close: async () => {
      store.close();
      // connect-pg-simple may already have ended the pool it was handed.
      if (!(pool as pg.Pool & { ended?: boolean }).ended) await pool.end();
    },
  };
}

/** passport-local with the e-mail as user name; the session keeps only the user id. */
export function configurePassport(db: Knex): passport.PassportStatic {
  const instance = new passport.Passport() as unknown as passport.PassportStatic;
  instance.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      usersRepo
        .byEmail(db, email.trim().toLowerCase())
        .then(async (user) => {
          // Compare against a dummy hash for unknown e-mails so the timing does not tell.
          const ok = await verifyPassword(password, user?.passwordHash ?? dummyHash);
          done(null, user && ok ? { id: user.id } : false);
        })
        .catch(done);
    }),
  );
  instance.serializeUser((user, done) => done(null, (user as { id: string }).id));
  instance.deserializeUser((id: string, done) => done(null, { id }));
  return instance;
}
