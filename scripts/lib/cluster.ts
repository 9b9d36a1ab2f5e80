/**
 * A private PostgreSQL cluster for development and tests: Debian's server binaries,
 * a data folder inside the project (git-ignored), 127.0.0.1 only, its own port.
 * initdb refuses to run as root, so as root every server command runs as `postgres`.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, chmodSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, resolve } from 'node:path';

export interface Cluster {
  dataDir: string;
  port: number;
  adminUrl: (database?: string) => string;
  started: boolean; // true when this call started it (so the caller should stop it)
}

const isRoot = process.getuid?.() === 0;

export function findPgBin(): string | null {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return null;
  const versions = readdirSync(base)
    .filter((v) => existsSync(`${base}/${v}/bin/initdb`))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length ? `${base}/${versions[0]}/bin` : null;
}

/** Makes sure server binaries exist: installs Debian's package as root, else explains. */
export function ensurePgBinaries(log: (s: string) => void): string {
  let bin = findPgBin();
  if (bin) return bin;
  if (!isRoot) {
    throw new Error(
      'PostgreSQL server binaries are missing. Install them with:\n  sudo apt-get install -y postgresql\nthen run the command again (or set DATABASE_URL to a server of your own).',
    );
  }
  log('Installing PostgreSQL (apt-get install postgresql)…');
  run('apt-get', ['update', '-qq']);
  run('apt-get', ['install', '-y', '-qq', 'postgresql'], { DEBIAN_FRONTEND: 'noninteractive' });
  bin = findPgBin();
  if (!bin) throw new Error('apt-get installed postgresql but no server binaries were found');
  return bin;
}

function run(cmd: string, args: string[], env: Record<string, string> = {}): string {
  const r = spawnSync(cmd, args, { encoding: 'utf8', env: { ...process.env, ...env } });
  if (r.status !== 0) {
    throw new Error(`${cmd} ${args.join(' ')} failed (${r.status}):\n${r.stderr || r.stdout}`);
  }
  return r.stdout;
}

function asServerUser(bin: string, args: string[]): string {
  return isRoot ? run('runuser', ['-u', 'postgres', '--', bin, ...args]) : run(bin, args);
}

/** Every parent folder must be traversable by the server's OS user. */
function makeTraversable(dir: string): void {
  if (!isRoot) return;
  let d = resolve(dir);
  while (d !== '/') {
    try {
      chmodSync(d, (statSync(d).mode & 0o7777) | 0o001);
    } catch {
      /* best effort: a folder we cannot change is reported by initdb itself */
    }
    d = dirname(d);
  }
}

export function isRunning(dataDir: string): boolean {
  const pidFile = `${dataDir}/postmaster.pid`;
  if (!existsSync(pidFile)) return false;
  const pid = Number(readFileSync(pidFile, 'utf8').split('\n')[0]);
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

export function startCluster(opts: { dataDir: string; port: number; log: (s: string) => void }): Cluster {
  const { dataDir, port, log } = opts;
  const bin = ensurePgBinaries(log);
  const adminUrl = (database = 'postgres') => `postgres://postgres@127.0.0.1:${port}/${database}`;
  if (isRunning(dataDir)) return { dataDir, port, adminUrl, started: false };

  if (!existsSync(`${dataDir}/PG_VERSION`)) {
    log(`Creating a private PostgreSQL cluster in ${dataDir}…`);
    mkdirSync(dataDir, { recursive: true });
    chmodSync(dataDir, 0o700);
    makeTraversable(dirname(dataDir));
    if (isRoot) run('chown', ['-R', 'postgres:postgres', dataDir]);
    asServerUser(`${bin}/initdb`, ['-D', dataDir, '-U', 'postgres', '-A', 'trust', '-E', 'UTF8', '--locale=C.UTF-8', '-N']);
  } else if (isRoot) {
    makeTraversable(dirname(dataDir));
  }
  // The socket goes in /tmp (a short path); TCP listens on loopback only.
  asServerUser(`${bin}/pg_ctl`, [
    '-D', dataDir, '-l', `${dataDir}/server.log`, '-w', '-t', '30',
    '-o', `-p ${port} -c listen_addresses=127.0.0.1 -k /tmp -c fsync=off -c max_connections=200`,
    'start',
  ]);
  run(`${bin}/pg_isready`, ['-h', '127.0.0.1', '-p', String(port), '-t', '10']);
  return { dataDir, port, adminUrl, started: true };
}

export function stopCluster(dataDir: string): void {
  const bin = findPgBin();
  if (!bin || !isRunning(dataDir)) return;
  asServerUser(`${bin}/pg_ctl`, ['-D', dataDir, '-m', 'fast', '-w', 'stop']);
}

export function createDatabase(cluster: Cluster, name: string): boolean {
  const bin = findPgBin()!;
  const exists = run(`${bin}/psql`, ['-h', '127.0.0.1', '-p', String(cluster.port), '-U', 'postgres', '-tAc',
    `SELECT 1 FROM pg_database WHERE datname = '${name}'`]).trim() === '1';
  if (exists) return false;
  run(`${bin}/psql`, ['-h', '127.0.0.1', '-p', String(cluster.port), '-U', 'postgres', '-qc', `CREATE DATABASE "${name}"`]);
  return true;
}
