/**
 * The fake as a process, for `npm start` to spawn:
 *   node --import tsx stripe-fake/main.ts
 * Settings come from the environment; a bad value stops it with one message listing every problem.
 */
import { z } from 'zod';
import { startStripeFake } from './server';

const schema = z.object({
  STRIPE_FAKE_PORT: z.coerce.number().int().min(0).max(65535).default(4103),
  // The same defaults as the server's config, so that both agree when neither is set.
  STRIPE_SECRET_KEY: z.string().startsWith('sk_test_', 'must be a test key (sk_test_…); the fake never takes a live key').default('sk_test_farthing_local'),
  STRIPE_WEBHOOK_SECRET: z.string().min(8).default('whsec_farthing_local'),
  STRIPE_WEBHOOK_URL: z.string().url().optional(),
});

const log = (line: string) => console.log(`[stripe-fake] ${line}`);

async function main() {
  const parsed = schema.safeParse(process.env);
  if (!parsed.success) {
    console.error(`stripe-fake cannot start; fix these settings:\n${parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`).join('\n')}`);
    process.exit(1);
  }
  const env = parsed.data;
  const fake = await startStripeFake({
    port: env.STRIPE_FAKE_PORT,
    secretKey: env.STRIPE_SECRET_KEY,
    webhookSecret: env.STRIPE_WEBHOOK_SECRET,
    webhookUrl: env.STRIPE_WEBHOOK_URL,
    log,
  });
  log(`listening on ${fake.url}; events ${env.STRIPE_WEBHOOK_URL ? `go to ${env.STRIPE_WEBHOOK_URL}` : 'are recorded only (STRIPE_WEBHOOK_URL is not set)'}`);
  // A parent started with an IPC channel learns the port (useful with STRIPE_FAKE_PORT=0).
  process.send?.({ stripeFake: { port: fake.port, url: fake.url } });
  let stopping = false;
  const stop = () => {
    if (stopping) return;
    stopping = true;
    void fake.close().then(() => process.exit(0));
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

void main();
