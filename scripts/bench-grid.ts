/**
 * `npm run bench:grid`: the Lines grid of a 2,000-line BOM in Debian's Chromium, against
 * the app as `npm start` runs it. Measures how long the grid takes to open with every line
 * loaded, then scrolls it from top to bottom and back, a screenful-and-more per frame, and
 * jumps to random rows (as a dragged scrollbar does), recording every frame. Prints one JSON
 * line. A frame counts as a stutter when it took over 50 ms (the W3C Long Tasks threshold)
 * or showed no row in the middle of the grid (rows not drawn in time).
 * Targets (2-core machine, our own): opens in under 2 s (the median of five opens after the first); no stutter frames; 95% of frames
 * within 1/30 s.
 */
import { existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { performance } from 'node:perf_hooks';
import { chromium } from 'playwright-core';
import { startBenchApp } from './lib/bench-app';
import { ensureChromium } from './lib/chromium';

const lineCount = Number(process.env.BENCH_GRID_LINES ?? 2000);
const pxPerFrame = Number(process.env.BENCH_GRID_PX ?? 200);
const jumps = 60;

interface ScrollRecord {
  frames: number[];
  blank: number;
  longTasks: number[];
}

const percentile = (xs: number[], p: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor(xs.length * p))];

function summary(r: ScrollRecord) {
  const stutters = r.frames.filter((f) => f > 50).length;
  return {
    frames: r.frames.length,
    medianFrameMs: Number(percentile(r.frames, 0.5).toFixed(1)),
    p95FrameMs: Number(percentile(r.frames, 0.95).toFixed(1)),
    maxFrameMs: Number(Math.max(...r.frames).toFixed(1)),
    framesOver50Ms: stutters,
    blankFrames: r.blank,
    longTasks: r.longTasks.length,
    longestTaskMs: r.longTasks.length ? Math.round(Math.max(...r.longTasks)) : 0,
  };
}

export async function benchGrid(lines = lineCount) {
  const chromiumPath = process.env.FARTHING_CHROMIUM ?? ensureChromium((s) => console.error(s));
  if (!chromiumPath) throw new Error('bench:grid needs Debian chromium (/usr/bin/chromium)');
  // The grid measured is the one this checkout builds.
  const build = spawnSync('node_modules/.bin/vite', ['build', '--logLevel', 'warn'], { stdio: 'inherit' });
  if (build.status !== 0 || !existsSync('dist/index.html')) throw new Error('vite build failed');

  let bomId = '';
  const app = await startBenchApp({
    database: 'farthing_grid',
    port: Number(process.env.BENCH_GRID_PORT ?? 4181),
    env: { SERVE_CLIENT: 'true', CLIENT_DIST: 'dist' },
    // A generated BOM over the demo library: part lines with ref des, a cost line every 50.
    prepare: async (db) => {
      const ws = await db('workspaces').where('name', 'like', 'Tinbell%').first('id');
      const parts = (await db('parts').where({ workspaceId: ws.id }).select('id')) as { id: string }[];
      const profile = await db('landed_cost_profiles').where({ workspaceId: ws.id }).first('id');
      const { rows } = await db.raw(`SELECT nextval(pg_get_serial_sequence('boms', 'id')) AS id`);
      bomId = String(rows[0].id);
      await db('boms').insert({ id: bomId, familyId: bomId, workspaceId: ws.id, name: `Grid bench BOM (${lines} lines)`, reportingCurrency: 'GBP', profileId: profile.id, plannedQty: 20000, shelf: '{}' });
      await db('bom_lines').insert(Array.from({ length: lines }, (_, i) => (i % 50 === 49
        ? { workspaceId: ws.id, bomId, position: i, kind: 'packaging', qtyPerUnit: '1', unitCost: '0.012', currency: 'USD', note: `Carton insert ${i + 1}` }
        : { workspaceId: ws.id, bomId, position: i, partId: parts[i % parts.length].id, qtyPerUnit: String(1 + (i % 3)), refDes: `X${i + 1}`, note: i % 7 === 0 ? 'second source wanted' : '' })));
    },
  });

  const browser = await chromium.launch({ executablePath: chromiumPath, headless: true, args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking'] });
  try {
    const cookie = await app.signIn('designer@tinbell.example');
    const [name, value] = cookie.split('=');
    const context = await browser.newContext({ viewport: { width: 1360, height: 860 } });
    await context.addCookies([{ name, value, domain: '127.0.0.1', path: '/' }]);
    // tsx names the functions it compiles through a `__name` helper; the page has none.
    await context.addInitScript('globalThis.__name = (fn) => fn');
    const page = await context.newPage();
    const opens: number[] = [];
    // The first open also loads the client and computes the BOM's first roll-up.
    for (let i = 0; i < 6; i++) {
      const t0 = performance.now();
      await page.goto(`${app.base}/boms/${bomId}/lines`);
      await page.getByRole('status').filter({ hasText: `${lines} lines` }).waitFor({ timeout: 30_000 });
      await page.getByRole('grid', { name: 'Lines' }).getByRole('row').nth(1).waitFor();
      opens.push(performance.now() - t0);
    }

    const scroll = await page.evaluate(async ({ px, jumpCount }) => {
      const grid = document.querySelector('[role="grid"][aria-label="Lines"]')!;
      let el = grid.parentElement!;
      while (el.scrollHeight <= el.clientHeight + 1 || getComputedStyle(el).overflowY === 'visible') el = el.parentElement!;
      const box = el.getBoundingClientRect();
      const showsRow = () => Boolean(document.elementFromPoint(box.left + 120, box.top + box.height / 2)?.closest('[role="row"]'));
      const record = async (move: (frame: number) => boolean) => {
        const frames: number[] = [];
        const longTasks: number[] = [];
        let blank = 0;
        const observer = new PerformanceObserver((list) => list.getEntries().forEach((e) => longTasks.push(e.duration)));
        observer.observe({ type: 'longtask' });
        await new Promise<void>((resolve) => {
          let last = 0;
          let n = 0;
          // Scroll events run before animation-frame callbacks, so each check sees the rows
          // drawn for the previous frame's scroll.
          const step = (now: number) => {
            if (last) frames.push(now - last);
            last = now;
            if (n > 0 && !showsRow()) blank++;
            if (move(n++)) requestAnimationFrame(step);
            else resolve();
          };
          requestAnimationFrame(step);
        });
        observer.disconnect();
        return { frames, blank, longTasks };
      };
      const max = () => el.scrollHeight - el.clientHeight;
      let dir = 1;
      let turns = 0;
      const sweep = await record(() => {
        el.scrollTop = Math.max(0, Math.min(max(), el.scrollTop + dir * px));
        if ((dir === 1 && el.scrollTop >= max() - 1) || (dir === -1 && el.scrollTop <= 0)) {
          dir = -dir;
          turns++;
        }
        return turns < 2;
      });
      // Jumps to rows spread over the grid in a fixed scattered order (a dragged scrollbar).
      const jump = await record((frame) => {
        el.scrollTop = Math.round(((frame * 37) % jumpCount) / jumpCount * max());
        return frame < jumpCount;
      });
      return { sweep, jump, scrollHeightPx: el.scrollHeight };
    }, { px: pxPerFrame, jumpCount: jumps });

    const result = {
      grid: 'Lines', lines,
      firstOpenMs: Math.round(opens[0]), openMedianMs: Math.round(percentile(opens.slice(1), 0.5)), openRunsMs: opens.map(Math.round),
      scrollHeightPx: scroll.scrollHeightPx, pxPerFrame,
      sweep: summary(scroll.sweep),
      jumps: summary(scroll.jump),
    };
    console.log(JSON.stringify(result));
    return result;
  } finally {
    await browser.close();
    await app.stop();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) void benchGrid();
