import cluster from 'node:cluster';
import { availableParallelism } from 'node:os';
import { loadConfig } from './config';
import { createDb } from './db/knex';
import { createApp } from './app';

/**
 * Starts the app. In production, one stateless web process per core, up to four
 * (WEB_CONCURRENCY sets the number), sharing the port through node:cluster, and one jobs
 * process that refreshes stored cost roll-ups and sends mail: a roll-up of a large BOM takes
 * a few hundred milliseconds of CPU, which in a web process would hold up every request
 * queued behind it. Nothing lives in a process, so any web process answers any request, as
 * separate machines would. A single process (development, tests) does both.
 */
const config = loadConfig();
// At most four by default: each process opens up to 19 PostgreSQL connections (pools of
// 10 for queries, 5 for sessions, 4 for jobs), and PostgreSQL's own default is 100; four
// web processes and the jobs process make 95.
const processes = config.WEB_CONCURRENCY ?? (config.NODE_ENV === 'production' ? Math.min(availableParallelism(), 4) : 1);

// PROCESS_ROLE set by hand: `web` runs that many web processes and no jobs process (the
// jobs run elsewhere); `jobs` runs one jobs process. Unset, several processes split as above.
const askedRole = process.env.PROCESS_ROLE;
if (processes > 1 && askedRole !== 'jobs' && cluster.isPrimary) runPrimary(processes, askedRole === 'web' ? 0 : 1);
else runServer();

function runServer() {
  const db = createDb(config.DATABASE_URL);
  const { app, deps, ready, close } = createApp({ db, config });

  const server =
    config.PROCESS_ROLE === 'jobs'
      ? null
      : app.listen(config.PORT, config.HOST, () => {
          deps.logger.info({ url: config.PUBLIC_URL, port: config.PORT, pid: process.pid }, 'Farthing is listening');
          process.send?.({ ready: true, port: config.PORT });
        });
  if (!server) {
    // A jobs process that cannot start its workers exits, so that it is replaced (or, at
    // start-up, so that everything stops) rather than lingering with no job taken.
    void ready.then(
      () => {
        deps.logger.info({ pid: process.pid }, 'Farthing background jobs are running');
        process.send?.({ ready: true, jobs: true });
      },
      (err) => {
        deps.logger.error({ err }, 'background jobs did not start');
        process.exit(1);
      },
    );
  }

  let stopping = false;
  async function stop(signal: string) {
    if (stopping) return;
    stopping = true;
    deps.logger.info({ signal }, 'stopping');
    server?.close();
    server?.closeAllConnections();
    await close().catch(() => undefined);
    await db.destroy().catch(() => undefined);
    process.exit(0);
  }
  process.on('SIGINT', () => void stop('SIGINT'));
  process.on('SIGTERM', () => void stop('SIGTERM'));
  // A lost database connection must never take the process down; requests answer 503 meanwhile.
  process.on('unhandledRejection', (err) => deps.logger.error({ err }, 'unhandled rejection'));
}

/** Forks the processes, says ready when all are up, replaces one that dies, and stops them all. */
function runPrimary(n: number, jobsProcesses: number) {
  let up = 0;
  let port: number | undefined;
  let stopping = false;
  let deaths: number[] = [];
  const log = (s: string) => config.LOG_LEVEL !== 'silent' && console.error(`[farthing] ${s}`);
  const roles = new Map<number, 'web' | 'jobs'>();
  const fork = (role: 'web' | 'jobs') => roles.set(cluster.fork({ PROCESS_ROLE: role }).id, role);
  for (let i = 0; i < n; i++) fork('web');
  for (let i = 0; i < jobsProcesses; i++) fork('jobs');
  const total = n + jobsProcesses;
  cluster.on('message', (_worker, message: { ready?: boolean; port?: number }) => {
    if (!message?.ready) return;
    port ??= message.port;
    if (++up === total) process.send?.({ ready: true, port, processes: n, jobsProcesses });
  });
  cluster.on('exit', (worker, code, signal) => {
    if (stopping) return;
    // One that dies before all are up is a start-up fault (a bad setting, a taken port): stop.
    if (up < total) {
      log(`a server process exited (${signal ?? code}) while starting`);
      void stop(1);
      return;
    }
    // Replaced at once, but not in a loop: more than five deaths in a minute stop it all.
    const now = Date.now();
    deaths = deaths.filter((t) => now - t < 60_000).concat(now);
    if (deaths.length > 5) {
      log('server processes keep dying; stopping');
      void stop(1);
      return;
    }
    const role = roles.get(worker.id) ?? 'web';
    roles.delete(worker.id);
    log(`${role === 'jobs' ? 'jobs' : 'server'} process ${worker.process.pid} exited (${signal ?? code}); starting another`);
    fork(role);
  });
  async function stop(code = 0) {
    if (stopping) return;
    stopping = true;
    const workers = Object.values(cluster.workers ?? {}).filter((w) => w !== undefined);
    for (const w of workers) if (!w.isDead()) w.process.kill('SIGTERM');
    await Promise.all(workers.map((w) => (w.isDead() ? null : new Promise((r) => w.once('exit', r)))));
    process.exit(code);
  }
  process.on('SIGINT', () => void stop());
  process.on('SIGTERM', () => void stop());
}
