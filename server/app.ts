import express, { type Request, type Response, type NextFunction } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import pino, { type Logger } from 'pino';
import { rateLimit } from 'express-rate-limit';
import { existsSync } from 'node:fs';
import { resolve, join } from 'node:path';
import type { Knex } from 'knex';
import type { Config } from './config';
import type { Deps } from './deps';
import { createMailer, type Mailer } from './mail/mailer';
import { createOutbox } from './mail/outbox';
import { createJobQueue, type JobQueue } from './jobs/queue';
import { startRollupWorker } from './boms/rollup-worker';
import { queueRefresh } from './boms/rollups';
import { createSessionMiddleware, configurePassport } from './auth/session';
import { csrfGuard } from './auth/csrf';
import { resolveAuth } from './auth/resolve-auth';
import { PgRateLimitStore } from './auth/rate-limit-store';
import { buildRouter } from './http/router';
import { errorHandler } from './http/error-handler';
import { errors } from './http/errors';
import { buildOpenApi } from './http/openapi';
import { routeTable } from './routes';
import { createObjectStore, type ObjectStore } from './files/object-store';
import type Stripe from 'stripe';
import { createStripe } from './billing/stripe-client';
import { recycleConnections } from './http/recycle-connections';

export interface AppOptions {
  db: Knex;
  config: Config;
  mailer?: Mailer;
  logger?: Logger;
  store?: ObjectStore;
  stripe?: Stripe;
}

export interface FarthingApp {
  app: express.Express;
  deps: Deps;
  /** Resolves once the job queue and the mail worker run. */
  ready: Promise<void>;
  queue: JobQueue;
  close(): Promise<void>;
}

/** Builds the whole HTTP app without listening, so tests drive it in-process. */
export function createApp(opts: AppOptions): FarthingApp {
  const { db, config } = opts;
  const logger =
    opts.logger ??
    pino({
      level: config.LOG_LEVEL,
      redact: { paths: ['req.headers.authorization', 'req.headers.cookie', 'res.headers["set-cookie"]', '*.password', '*.token'], censor: '[hidden]' },
    });
  const queue = createJobQueue(config.DATABASE_URL, logger);
  // A web-only process leaves the background jobs to a jobs process (see server/index.ts).
  const runsJobs = config.PROCESS_ROLE !== 'web';
  const outbox = createOutbox(queue, opts.mailer ?? createMailer(config), logger, { work: config.MAIL_WORKER && runsJobs, pollingIntervalSeconds: config.JOB_POLL_SECONDS });
  const mailer = outbox;
  const store =
    opts.store ??
    createObjectStore({ endpoint: config.S3_ENDPOINT, region: config.S3_REGION, bucket: config.S3_BUCKET, accessKeyId: config.S3_ACCESS_KEY_ID, secretAccessKey: config.S3_SECRET_ACCESS_KEY });
  const stripe = opts.stripe ?? createStripe(config);
  const deps: Deps = { db, config, mailer, logger, store, stripe, queue };
  deps.afterWrite = (workspaceId) => void queueRefresh(deps, workspaceId);
  const passport = configurePassport(db);
  const sessions = createSessionMiddleware(config, logger);
  const routes = routeTable(passport);
  const openapi = buildOpenApi(routes);

  const authLimiter = rateLimit({
    windowMs: 60_000,
    limit: config.RATE_LIMIT_AUTH_PER_MINUTE,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    store: new PgRateLimitStore(db, 'auth:'),
    handler: (_req, _res, next) => next(errors.rateLimited()),
  });

  const app = express();
  app.disable('x-powered-by');
  // No ETag on API answers: they are computed per request, and hashing a 1 MB cost roll to
  // tag it cost more than a revalidation saves. Static files keep theirs (serve-static).
  app.disable('etag');
  if (config.PUBLIC_URL.startsWith('https://')) app.set('trust proxy', 1);
  app.use(recycleConnections(config.MAX_REQUESTS_PER_CONNECTION));
  app.use(helmet());
  app.use(
    pinoHttp({
      logger,
      autoLogging: { ignore: (req) => !req.url?.startsWith('/api') },
      serializers: { req: (req) => ({ method: req.method, url: req.url }), res: (res) => ({ statusCode: res.statusCode }) },
    }),
  );

  const api = express.Router();
  // The payment webhook is verified over its exact bytes, so it skips JSON parsing.
  api.use('/billing/webhook', express.raw({ type: '*/*', limit: '1mb' }));
  api.use(express.json({ limit: '1mb', strict: true }));
  api.use(sessions.middleware);
  api.use(passport.initialize());
  api.use(passport.session());
  api.use(csrfGuard(['/billing/webhook']));
  api.use(resolveAuth(db));
  api.get('/openapi.json', (_req, res) => res.json(openapi));
  app.use('/api', api);
  app.use(buildRouter(routes, deps, { auth: authLimiter }));
  app.use('/api', (_req: Request, _res: Response, next: NextFunction) => next(errors.notFound('API route')));

  const dist = resolve(config.CLIENT_DIST);
  if (config.SERVE_CLIENT && existsSync(join(dist, 'index.html'))) {
    app.use(express.static(dist, { index: false, maxAge: '1h' }));
    app.get('/{*splat}', (_req, res) => res.sendFile(join(dist, 'index.html')));
  }
  app.use(errorHandler(logger));

  return {
    app,
    deps,
    ready: Promise.all([outbox.started, startRollupWorker(deps, runsJobs)]).then(() => undefined),
    queue,
    close: async () => {
      await queue.stop();
      await sessions.close();
      mailer.close();
    },
  };
}
