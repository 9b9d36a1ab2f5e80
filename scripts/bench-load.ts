/**
 * `npm run bench:load`: the app on the test cluster with the demo data and a generated
 * 1,000-line BOM, driven on loopback by autocannon at 50 connections for a bounded time:
 * signed-in reads (BOM list, lines, cost roll, stress check, quote board) and writes (line
 * edits). A 5-second warm-up (printed, not counted), then two consecutive runs; prints throughput, p50/p99 per route, errors and the
 * server's memory 10 s after each run, as JSON (also written to .data/bench-load.json).
 * Targets: 0 errors, p99 under 250 ms for reads, no memory growth between the runs.
 */
import { writeFileSync, mkdirSync } from 'node:fs';
import autocannon from 'autocannon';
import { startBenchApp } from './lib/bench-app';

const seconds = Math.min(60, Number(process.env.LOAD_SECONDS ?? 20));
const connections = Number(process.env.LOAD_CONNECTIONS ?? 50);
// The server's MAX_REQUESTS_PER_CONNECTION (its default unless set), given to it and to autocannon.
const maxPerConnection = Number(process.env.MAX_REQUESTS_PER_CONNECTION ?? 100);

async function main() {
  let bomId = '';
  let lineIds: string[] = [];
  let boardPart = '';
  const app = await startBenchApp({
    database: 'farthing_load',
    port: Number(process.env.LOAD_PORT ?? 4180),
    env: { MAX_REQUESTS_PER_CONNECTION: String(maxPerConnection) },
    // A generated 1,000-line BOM over the demo library.
    prepare: async (db) => {
      const ws = await db('workspaces').where('name', 'like', 'Tinbell%').first('id');
      const parts = (await db('parts').where({ workspaceId: ws.id }).whereIn('category', ['resistor', 'capacitor', 'diode', 'led', 'bjt', 'mosfet']).select('id')) as { id: string }[];
      const profile = await db('landed_cost_profiles').where({ workspaceId: ws.id }).first('id');
      const { rows } = await db.raw(`SELECT nextval(pg_get_serial_sequence('boms', 'id')) AS id`);
      bomId = String(rows[0].id);
      await db('boms').insert({ id: bomId, familyId: bomId, workspaceId: ws.id, name: 'Load test BOM (1,000 lines)', reportingCurrency: 'GBP', profileId: profile.id, plannedQty: 20000, shelf: '{}' });
      await db('bom_lines').insert(Array.from({ length: 1000 }, (_, i) => ({ workspaceId: ws.id, bomId, position: i, partId: parts[i % parts.length].id, qtyPerUnit: '1', refDes: `X${i + 1}`, opVoltageV: 3 + (i % 10) })));
      lineIds = ((await db('bom_lines').where({ bomId }).orderBy('position').select('id')) as { id: string }[]).map((l) => l.id);
      boardPart = parts[0].id;
    },
  });
  const base = app.base;

  try {
    const cookie = await app.signIn('owner@tinbell.example');
    // As a browser sends them: it always offers gzip (stored answers go compressed then).
    const headers = { cookie, 'x-requested-with': 'farthing', 'content-type': 'application/json', 'accept-encoding': 'gzip, deflate, br' };
    const versions = new Map<string, number>(lineIds.map((id) => [id, 1]));
    let nextLine = 0;
    // Second-page reads that did not end the list: a sign the pages were not read in turn.
    let lastPageMissed = 0;
    // autocannon drops the edits in flight when a run ends; the server may have saved them,
    // so before each run the versions are read back as a client that lost track would.
    const refreshVersions = async () => {
      let cursor: string | null = null;
      do {
        const res = await fetch(`${base}/api/boms/${bomId}/lines?limit=5000${cursor ? `&cursor=${cursor}` : ''}`, { headers: { cookie, 'x-requested-with': 'farthing' } });
        if (!res.ok) throw new Error(`reading the lines back answered ${res.status}`);
        const page = (await res.json()) as { items: { id: string; version: number }[]; nextCursor: string | null };
        for (const l of page.items) versions.set(l.id, l.version);
        cursor = page.nextCursor;
      } while (cursor);
    };
    const routes: { name: string; share: number; opts: Partial<autocannon.Options> }[] = [
      { name: 'GET /api/boms', share: 10, opts: { url: `${base}/api/boms` } },
      {
        // As the grid reads them: page after page (500 lines each), then from the start again.
        name: 'GET /api/boms/:id/lines', share: 9,
        opts: {
          // autocannon gives each connection a fresh context every time it starts the list
          // again, so the two pages are two requests of one list: the first page's cursor
          // is in the context when the second is made.
          requests: [
            {
              method: 'GET',
              path: `/api/boms/${bomId}/lines`,
              onResponse: (status: number, body: string, context: Record<string, unknown>) => {
                context.cursor = status === 200 ? /"nextCursor":"([^"]+)"\}$/.exec(body.slice(-80))?.[1] : undefined;
              },
            },
            {
              method: 'GET',
              setupRequest: (req: Record<string, unknown>, context: Record<string, unknown>) => ({ ...req, path: `/api/boms/${bomId}/lines${context.cursor ? `?cursor=${context.cursor as string}` : ''}` }),
              onResponse: (status: number, body: string) => {
                if (status === 200 && !body.endsWith('"nextCursor":null}')) lastPageMissed++;
              },
            },
          ] as unknown as autocannon.Request[],
        },
      },
      { name: 'GET /api/boms/:id/cost', share: 9, opts: { url: `${base}/api/boms/${bomId}/cost` } },
      { name: 'GET /api/boms/:id/stress', share: 9, opts: { url: `${base}/api/boms/${bomId}/stress` } },
      { name: 'GET /api/parts/:id/offers', share: 8, opts: { url: `${base}/api/parts/${boardPart}/offers?qty=10000` } },
      {
        name: 'PATCH /api/boms/:id/lines/:lineId', share: 5,
        opts: {
          requests: [{
            method: 'PATCH',
            // Each edit takes the next line in turn: an edit of a line comes a thousand edits
            // after the last, so edits never race on a version.
            setupRequest: (req: Record<string, unknown>) => {
              const id = lineIds[nextLine++ % lineIds.length];
              return { ...req, path: `/api/boms/${bomId}/lines/${id}`, body: JSON.stringify({ note: `edit ${Date.now()}`, version: versions.get(id) }) };
            },
            onResponse: (status: number, body: string) => {
              if (status === 200) {
                const l = JSON.parse(body) as { id: string; version: number };
                versions.set(l.id, l.version);
              }
            },
          }] as unknown as autocannon.Request[],
        },
      },
    ];
    // LOAD_ONLY="GET /api/boms" drives one route alone (to see what each costs).
    const only = process.env.LOAD_ONLY;
    if (only) routes.splice(0, routes.length, ...routes.filter((r) => r.name === only).map((r) => ({ ...r, share: connections })));
    // LOAD_SKIP="PATCH /api/boms/:id/lines/:lineId" leaves one route out (its connections idle).
    const skip = process.env.LOAD_SKIP;
    if (skip) routes.splice(0, routes.length, ...routes.filter((r) => r.name !== skip));
    // The server closes a connection after maxPerConnection requests; a browser then sends
    // its next request on a new one. autocannon ignores the header: it writes its next request
    // on the closing connection, where it is lost, and times every later answer on that
    // client from the request before it. So it is told to reconnect at the same count.
    const reconnectRate = maxPerConnection || undefined;
    const results: unknown[] = [];
    const drive = (duration: number) =>
      Promise.all(
        routes.map((r) =>
          autocannon({ url: base, connections: r.share, duration, headers, reconnectRate, ...r.opts } as autocannon.Options).then((o) => ({
            route: r.name, connections: r.share, requests: o.requests.total, throughputPerSec: Math.round(o.requests.average),
            p50Ms: o.latency.p50, p99Ms: o.latency.p99, errors: o.errors + o.timeouts + o.non2xx,
            // What the errors were: connection errors, timeouts, 4xx and 5xx answers.
            errorKinds: { connection: o.errors, timeouts: o.timeouts, '4xx': o['4xx'], '5xx': o['5xx'] }, statusCodes: (o as unknown as { statusCodeStats?: Record<string, { count: number }> }).statusCodeStats,
          })),
        ),
      );
    // A short warm-up, as a server has before it takes traffic behind a load balancer: V8
    // compiles the hot code, PostgreSQL reads the tables into its cache and the generated
    // BOM gets its first roll-up. Printed, not counted.
    const warmUpSeconds = Number(process.env.LOAD_WARMUP_SECONDS ?? 5);
    let warmUp: unknown = null;
    if (warmUpSeconds > 0) {
      const outs = await drive(warmUpSeconds);
      // Edits cut off when the warm-up ended may still be committing: let them finish.
      await new Promise((r) => setTimeout(r, 3000));
      warmUp = { run: 'warm-up', seconds: warmUpSeconds, errors: outs.reduce((n, o) => n + o.errors, 0), routes: outs.map((o) => ({ route: o.route, p50Ms: o.p50Ms, p99Ms: o.p99Ms, errors: o.errors })) };
      console.log(JSON.stringify(warmUp));
    }
    // LOAD_RUNS=5 runs more than the two the target compares, to follow memory over a longer soak.
    const runs = Math.max(2, Number(process.env.LOAD_RUNS ?? 2));
    for (let run = 1; run <= runs; run++) {
      await refreshVersions();
      lastPageMissed = 0;
      const outs = await drive(seconds);
      // The memory after the load has settled (V8 shrinks the heap some seconds after the
      // server goes idle), so two runs compare like with like rather than wherever a
      // collection happened to stand.
      await new Promise((r) => setTimeout(r, 10_000));
      const summary = {
        run, seconds, connections, totalRequests: outs.reduce((n, o) => n + o.requests, 0),
        throughputPerSec: outs.reduce((n, o) => n + o.throughputPerSec, 0), errors: outs.reduce((n, o) => n + o.errors, 0),
        serverRssMb: Math.round(app.rssMb()), serverRssByRoleMb: app.rssByRoleMb(), serverProcesses: app.processes(), linesSecondPagesNotLast: lastPageMissed, routes: outs,
      };
      console.log(JSON.stringify(summary));
      results.push(summary);
    }
    mkdirSync('.data', { recursive: true });
    writeFileSync('.data/bench-load.json', JSON.stringify({ date: new Date().toISOString().slice(0, 10), warmUp, results }, null, 2));
  } finally {
    await app.stop();
  }
}

void main();
