import { existsSync, mkdirSync } from 'node:fs';
import { freePort } from './ports';
import { join } from 'node:path';
import type { Server } from 'node:http';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { startTestApp, type TestApp } from './app';

export const chromiumPath = process.env.FARTHING_CHROMIUM ?? (existsSync('/usr/bin/chromium') ? '/usr/bin/chromium' : null);
export const haveClientBuild = existsSync('dist/index.html');
export const canRunBrowser = Boolean(chromiumPath && haveClientBuild);

export interface BrowserApp {
  t: TestApp;
  url: string;
  browser: Browser;
  context: BrowserContext;
  page: Page;
  shot(name: string): Promise<void>;
  close(): Promise<void>;
}

/** The built client and the real API on a loopback port, driven by Debian's Chromium. */
export function startBrowserApp(suite: string): Promise<BrowserApp> {
  return startBrowserAppWith(suite, async () => ({}));
}

/**
 * Like startBrowserApp, with extra server environment worked out from the app's own
 * address before it starts (e.g. a payment-service fake that posts webhooks back to it).
 */
export async function startBrowserAppWith(suite: string, extraEnv: (url: string) => Promise<Record<string, string>>): Promise<BrowserApp> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const t = await startTestApp({ ...(await extraEnv(url)), SERVE_CLIENT: 'true', CLIENT_DIST: 'dist', PUBLIC_URL: url });
  const server: Server = await new Promise((resolve) => {
    const s = t.farthing.app.listen(port, '127.0.0.1', () => resolve(s));
  });
  const browser = await chromium.launch({
    executablePath: chromiumPath!,
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const context = await browser.newContext({ viewport: { width: 1360, height: 860 } });
  // Any request that leaves this machine fails the test.
  await context.route(/^(?!http:\/\/127\.0\.0\.1[:/]).*/, (route) => {
    throw new Error(`unexpected outbound request: ${route.request().url()}`);
  });
  const page = await context.newPage();
  const dir = join('test-artifacts', suite);
  mkdirSync(dir, { recursive: true });
  let n = 0;
  return {
    t,
    url,
    browser,
    context,
    page,
    shot: async (name) => {
      n++;
      await page.screenshot({ path: join(dir, `${String(n).padStart(2, '0')}-${name}.png`), fullPage: true });
    },
    close: async () => {
      await browser.close();
      server.closeAllConnections();
      await new Promise((r) => server.close(r));
      await t.close();
    },
  };
}
