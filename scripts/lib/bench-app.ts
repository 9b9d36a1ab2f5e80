/**
 * The app as `npm start` runs it (NODE_ENV=production, one process per core unless told),
 * on a fresh database in the private test cluster with the demo workspace, its own mail
 * sink and S3 fake: what `bench:load` and `bench:grid` drive.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { prepareDatabase } from './database';
import { createDb, type Db } from '../../server/db/knex';
import { migrateLatest, seedConfig } from '../../server/db/migrate';
import { startMailSink } from '../../server/mail/sink';
import { startS3Fake } from '../../server/files/s3-fake';
import { demoPassword } from '../../seeds/01_demo_workspace';

export interface BenchApp {
  base: string;
  server: ChildProcess;
  /** Signs in a demo member; the session cookie as a `name=value` pair. */
  signIn(email: string): Promise<string>;
  /** Resident memory of the server's processes together, in MB. */
  rssMb(): number;
  /** The same, process by process, by role (the primary, then `web` and `jobs`). */
  rssByRoleMb(): Record<string, number[]>;
  processes(): number;
  stop(): Promise<void>;
}

/**
 * Makes `database` afresh with the demo data, lets `prepare` add to it, then starts the
 * server on it. Should the calling script die or fail at any point, the server and the
 * cluster go too.
 */
export async function startBenchApp(opts: { database: string; port: number; env?: Record<string, string>; prepare?: (db: Db) => Promise<void> }): Promise<BenchApp> {
  const cluster = prepareDatabase({ folder: 'pg-test', port: Number(process.env.FARTHING_TEST_PG_PORT ?? 54339), database: 'postgres', log: (s) => console.error(s) });
  const running: { server?: ChildProcess } = {};
  process.once('exit', () => {
    running.server?.kill('SIGKILL');
    cluster.stop();
  });
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGPIPE'] as const) process.once(signal, () => process.exit(130));
  const admin = createDb(cluster.url);
  await admin.raw(`DROP DATABASE IF EXISTS ${opts.database} WITH (FORCE)`);
  await admin.raw(`CREATE DATABASE ${opts.database}`);
  await admin.destroy();
  const url = cluster.url.replace(/\/[^/]*$/, `/${opts.database}`);
  const db = createDb(url);
  try {
    await migrateLatest(db);
    await db.seed.run(seedConfig);
    await opts.prepare?.(db);
    // Planner statistics as autovacuum would have them on a live database: otherwise its
    // analyze of the new rows lands in the middle of a measured run.
    await db.raw('ANALYZE');
  } finally {
    await db.destroy();
  }

  const base = `http://127.0.0.1:${opts.port}`;
  const sink = await startMailSink();
  const s3 = await startS3Fake({ directory: `.data/s3-${opts.database}`, bucket: 'farthing' });
  // LOAD_NODE_ARGS, e.g. "--cpu-prof --cpu-prof-dir=.data/profiles", profiles the server.
  const nodeArgs = (process.env.LOAD_NODE_ARGS ?? '').split(' ').filter(Boolean);
  const child = spawn(process.execPath, [...nodeArgs, '--import', 'tsx', 'server/index.ts'], {
    env: {
      ...process.env, NODE_ENV: 'production', DATABASE_URL: url, PORT: String(opts.port), PUBLIC_URL: base, SESSION_SECRET: 'bench-secret-0123456789',
      SMTP_PORT: String(sink.smtpPort), S3_ENDPOINT: `http://127.0.0.1:${s3.port}`, SERVE_CLIENT: 'false', LOG_LEVEL: 'error', RATE_LIMIT_AUTH_PER_MINUTE: '1000', ...opts.env,
    },
    stdio: ['ignore', 'inherit', 'inherit', 'ipc'],
  });
  running.server = child;
  await new Promise<void>((resolve, reject) => {
    child.once('message', () => resolve());
    child.once('exit', (c) => reject(new Error(`server exited ${c}`)));
  });

  const rssOf = (pid: number) => Number(/VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'))![1]) / 1024;
  const childrenOf = (pid: number) => readFileSync(`/proc/${pid}/task/${pid}/children`, 'utf8').split(' ').filter(Boolean).map(Number);
  return {
    base,
    server: child,
    signIn: async (email) => {
      const login = await fetch(`${base}/api/auth/login`, {
        method: 'POST', headers: { 'content-type': 'application/json', 'x-requested-with': 'farthing' }, body: JSON.stringify({ email, password: demoPassword }),
      });
      if (login.status !== 200) throw new Error(`sign-in as ${email} answered ${login.status}`);
      return (login.headers.get('set-cookie') ?? '').split(';')[0];
    },
    rssMb: () => [child.pid!, ...childrenOf(child.pid!)].reduce((mb, pid) => mb + rssOf(pid), 0),
    rssByRoleMb: () => {
      // A single process (WEB_CONCURRENCY=1) does everything and is listed as the primary.
      const out: Record<string, number[]> = { primary: [Math.round(rssOf(child.pid!))] };
      for (const pid of childrenOf(child.pid!)) {
        try {
          const role = /(?:^|\0)PROCESS_ROLE=(\w+)/.exec(readFileSync(`/proc/${pid}/environ`, 'utf8'))?.[1] ?? 'all';
          (out[role] ??= []).push(Math.round(rssOf(pid)));
        } catch {
          // A process replaced while it was read: left out.
        }
      }
      return out;
    },
    processes: () => childrenOf(child.pid!).length || 1,
    stop: async () => {
      if (child.exitCode === null && child.signalCode === null) {
        const exited = new Promise((r) => child.once('exit', r));
        child.kill('SIGTERM');
        await exited;
      }
      await sink.close();
      await s3.close();
      cluster.stop();
    },
  };
}
