import type { Logger } from 'pino';
import type { JobQueue } from '../jobs/queue';
import { MAIL_QUEUE } from '../jobs/queue';
import type { Mailer, OutgoingMail } from './mailer';

/**
 * The mailer the app uses: `send` only queues the message in PostgreSQL; a worker hands it
 * to SMTP and pg-boss retries with backoff while the mail server is down. Nothing is lost
 * and each message goes out once, whichever app server takes it.
 */
export function createOutbox(queue: JobQueue, smtp: Mailer, logger: Logger, opts: { work: boolean; pollingIntervalSeconds?: number }): Mailer & { started: Promise<void> } {
  const started = (async () => {
    await queue.ready;
    if (!opts.work) return;
    // A few workers, one message each: a failure retries only its own message.
    for (let i = 0; i < 4; i++) {
      await queue.boss.work<OutgoingMail>(MAIL_QUEUE, { pollingIntervalSeconds: opts.pollingIntervalSeconds ?? 1, batchSize: 1 }, async ([job]) => {
        await smtp.send(job.data);
        logger.info({ to: job.data.to, subject: job.data.subject }, 'mail sent');
      });
    }
  })();
  started.catch((err) => logger.error({ err }, 'mail worker did not start'));
  return {
    started,
    async send(mail) {
      await queue.ready;
      await queue.boss.send(MAIL_QUEUE, mail);
    },
    close: () => smtp.close(),
  };
}
