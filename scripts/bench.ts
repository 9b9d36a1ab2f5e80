/**
 * `npm run bench`: the cost roll against the floor of reading the same rows, at 100, 1,000
 * and 10,000 lines (each line its own part with 4 quotes × 5 price breaks), in the private
 * test cluster. One JSON line per size, with the totals-only roll the running panel reads
 * after an edit. Targets (2-core machine): ratio ≤ 2 at 1,000 and
 * 10,000 lines, a 10,000-line roll under 1 s, a 12-quantity curve ≤ 1.5 × one quantity.
 * Then the costed workbook of 5,000 lines and the Lines grid of 2,000 (`bench-grid.ts`).
 */
import { performance } from 'node:perf_hooks';
import { prepareDatabase } from './lib/database';
import { createDb, type Db } from '../server/db/knex';
import { migrateLatest } from '../server/db/migrate';
import { costOf, costTotalsOf, curveOf, defaultCurve } from '../server/boms/cost';
import { getBom } from '../server/boms/repository';
import type { Deps } from '../server/deps';
import { Writable } from 'node:stream';
import { loadExportData } from '../server/export/load';
import { writeCostedBom } from '../server/export/workbook';
import { benchGrid } from './bench-grid';

const sizes = (process.env.BENCH_SIZES ?? '100,1000,10000').split(',').map(Number);
// Small sizes take milliseconds, so they get more runs for a steady median.
const runsFor = (lines: number) => Number(process.env.BENCH_RUNS ?? (lines >= 10000 ? 7 : 15));
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
let peakRss = 0;
const sample = () => (peakRss = Math.max(peakRss, process.memoryUsage().rss));
const sampler = setInterval(sample, 5);

async function time(fn: () => Promise<unknown>): Promise<number> {
  const t0 = performance.now();
  await fn();
  return performance.now() - t0;
}

async function generate(db: Db, lines: number) {
  const [ws] = await db('workspaces').insert({ name: `Bench ${lines}`, plan: 'factory', billingStatus: 'active' }).returning('id');
  const w = ws.id;
  const suppliers = await db('suppliers')
    .insert(['CNY', 'USD', 'EUR', 'USD'].map((currency, i) => ({ workspaceId: w, name: `Bench supplier ${i}`, country: 'CN', currency, defaultIncoterm: 'FOB' })))
    .returning(['id', 'currency']);
  const today = new Date().toISOString().slice(0, 10);
  await db('fx_rates').insert([
    { workspaceId: w, date: today, base: 'EUR', quote: 'USD', rate: '1.08' },
    { workspaceId: w, date: today, base: 'EUR', quote: 'CNY', rate: '7.80' },
    { workspaceId: w, date: today, base: 'EUR', quote: 'GBP', rate: '0.845' },
  ]);
  const [profile] = await db('landed_cost_profiles').insert({
    workspaceId: w, name: 'Bench profile', currency: 'GBP', originPct: '1.5', freightPerShipment: '420', freightCurrency: 'USD', shipments: 1,
    insurancePct: '0.3', dutyBasis: 'CIF', dutyRates: JSON.stringify([{ hsPrefix: '8533', ratePct: '0' }, { hsPrefix: '85', ratePct: '2.5' }]),
    defaultDutyPct: '3.7', feesPerShipment: '95', destinationPct: '1', attritionPct: JSON.stringify({ resistor: '2' }), smtRatePerPlacement: '0.0012',
  }).returning('id');
  const { rows } = await db.raw(`SELECT nextval(pg_get_serial_sequence('boms', 'id')) AS id`);
  const bomId = String(rows[0].id);
  await db('boms').insert({ id: bomId, familyId: bomId, workspaceId: w, name: `Bench BOM ${lines}`, reportingCurrency: 'GBP', profileId: profile.id, plannedQty: 10000, shelf: '{}' });
  for (let start = 0; start < lines; start += 1000) {
    const n = Math.min(1000, lines - start);
    const parts = await db('parts')
      .insert(Array.from({ length: n }, (_, k) => ({ workspaceId: w, internalPn: `B-${start + k}`, mpn: `BM-${start + k}`, category: 'resistor', mount: 'smt', pins: 2, hsCode: '85332100', ratings: '{}' })))
      .returning('id');
    const quotes = await db('quotes')
      .insert(parts.flatMap((p: { id: string }) => suppliers.map((s: { id: string; currency: string }, q: number) => ({
        workspaceId: w, partId: p.id, supplierId: s.id, currency: s.currency, incoterm: ['FOB', 'EXW', 'DAP', 'CIF'][q], moq: 1000 * (q + 1), orderMultiple: 1000, leadTimeDays: 14 + q,
      }))))
      .returning('id');
    const breaks = quotes.flatMap((q: { id: string }, i: number) => [1000, 5000, 10000, 50000, 100000].map((minQty, b) => ({ workspaceId: w, quoteId: q.id, minQty, unitPrice: (0.002 * (1 + (i % 7) / 10) * (1 - b * 0.1)).toFixed(6) })));
    for (let i = 0; i < breaks.length; i += 5000) await db('price_breaks').insert(breaks.slice(i, i + 5000));
    await db('bom_lines').insert(parts.map((p: { id: string }, k: number) => ({ workspaceId: w, bomId, position: start + k, partId: p.id, qtyPerUnit: String(1 + ((start + k) % 4)), refDes: `R${start + k}` })));
  }
  return { workspaceId: w, bomId };
}

/** The floor: the same rows read with plain SELECTs and nothing computed. */
async function bareSelect(db: Db, workspaceId: string, bomId: string) {
  const lines = await db('bom_lines').where({ workspaceId, bomId }).select('*');
  const partIds = lines.map((l: { partId: string }) => l.partId);
  await db('parts').where({ workspaceId }).andWhereRaw('id = ANY(?::bigint[])', [partIds]).select('*');
  const quotes = await db('quotes').where({ workspaceId }).andWhereRaw('part_id = ANY(?::bigint[])', [partIds]).select('*');
  await db('price_breaks').where({ workspaceId }).andWhereRaw('quote_id = ANY(?::bigint[])', [quotes.map((q: { id: string }) => q.id)]).select('*');
}

async function main() {
  const database = prepareDatabase({ folder: 'pg-test', port: Number(process.env.FARTHING_TEST_PG_PORT ?? 54339), database: 'postgres', log: (s) => console.error(s) });
  const admin = createDb(database.url);
  await admin.raw('DROP DATABASE IF EXISTS farthing_bench WITH (FORCE)');
  await admin.raw('CREATE DATABASE farthing_bench');
  await admin.destroy();
  const db = createDb(database.url.replace(/\/[^/]*$/, '/farthing_bench'));
  try {
    await migrateLatest(db);
    const deps = { db } as unknown as Deps;
    for (const size of sizes) {
      const { workspaceId, bomId } = await generate(db, size);
      // Planner statistics as autovacuum would have them on a live database: without them
      // the timings depend on whether its analyze happened to run mid-benchmark.
      await db.raw('ANALYZE');
      const bom = await getBom(db, workspaceId, bomId);
      const runs = runsFor(size);
      // Each measured operation runs before it is timed, as in a server that has served it
      // before: otherwise the first timed runs of the curve and the totals-only roll pay
      // for V8 compiling their code, which at 100 lines is most of their time.
      for (let i = 0; i < (size >= 10000 ? 1 : 3); i++) {
        await bareSelect(db, workspaceId, bomId);
        await costOf(db, workspaceId, bom);
        await curveOf(deps, workspaceId, bomId, defaultCurve(bom.plannedQty));
        await costTotalsOf(db, workspaceId, bom);
      }
      const roll: number[] = [];
      const floor: number[] = [];
      const curve: number[] = [];
      const panel: number[] = [];
      for (let i = 0; i < runs; i++) {
        floor.push(await time(() => bareSelect(db, workspaceId, bomId)));
        roll.push(await time(() => costOf(db, workspaceId, bom)));
        curve.push(await time(() => curveOf(deps, workspaceId, bomId, defaultCurve(bom.plannedQty))));
        // What the running panel waits for after an edit (the roll-up is stale then).
        panel.push(await time(() => costTotalsOf(db, workspaceId, bom)));
      }
      sample();
      const r = median(roll);
      const f = median(floor);
      const c = median(curve);
      console.log(JSON.stringify({
        lines: size, quotesPerPart: 4, breaksPerQuote: 5, runs,
        costRollMedianMs: Math.round(r), bareSelectMedianMs: Math.round(f), ratio: Number((r / f).toFixed(2)),
        curve12MedianMs: Math.round(c), curveOverOneRoll: Number((c / r).toFixed(2)), totalsOnlyMedianMs: Math.round(median(panel)), peakRssMb: Math.round(peakRss / 1024 / 1024),
      }));
    }
    // The costed workbook of a 5,000-line BOM (issue: the export's figure lives here, not in a timed test).
    const exportLines = Number(process.env.BENCH_EXPORT_LINES ?? 5000);
    if (exportLines > 0) {
      const { workspaceId, bomId } = await generate(db, exportLines);
      let bytes = 0;
      const sink = new Writable({ write: (chunk: Buffer, _enc, done) => ((bytes += chunk.length), done()) });
      const t0 = performance.now();
      const data = await loadExportData(db, workspaceId, bomId);
      const loaded = performance.now();
      await writeCostedBom(sink, data);
      const done = performance.now();
      sample();
      console.log(JSON.stringify({ export: 'costed BOM workbook', lines: exportLines, loadMs: Math.round(loaded - t0), writeMs: Math.round(done - loaded), totalMs: Math.round(done - t0), bytes, peakRssMb: Math.round(peakRss / 1024 / 1024) }));
    }
  } finally {
    clearInterval(sampler);
    await db.destroy();
    database.stop();
  }
  // The Lines grid of a 2,000-line BOM in Chromium (BENCH_GRID_LINES=0 leaves it out).
  if (Number(process.env.BENCH_GRID_LINES ?? 2000) > 0) await benchGrid();
}

void main();
