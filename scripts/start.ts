/**
 * `npm start` (and `npm run dev` with --dev): PostgreSQL, migrations, the demo seed, the
 * client build, the mail sink and the app server, all on 127.0.0.1. Ctrl-C stops them all.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { prepareDatabase } from './lib/database';
import { createDb } from '../server/db/knex';
import { migrateLatest, seedConfig } from '../server/db/migrate';
import { startMailSink } from '../server/mail/sink';
import { startS3Fake } from '../server/files/s3-fake';
import { demoLogins, demoPassword } from '../seeds/01_demo_workspace';

const dev = process.argv.includes('--dev');
const port = Number(process.env.PORT ?? 4100);
const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
const inboxPort = Number(process.env.INBOX_PORT ?? 4101);
const log = (s: string) => console.log(`[farthing] ${s}`);

function sessionSecret(): string {
  if (process.env.SESSION_SECRET) return process.env.SESSION_SECRET;
  const file = '.data/session-secret';
  mkdirSync('.data', { recursive: true });
  if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString('hex'), { mode: 0o600 });
  return readFileSync(file, 'utf8').trim();
}

async function main() {
  const database = prepareDatabase({ folder: 'pg', port: Number(process.env.FARTHING_PG_PORT ?? 54329), database: 'farthing', log });
  const children: ChildProcess[] = [];
  let sink: Awaited<ReturnType<typeof startMailSink>> | null = null;
  let s3: Awaited<ReturnType<typeof startS3Fake>> | null = null;
  let stopping = false;
  const stopAll = async (code = 0) => {
    if (stopping) return;
    stopping = true;
    log('stopping…');
    for (const c of children) c.kill('SIGTERM');
    await Promise.all(children.map((c) => (c.exitCode === null ? new Promise((r) => c.once('exit', r)) : null)));
    await sink?.close();
    await s3?.close();
    database.stop();
    log('stopped.');
    process.exit(code);
  };
  process.on('SIGINT', () => void stopAll());
  process.on('SIGTERM', () => void stopAll());

  try {
    const db = createDb(database.url);
    const applied = await migrateLatest(db);
    if (applied.length) log(`applied ${applied.length} migration(s)`);
    await db.seed.run(seedConfig);
    await db.destroy();

    sink = await startMailSink({ smtpPort, httpPort: inboxPort });
    // Datasheets go to the local S3-compatible store unless a real one is configured.
    if (!process.env.S3_ENDPOINT) s3 = await startS3Fake({ port: Number(process.env.S3_PORT ?? 4102), directory: '.data/s3', bucket: 'farthing' });
    const publicUrl = process.env.PUBLIC_URL ?? (dev ? 'http://127.0.0.1:5173' : `http://127.0.0.1:${port}`);
    const env = {
      ...process.env,
      NODE_ENV: dev ? 'development' : process.env.NODE_ENV ?? 'production',
      DATABASE_URL: database.url,
      PORT: String(port),
      PUBLIC_URL: publicUrl,
      SESSION_SECRET: sessionSecret(),
      SMTP_PORT: String(sink.smtpPort),
      S3_ENDPOINT: process.env.S3_ENDPOINT ?? `http://127.0.0.1:${s3!.port}`,
      SERVE_CLIENT: dev ? 'false' : 'true',
      LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn',
    };
    // The payment-service fake, unless a key of your own is configured.
    if (!process.env.STRIPE_SECRET_KEY && !process.env.STRIPE_API_URL) {
      const stripePort = Number(process.env.STRIPE_FAKE_PORT ?? 4103);
      children.push(
        spawn(process.execPath, ['--import', 'tsx', 'stripe-fake/main.ts'], {
          stdio: 'inherit',
          env: { ...env, STRIPE_FAKE_PORT: String(stripePort), STRIPE_WEBHOOK_URL: `http://127.0.0.1:${port}/api/billing/webhook` },
        }),
      );
      Object.assign(env, { STRIPE_API_URL: `http://127.0.0.1:${stripePort}` });
    }
    if (dev) {
      children.push(spawn(process.execPath, ['--import', 'tsx', '--watch', 'server/index.ts'], { stdio: 'inherit', env }));
      children.push(spawn('node_modules/.bin/vite', ['--host', '127.0.0.1', '--port', '5173', '--strictPort'], { stdio: 'inherit', env: { ...env, FARTHING_API_PORT: String(port) } }));
    } else {
      log('building the client…');
      const build = spawnSync('node_modules/.bin/vite', ['build', '--logLevel', 'warn'], { stdio: 'inherit' });
      if (build.status !== 0) throw new Error('the client build failed');
      const server = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { stdio: ['inherit', 'inherit', 'inherit', 'ipc'], env });
      children.push(server);
      await new Promise<void>((resolve, reject) => {
        server.once('message', () => resolve());
        server.once('exit', (code) => reject(new Error(`the server exited (${code})`)));
      });
    }
    for (const c of children) c.once('exit', (code) => !stopping && void stopAll(code ?? 1));
    console.log(`
  Farthing is running at ${publicUrl}
  Dev inbox (every e-mail the app sends): http://127.0.0.1:${sink.httpPort}

  Demo logins (workspace "Tinbell Gadgets (demo)"), password ${demoPassword}:
${demoLogins.map((l) => `    ${l.role.padEnd(9)} ${l.email}`).join('\n')}

  Ctrl-C stops the server, the mail sink and the database.
`);
  } catch (err) {
    console.error(err instanceof Error ? err.message : err);
    await stopAll(1);
  }
}

void main();
