import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { rmSync } from 'node:fs';
import request from 'supertest';
import pino from 'pino';
import { startCluster, stopCluster, createDatabase } from '../../scripts/lib/cluster';
import { createDb, type Db } from '../../server/db/knex';
import { migrateLatest } from '../../server/db/migrate';
import { createApp, type FarthingApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { startMailSink, type MailSink } from '../../server/mail/sink';

// A cluster of its own, so stopping it does not disturb the other test files.
const dataDir = join(process.cwd(), '.data', 'pg-fault');
const port = Number(process.env.FARTHING_FAULT_PG_PORT ?? 54349);
let db: Db;
let farthing: FarthingApp;
let sink: MailSink;

beforeAll(async () => {
  rmSync(dataDir, { recursive: true, force: true });
  const cluster = startCluster({ dataDir, port, log: () => undefined });
  createDatabase(cluster, 'fault');
  const url = cluster.adminUrl('fault');
  db = createDb(url);
  const { register } = await import('tsx/esm/api');
  const unregister = register();
  await migrateLatest(db);
  await unregister();
  sink = await startMailSink();
  const config = loadConfig({ NODE_ENV: 'test', DATABASE_URL: url, SESSION_SECRET: 'test-secret-test-secret', SMTP_PORT: String(sink.smtpPort), SERVE_CLIENT: 'false', LOG_LEVEL: 'silent' });
  farthing = createApp({ db, config, logger: pino({ level: 'silent' }) });
}, 60_000);

afterAll(async () => {
  await farthing.close().catch(() => undefined);
  await db.destroy();
  await sink.close();
  stopCluster(dataDir);
  rmSync(dataDir, { recursive: true, force: true });
});

describe('the database goes away and comes back', () => {
  it('answers 503 with a clear message while it is down, then serves again without a restart', async () => {
    const agent = request.agent(farthing.app).set('X-Requested-With', 'farthing');
    await agent.post('/api/auth/signup').send({ email: 'down@tinbell.example', password: 'down password 1', name: 'D', workspaceName: 'Down Co' }).expect(201);
    await agent.get('/api/members').expect(200);

    stopCluster(dataDir);
    for (const path of ['/api/members', '/api/auth/me']) {
      const res = await agent.get(path);
      expect(res.status, path).toBe(503);
      expect(res.body.error.code).toBe('database_unavailable');
      expect(res.body.error.message).toMatch(/database is unavailable/);
      expect(res.headers['retry-after']).toBeDefined();
    }
    const write = await agent.post('/api/tokens').send({ name: 'while down' });
    expect(write.status).toBe(503);

    startCluster({ dataDir, port, log: () => undefined });
    const start = Date.now();
    let status = 0;
    while (Date.now() - start < 10_000) {
      status = (await agent.get('/api/members')).status;
      if (status === 200) break;
      await new Promise((r) => setTimeout(r, 200));
    }
    expect(status).toBe(200);
    expect(Date.now() - start).toBeLessThan(10_000);
  }, 60_000);
});
