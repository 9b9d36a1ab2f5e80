import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { mkdirSync, rmSync } from 'node:fs';
import type { Server } from 'node:http';
import pino from 'pino';
import { chromium, type Browser, type Page } from 'playwright-core';
import { startCluster, stopCluster, createDatabase } from '../../scripts/lib/cluster';
import { createDb, type Db } from '../../server/db/knex';
import { migrateLatest } from '../../server/db/migrate';
import { createApp, type FarthingApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { startMailSink, type MailSink } from '../../server/mail/sink';
import { canRunBrowser, chromiumPath } from '../helpers/browser';
import { freePort } from '../helpers/ports';

// A cluster of its own (as tests/reliability/database-down.test.ts), so stopping it does
// not disturb the other test files.
const dataDir = join(process.cwd(), '.data', 'pg-reconnect');
const pgPort = Number(process.env.FARTHING_RECONNECT_PG_PORT ?? 54359);
let db: Db;
let farthing: FarthingApp;
let sink: MailSink;
let server: Server;
let browser: Browser;
let page: Page;
let url: string;
const shots = join('test-artifacts', 'reconnecting');

describe.skipIf(!canRunBrowser)('the database goes away while a user is in the app (browser)', () => {
  beforeAll(async () => {
    rmSync(dataDir, { recursive: true, force: true });
    const cluster = startCluster({ dataDir, port: pgPort, log: () => undefined });
    createDatabase(cluster, 'reconnect');
    const dbUrl = cluster.adminUrl('reconnect');
    db = createDb(dbUrl);
    const { register } = await import('tsx/esm/api');
    const unregister = register();
    await migrateLatest(db);
    await unregister();
    sink = await startMailSink();
    const port = await freePort();
    url = `http://127.0.0.1:${port}`;
    const config = loadConfig({
      NODE_ENV: 'test', DATABASE_URL: dbUrl, SESSION_SECRET: 'test-secret-test-secret', SMTP_PORT: String(sink.smtpPort),
      SERVE_CLIENT: 'true', CLIENT_DIST: 'dist', PUBLIC_URL: url, RATE_LIMIT_AUTH_PER_MINUTE: '1000', LOG_LEVEL: 'silent',
    });
    farthing = createApp({ db, config, logger: pino({ level: 'silent' }) });
    await farthing.ready;
    server = await new Promise((resolve) => {
      const s = farthing.app.listen(port, '127.0.0.1', () => resolve(s));
    });
    browser = await chromium.launch({ executablePath: chromiumPath!, headless: true, args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking'] });
    page = await (await browser.newContext({ viewport: { width: 1360, height: 860 } })).newPage();
    mkdirSync(shots, { recursive: true });
  }, 90_000);

  afterAll(async () => {
    await browser?.close();
    server?.closeAllConnections();
    if (server) await new Promise((r) => server.close(r));
    await farthing?.close().catch(() => undefined);
    await db?.destroy();
    await sink?.close();
    stopCluster(dataDir);
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('shows "Reconnecting…" while PostgreSQL is stopped, and the page catches up on its own when it is back', async () => {
    await page.goto(`${url}/signup`);
    await page.getByLabel('Your name').fill('Rhea Owner');
    await page.getByLabel('Email').fill('reconnect@tinbell.example');
    await page.getByLabel('Password').fill('reconnect password 1');
    await page.getByLabel('Workspace name').fill('Reconnect Gadgets');
    await page.getByRole('button', { name: 'Create workspace' }).click();
    await page.waitForURL('**/boms');
    const banner = page.getByText('Reconnecting…');
    expect(await banner.count()).toBe(0);

    stopCluster(dataDir);
    // Moving to another screen asks the API for its data: 503 while the database is away.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Suppliers', exact: true }).click();
    await expect.poll(() => banner.isVisible(), { timeout: 15_000 }).toBe(true);
    await page.screenshot({ path: join(shots, '01-reconnecting.png'), fullPage: true });
    // The user is not thrown out to the sign-in page: a 503 is not an answer about the session.
    expect(new URL(page.url()).pathname).not.toBe('/signin');

    startCluster({ dataDir, port: pgPort, log: () => undefined });
    await expect.poll(() => banner.count(), { timeout: 20_000 }).toBe(0);
    expect(new URL(page.url()).pathname).toBe('/suppliers');
    await expect.poll(() => page.getByRole('heading', { name: 'Suppliers' }).first().isVisible(), { timeout: 10_000 }).toBe(true);
    await page.screenshot({ path: join(shots, '02-back.png'), fullPage: true });
  }, 90_000);
});
