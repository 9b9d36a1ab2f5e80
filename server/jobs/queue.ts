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
    await boss.createQueue(MAIL_QUEUE, { name: MAIL_QUEUE, retryLimit: 20, retryDelay: 2, retryBackoff: true, expireInMinutes: 5 });
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
