/**
 * `npm run bench:grid`: the Lines grid of a 2,000-line BOM in Debian's Chromium, against
 * the app as `npm start` runs it. Times six opens with every line loaded (the first also
 * loads the client and computes the BOM's first roll-up), then scrolls from top to bottom
 * and back at BENCH_GRID_PX (200) px a frame, then jumps to 60 rows scattered over the grid
 * (as a dragged scrollbar does), recording every frame. Prints one JSON line.
 *
 * Our targets (2-core machine; the issue names none): the median open after the first under
 * 1 s; while sweeping, 95 % of frames within two 60 Hz frame times (33.4 ms; frame lengths
 * come in whole frame times), at most 1 % over 50 ms (the W3C Long Tasks threshold), and no
 * move that outruns the rows already drawn.
 * Jumps redraw a whole screen and are reported, with no target.
 */
import { existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { performance } from 'node:perf_hooks';
import { chromium, type Browser } from 'playwright-core';
import { startBenchApp } from './lib/bench-app';
import { ensureChromium } from './lib/chromium';

const lineCount = Number(process.env.BENCH_GRID_LINES ?? 2000);
const pxPerFrame = Number(process.env.BENCH_GRID_PX ?? 200);
const jumps = 60;

interface ScrollRecord {
  frames: number[];
  outran: number;
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
    framesOver50MsPct: Number(((100 * stutters) / r.frames.length).toFixed(1)),
    movesOutrunningDrawnRows: r.outran,
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

  let browser: Browser | undefined;
  try {
    browser = await chromium.launch({ executablePath: chromiumPath, headless: true, args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking'] });
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
      const header = grid.querySelector('[role="row"][aria-rowindex="1"]')!.getBoundingClientRect().height;
      /** Whether a line's row is drawn at height y of the viewport (not the header, not empty space). */
      const rowAt = (y: number) => {
        const row = document.elementFromPoint(box.left + 120, y)?.closest('[role="row"]');
        return Boolean(row && row.getAttribute('aria-rowindex') !== '1');
      };
      // `move` sets the scroll position for the next frame and says whether to go on; it
      // returns 'outran' when the rows already drawn did not reach where the view landed.
      const record = async (move: (frame: number) => boolean | 'outran') => {
        const frames: number[] = [];
        const longTasks: number[] = [];
        let outran = 0;
        const observer = new PerformanceObserver((list) => list.getEntries().forEach((e) => longTasks.push(e.duration)));
        observer.observe({ type: 'longtask' });
        await new Promise<void>((resolve) => {
          let last = 0;
          let n = 0;
          let done = false;
          // Each frame's length is from its animation-frame callback to the next one; the
          // frame after the last move is recorded too.
          const step = (now: number) => {
            if (last) frames.push(now - last);
            last = now;
            if (done) return resolve();
            const going = move(n++);
            if (going === 'outran') outran++;
            done = going === false;
            requestAnimationFrame(step);
          };
          requestAnimationFrame(step);
        });
        observer.disconnect();
        return { frames, outran, longTasks };
      };
      const max = () => el.scrollHeight - el.clientHeight;
      let dir = 1;
      let turns = 0;
      const sweep = await record(() => {
        el.scrollTop = Math.max(0, Math.min(max(), el.scrollTop + dir * px));
        // Checked at the leading edge right after the move, before the scroll event lets the
        // grid draw new rows: what a scroll driven by the compositor (a wheel or a fling)
        // would show for a frame if the page's own thread fell behind.
        const covered = rowAt(dir === 1 ? box.bottom - 4 : box.top + header + 4);
        if ((dir === 1 && el.scrollTop >= max() - 1) || (dir === -1 && el.scrollTop <= 0)) {
          dir = -dir;
          turns++;
        }
        return turns >= 2 ? false : covered ? true : 'outran';
      });
      // Jumps to rows spread over the grid in a fixed scattered order (a dragged scrollbar);
      // none lands on the first row, where the sweep ended.
      const jump = await record((frame) => {
        el.scrollTop = Math.round((((frame * 37) % jumpCount) + 0.5) / jumpCount * max());
        return frame < jumpCount - 1;
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
    await browser?.close();
    await app.stop();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) void benchGrid();
