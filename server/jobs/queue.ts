import PgBoss from 'pg-boss';
import type { Logger } from 'pino';

export const MAIL_QUEUE = 'mail';

export interface JobQueue {
  boss: PgBoss;
  ready: Promise<void>;
  stop(): Promise<void>;
}

/**
 * pg-boss keeps jobs in PostgreSQL (schema `pgboss`), so a job survives a restart or a
 * mail-server outage, and several app servers share one queue: each job is taken by one
 * worker only (SKIP LOCKED).
 */
export function createJobQueue(connectionString: string, logger: Logger): JobQueue {
  const boss = new PgBoss({ connectionString, schema: 'pgboss', max: 4, supervise: true, schedule: false });
  boss.on('error', (err) => logger.warn({ err }, 'job queue error'));
  const ready = (async () => {
    await boss.start();
    await ensureQueue(boss, MAIL_QUEUE, { retryLimit: 20, retryDelay: 2, retryBackoff: true, expireInMinutes: 5 });
  })();
  ready.catch((err) => logger.error({ err }, 'job queue did not start'));
  return {
    boss,
    ready,
    stop: async () => {
      await ready.catch(() => undefined);
      await boss.stop({ graceful: true, wait: true, timeout: 5000 }).catch(() => undefined);
    },
  };
}

/**
 * Creates a queue unless it exists. Server processes starting together on a new database
 * (one per core) create the same queues at once, and pg-boss's creation can then deadlock
 * or collide in PostgreSQL; whoever loses tries again, and finds the queue made.
 */
export async function ensureQueue(boss: PgBoss, name: string, options: Omit<PgBoss.Queue, 'name'>): Promise<void> {
  for (let attempt = 1; ; attempt++) {
    try {
      if (await boss.getQueue(name)) return;
      await boss.createQueue(name, { ...options, name });
      return;
    } catch (err) {
      // 40P01 deadlock, 23505 unique violation, 42P07 a table (the queue's partition) that exists.
      const code = (err as { code?: string }).code;
      if (attempt >= 8 || !['40P01', '23505', '42P07'].includes(code ?? '')) throw err;
      // Backing off with jitter: the creators spread out instead of colliding again.
      await new Promise((r) => setTimeout(r, Math.random() * 50 * 2 ** attempt));
    }
  }
}
