import request from 'supertest';
import type { Server } from 'node:http';
import pino from 'pino';
import { createApp, type FarthingApp } from '../../server/app';
import { loadConfig, type Config } from '../../server/config';
import { startMailSink, type MailSink } from '../../server/mail/sink';
import { createTestDatabase, type TestDatabase } from './db';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { startS3Fake, type S3Fake } from '../../server/files/s3-fake';

export interface TestApp {
  farthing: FarthingApp;
  config: Config;
  database: TestDatabase;
  sink: MailSink;
  s3: S3Fake;
  /** A fresh cookie-keeping client that sends the header our CSRF rule asks for. */
  agent(): ReturnType<typeof request.agent>;
  close(): Promise<void>;
}

/** The real app over a real database and a real mail sink, in this process. */
export async function startTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const database = await createTestDatabase();
  const sink = await startMailSink();
  const s3Dir = mkdtempSync(join(tmpdir(), 'farthing-s3-'));
  const s3 = await startS3Fake({ directory: s3Dir, bucket: 'farthing' });
  const config = loadConfig({
    S3_ENDPOINT: `http://127.0.0.1:${s3.port}`,
    NODE_ENV: 'test',
    DATABASE_URL: database.url,
    SESSION_SECRET: 'test-secret-test-secret',
    SMTP_PORT: String(sink.smtpPort),
    PUBLIC_URL: 'http://127.0.0.1:4100',
    SERVE_CLIENT: 'false',
    RATE_LIMIT_AUTH_PER_MINUTE: '1000',
    JOB_POLL_SECONDS: '0.5',
    LOG_LEVEL: process.env.TEST_LOG_LEVEL ?? 'silent',
    ...env,
  });
  const farthing = createApp({ db: database.db, config, logger: pino({ level: process.env.TEST_LOG_LEVEL ?? 'silent' }) });
  await farthing.ready;
  return {
    farthing,
    config,
    database,
    sink,
    s3,
    agent: () => request.agent(farthing.app).set('X-Requested-With', 'farthing'),
    close: async () => {
      await farthing.close();
      await sink.close();
      await s3.close();
      rmSync(s3Dir, { recursive: true, force: true });
      await database.drop();
    },
  };
}

export type Agent = ReturnType<TestApp['agent']>;

let counter = 0;
/**
 * Signs up a new user with a workspace of their own; returns the signed-in agent. The
 * workspace is put on the Factory plan unless `plan` says otherwise, so that tests of other
 * areas are not about plan limits (the billing tests choose Bench on purpose).
 */
export async function signUp(t: TestApp, over: Partial<{ email: string; name: string; password: string; workspaceName: string; plan: 'bench' | 'workshop' | 'factory' }> = {}) {
  counter++;
  const body = {
    email: over.email ?? `user${counter}-${Date.now()}@tinbell.example`,
    name: over.name ?? `User ${counter}`,
    password: over.password ?? 'correct horse battery',
    workspaceName: over.workspaceName ?? `Workspace ${counter}`,
  };
  const agent = t.agent();
  const res = await agent.post('/api/auth/signup').send(body).expect(201);
  const plan = over.plan ?? 'factory';
  if (plan !== 'bench') await t.database.db('workspaces').where({ id: res.body.workspace.id }).update({ plan, billingStatus: 'active' });
  return { agent, body, user: res.body.user as { id: string }, workspace: res.body.workspace as { id: string } };
}

/** Waits for a mail to a recipient (whose subject contains `subject`, when given) and returns the newest. */
export async function waitForMail(sink: MailSink, to: string, timeoutMs = 10_000, subject?: string) {
  const start = Date.now();
  for (;;) {
    const m = [...sink.inbox].reverse().find((x) => x.to.includes(to.toLowerCase()) && (!subject || x.subject.includes(subject)));
    if (m) return m;
    if (Date.now() - start > timeoutMs) throw new Error(`no mail to ${to} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

export const linkIn = (text: string, path: string) => {
  const m = new RegExp(`https?://[^\\s]+${path}/([A-Za-z0-9_-]+)`).exec(text);
  if (!m) throw new Error(`no ${path} link in mail`);
  return m[1];
};

export type { Server };
