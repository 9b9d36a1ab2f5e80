import type { Knex } from 'knex';
import type { Logger } from 'pino';
import type { Config } from './config';
import type { Mailer } from './mail/mailer';
import type { ObjectStore } from './files/object-store';
import type Stripe from 'stripe';
import type { JobQueue } from './jobs/queue';

/** What every route and service may use; built once in createApp. */
export interface Deps {
  db: Knex;
  config: Config;
  mailer: Mailer;
  logger: Logger;
  store: ObjectStore;
  stripe: Stripe;
  queue: JobQueue;
  /** Called after every successful signed-in write (e.g. to queue roll-up refreshes). */
  afterWrite?: (workspaceId: string) => void;
}
