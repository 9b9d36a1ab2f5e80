import { z } from 'zod';

/**
 * Every setting comes from the environment, validated once at start-up; a bad value
 * stops the server with one message listing every problem.
 */
const schema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  DATABASE_URL: z.string().url(),
  PORT: z.coerce.number().int().min(0).max(65535).default(4100),
  HOST: z.string().default('127.0.0.1'),
  PUBLIC_URL: z.string().url().default('http://127.0.0.1:4100'),
  SESSION_SECRET: z.string().min(16, 'must be at least 16 characters'),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  MAIL_FROM: z.string().default('Farthing <no-reply@farthing.local>'),
  SERVE_CLIENT: z.enum(['true', 'false']).default('true').transform((v) => v === 'true'),
  CLIENT_DIST: z.string().default('dist'),
  RATE_LIMIT_AUTH_PER_MINUTE: z.coerce.number().int().min(1).default(20),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  DEV_INBOX_URL: z.string().url().optional(),
  S3_ENDPOINT: z.string().url().optional(),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().min(3).default('farthing'),
  S3_ACCESS_KEY_ID: z.string().default('S3RVER'),
  S3_SECRET_ACCESS_KEY: z.string().default('S3RVER'),
  MAX_DATASHEET_MB: z.coerce.number().min(1).max(200).default(20),
  STRIPE_SECRET_KEY: z.string().default('sk_test_farthing_local'),
  STRIPE_WEBHOOK_SECRET: z.string().default('whsec_farthing_local'),
  /** Points the official SDK at our local fake; unset with real keys. */
  STRIPE_API_URL: z.string().url().optional(),
  BILLING_GRACE_DAYS: z.coerce.number().int().min(0).max(60).default(7),
  /** Whether this server also runs the mail worker (every server may; each mail goes once). A web-only process never does. */
  MAIL_WORKER: z.enum(['true', 'false']).default('true').transform((v) => v === 'true'),
  JOB_POLL_SECONDS: z.coerce.number().min(0.5).max(60).default(1),
  MAX_IMPORT_MB: z.coerce.number().min(1).max(200).default(10),
  /** Server processes on this machine; default one per core in production, else one. */
  WEB_CONCURRENCY: z.coerce.number().int().min(1).max(64).optional(),
  /**
   * What this process does: `all` serves HTTP and runs the background jobs (roll-up refresh,
   * mail); `web` only serves HTTP; `jobs` only runs the jobs. With more than one process and
   * no role set, `npm start` runs that many web processes and one jobs process; set to `web`,
   * web processes only (the jobs then run on another machine); set to `jobs`, one jobs process.
   */
  PROCESS_ROLE: z.enum(['all', 'web', 'jobs']).default('all'),
  /**
   * Requests one kept-alive connection may carry before the server closes it, at its next
   * GET or HEAD (the client reconnects at once). node:cluster shares out connections, not
   * requests, so a client that holds its connections open stays on the processes it first
   * landed on; each new connection goes to the next process in turn. 0: no limit.
   */
  MAX_REQUESTS_PER_CONNECTION: z.coerce.number().int().min(0).max(1_000_000).default(100),
});

export type Config = z.infer<typeof schema>;

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = schema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Farthing cannot start; fix these settings:\n${lines.join('\n')}`);
  }
  return parsed.data;
}
