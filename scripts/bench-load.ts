/**
 * `npm run bench:load`: the app on the test cluster with the demo data and a generated
 * 1,000-line BOM, driven on loopback by autocannon at 50 connections for a bounded time:
 * signed-in reads (BOM list, lines, cost roll, stress check, quote board) and writes (line
 * edits). Two consecutive runs; prints throughput, p50/p99 per route, errors and the
 * server's memory 10 s after each run, as JSON (also written to .data/bench-load.json).
 * Targets: 0 errors, p99 under 250 ms for reads, no memory growth between the runs.
 */
import { spawn } from 'node:child_process';
import { readFileSync, writeFileSync, mkdirSync } from 'node:fs';
import autocannon from 'autocannon';
import { prepareDatabase } from './lib/database';
import { createDb } from '../server/db/knex';
import { migrateLatest, seedConfig } from '../server/db/migrate';
import { startMailSink } from '../server/mail/sink';
import { startS3Fake } from '../server/files/s3-fake';
import { demoPassword } from '../seeds/01_demo_workspace';

const seconds = Math.min(60, Number(process.env.LOAD_SECONDS ?? 20));
const connections = Number(process.env.LOAD_CONNECTIONS ?? 50);
const port = Number(process.env.LOAD_PORT ?? 4180);
const base = `http://127.0.0.1:${port}`;

async function main() {
  const database = prepareDatabase({ folder: 'pg-test', port: Number(process.env.FARTHING_TEST_PG_PORT ?? 54339), database: 'postgres', log: (s) => console.error(s) });
  const admin = createDb(database.url);
  await admin.raw('DROP DATABASE IF EXISTS farthing_load WITH (FORCE)');
  await admin.raw('CREATE DATABASE farthing_load');
  await admin.destroy();
  const url = database.url.replace(/\/[^/]*$/, '/farthing_load');
  const db = createDb(url);
  await migrateLatest(db);
  await db.seed.run(seedConfig);
  // A generated 1,000-line BOM over the demo library.
  const ws = await db('workspaces').where('name', 'like', 'Tinbell%').first('id');
  const parts = (await db('parts').where({ workspaceId: ws.id }).whereIn('category', ['resistor', 'capacitor', 'diode', 'led', 'bjt', 'mosfet']).select('id')) as { id: string }[];
  const profile = await db('landed_cost_profiles').where({ workspaceId: ws.id }).first('id');
  const { rows } = await db.raw(`SELECT nextval(pg_get_serial_sequence('boms', 'id')) AS id`);
  const bomId = String(rows[0].id);
  await db('boms').insert({ id: bomId, familyId: bomId, workspaceId: ws.id, name: 'Load test BOM (1,000 lines)', reportingCurrency: 'GBP', profileId: profile.id, plannedQty: 20000, shelf: '{}' });
  await db('bom_lines').insert(Array.from({ length: 1000 }, (_, i) => ({ workspaceId: ws.id, bomId, position: i, partId: parts[i % parts.length].id, qtyPerUnit: '1', refDes: `X${i + 1}`, opVoltageV: 3 + (i % 10) })));
  const lineIds = ((await db('bom_lines').where({ bomId }).orderBy('position').select('id')) as { id: string }[]).map((l) => l.id);
  const boardPart = parts[0].id;
  await db.destroy();

  const sink = await startMailSink();
  const s3 = await startS3Fake({ directory: '.data/s3-load', bucket: 'farthing' });
  // LOAD_NODE_ARGS, e.g. "--cpu-prof --cpu-prof-dir=.data/profiles", profiles the server under load.
  const nodeArgs = (process.env.LOAD_NODE_ARGS ?? '').split(' ').filter(Boolean);
  const server = spawn(process.execPath, [...nodeArgs, '--import', 'tsx', 'server/index.ts'], {
    env: { ...process.env, NODE_ENV: 'production', DATABASE_URL: url, PORT: String(port), PUBLIC_URL: base, SESSION_SECRET: 'load-test-secret-0123456789', SMTP_PORT: String(sink.smtpPort), S3_ENDPOINT: `http://127.0.0.1:${s3.port}`, SERVE_CLIENT: 'false', LOG_LEVEL: 'error', RATE_LIMIT_AUTH_PER_MINUTE: '1000' },
    stdio: ['ignore', 'inherit', 'inherit', 'ipc'],
  });
  // Should this script die early (Ctrl-C, a closed pipe), the server and the cluster go with it.
  process.once('exit', () => {
    server.kill('SIGKILL');
    database.stop();
  });
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGPIPE'] as const) process.once(signal, () => process.exit(130));
  await new Promise<void>((resolve, reject) => {
    server.once('message', () => resolve());
    server.once('exit', (c) => reject(new Error(`server exited ${c}`)));
  });
  // The server's memory: its processes' together (one per core under NODE_ENV=production).
  const rssOf = (pid: number) => Number(/VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'))![1]) / 1024;
  const childrenOf = (pid: number) => readFileSync(`/proc/${pid}/task/${pid}/children`, 'utf8').split(' ').filter(Boolean).map(Number);
  const rss = () => [server.pid!, ...childrenOf(server.pid!)].reduce((mb, pid) => mb + rssOf(pid), 0);

  try {
    const login = await fetch(`${base}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json', 'x-requested-with': 'farthing' }, body: JSON.stringify({ email: 'owner@tinbell.example', password: demoPassword }) });
    const cookie = (login.headers.get('set-cookie') ?? '').split(';')[0];
    // As a browser sends them: it always offers gzip (stored answers go compressed then).
    const headers = { cookie, 'x-requested-with': 'farthing', 'content-type': 'application/json', 'accept-encoding': 'gzip, deflate, br' };
    const versions = new Map<string, number>(lineIds.map((id) => [id, 1]));
    let nextLine = 0;
    const routes: { name: string; share: number; opts: Partial<autocannon.Options> }[] = [
      { name: 'GET /api/boms', share: 10, opts: { url: `${base}/api/boms` } },
      {
        // As the grid reads them: page after page (500 lines each), then from the start again.
        name: 'GET /api/boms/:id/lines', share: 9,
        opts: {
          requests: [{
            method: 'GET',
            setupRequest: (req: Record<string, unknown>, context: Record<string, unknown>) => ({ ...req, path: `/api/boms/${bomId}/lines${context.cursor ? `?cursor=${context.cursor as string}` : ''}` }),
            onResponse: (status: number, body: string, context: Record<string, unknown>) => {
              context.cursor = status === 200 ? /"nextCursor":"([^"]+)"\}$/.exec(body.slice(-80))?.[1] : undefined;
            },
          }] as unknown as autocannon.Request[],
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
            // Each connection edits a line of its own, so edits never race on a version.
            setupRequest: (req: Record<string, unknown>, context: Record<string, unknown>) => {
              context.line ??= lineIds[nextLine++ % lineIds.length];
              const id = context.line as string;
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
    const results: unknown[] = [];
    for (const run of [1, 2]) {
      const outs = await Promise.all(
        routes.map((r) =>
          autocannon({ url: base, connections: r.share, duration: seconds, headers, ...r.opts } as autocannon.Options).then((o) => ({
            route: r.name, connections: r.share, requests: o.requests.total, throughputPerSec: Math.round(o.requests.average),
            p50Ms: o.latency.p50, p99Ms: o.latency.p99, errors: o.errors + o.timeouts + o.non2xx,
          })),
        ),
      );
      // The memory after the load has settled (V8 shrinks the heap some seconds after the
      // server goes idle), so two runs compare like with like rather than wherever a
      // collection happened to stand.
      await new Promise((r) => setTimeout(r, 10_000));
      const summary = {
        run, seconds, connections, totalRequests: outs.reduce((n, o) => n + o.requests, 0),
        throughputPerSec: outs.reduce((n, o) => n + o.throughputPerSec, 0), errors: outs.reduce((n, o) => n + o.errors, 0),
        serverRssMb: Math.round(rss()), serverProcesses: childrenOf(server.pid!).length || 1, routes: outs,
      };
      console.log(JSON.stringify(summary));
      results.push(summary);
    }
    mkdirSync('.data', { recursive: true });
    writeFileSync('.data/bench-load.json', JSON.stringify({ date: new Date().toISOString().slice(0, 10), results }, null, 2));
  } finally {
    server.kill('SIGTERM');
    await new Promise((r) => server.once('exit', r));
    await sink.close();
    await s3.close();
    database.stop();
  }
}

void main();
