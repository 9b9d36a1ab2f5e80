import { join } from 'node:path';
import { startCluster, stopCluster, createDatabase } from './cluster';

export interface PreparedDatabase {
  url: string;
  /** Stops the private cluster when this process started it; a no-op otherwise. */
  stop(): void;
  cluster?: ReturnType<typeof startCluster>;
}

/**
 * DATABASE_URL wins when set; otherwise a private cluster under .data/ is created or
 * reused, and the named database is created in it once.
 */
export function prepareDatabase(opts: { folder: string; port: number; database: string; log: (s: string) => void }): PreparedDatabase {
  if (process.env.DATABASE_URL) return { url: process.env.DATABASE_URL, stop: () => undefined };
  const dataDir = join(process.cwd(), '.data', opts.folder);
  const cluster = startCluster({ dataDir, port: opts.port, log: opts.log });
  createDatabase(cluster, opts.database);
  return {
    url: cluster.adminUrl(opts.database),
    cluster,
    stop: () => {
      if (cluster.started) stopCluster(dataDir);
    },
  };
}
