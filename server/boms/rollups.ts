import type { Knex } from 'knex';
import type { DbOrTrx } from '../db/knex';
import type { Deps } from '../deps';
import { scoped } from '../db/scope';
import { today } from '../quotes/repository';
import { costOf, costTotalsOf, type CostView } from './cost';
import { getBom, type BomRow } from './repository';
import { releaseGuards } from './release-guards';
import { RawJson } from '../http/raw-json';
import { compressBoth, type Encoding } from '../http/encoding';
import { stressOf, withWaivers, type StressCheckView } from '../stress/service';
import { errors } from '../http/errors';

type StressCheck = NonNullable<Awaited<ReturnType<typeof releaseGuards.stressCheck>>>;

/**
 * The stress check kept with a roll-up, without waivers (they are read per request), and
 * its tally for the BOM list; both null when the workspace has no stress policy.
 */
export type StoredStress = { tally: StressCheck['summary'] | null; check: StressCheck | null };

export const ROLLUP_QUEUE = 'cost-rollup';

/**
 * A roll-up whose compressed answers and tally belong to its result: written together by
 * this code, in one statement. A row written by older code lacks them, or (updated by an
 * older server during a rolling deploy) holds another computation's, and is computed
 * again. Saying so opens no stored answer.
 */
const STORED_COMPLETE = 'r.result_br IS NOT NULL AND r.answers_computed_at = r.computed_at';

export interface RollupRow {
  bomId: string;
  workspaceId: string;
  epoch: string;
  costingDate: string;
  qty: number;
  currency: string;
  landedPerUnit: string | null;
  targetUnitCost: string | null;
  leftOut: number;
  warnings: number;
  totals: unknown;
  /** The stored stress tally; null without a stress policy. */
  stressTally: StoredStress['tally'];
  /** False on a roll-up stored before the stress check was kept with it. */
  hasStress: boolean;
  computedAt?: Date;
}

/**
 * The stored cost roll of each BOM at its planned quantity and today's date, with its
 * stress check (no waivers) and tally. It is fresh while the workspace's costing epoch (bumped by triggers on
 * every input: lines, parts, quotes, price breaks, suppliers, rates, profiles, BOMs,
 * stress policies; a line's note is not an input) and the date and quantity still
 * match. Reads never wait for a recompute once a roll-up exists: a stale one is served
 * marked `fresh: false` and a refresh is queued; writes queue a refresh too.
 */
export async function epochOf(db: DbOrTrx, workspaceId: string): Promise<string> {
  const ws = await db('workspaces').where({ id: workspaceId }).first('costingEpoch');
  return String(ws?.costingEpoch ?? 0);
}

const isFresh = (r: { epoch: string; costingDate: string; qty: number } | undefined, epoch: string, bom: BomRow) =>
  Boolean(r && String(r.epoch) === epoch && r.costingDate === today() && r.qty === bom.plannedQty);

// Concurrent requests for the same roll in this process share one computation.
const inFlight = new Map<string, Promise<{ cost: CostView; stress: StoredStress }>>();

/** Computes and stores the roll-up of one BOM (the whole result, its totals, its stress check and tally). */
export async function refreshRollup(db: Knex, workspaceId: string, bom: BomRow, epoch?: string): Promise<CostView> {
  return (await computeRollup(db, workspaceId, bom, epoch)).cost;
}

async function computeRollup(db: Knex, workspaceId: string, given: BomRow, epoch?: string): Promise<{ cost: CostView; stress: StoredStress }> {
  const e = epoch ?? (await epochOf(db, workspaceId));
  const key = `${workspaceId}:${given.id}:${e}:${given.plannedQty}:${today()}`;
  const running = inFlight.get(key);
  if (running) return running;
  const work = (async () => {
    // The BOM as it stands now, read after the epoch: a row read before it could miss an
    // edit (ambient, policy, profile) that the epoch already counts, and be stored as fresh.
    const bom = await getBom(db, workspaceId, given.id);
    const [cost, check] = await Promise.all([costOf(db, workspaceId, bom), releaseGuards.stressCheck(db, workspaceId, bom)]);
    const stress: StoredStress = { tally: check?.summary ?? null, check };
    const resultText = JSON.stringify(cost);
    const checkText = JSON.stringify(check);
    // Compressed once here (on libuv's threads), not on every read.
    const [result, checked] = await Promise.all([compressBoth(resultText), check ? compressBoth(checkText) : null]);
    const row = {
      bomId: bom.id, workspaceId, epoch: e, costingDate: cost.date, qty: bom.plannedQty, currency: bom.reportingCurrency,
      landedPerUnit: cost.totals.landedPerUnit, targetUnitCost: bom.targetUnitCost, leftOut: cost.leftOut.count,
      warnings: cost.warnings.length + cost.lineWarningCount,
      totals: JSON.stringify(cost.totals), result: resultText, stress: `{"tally":${JSON.stringify(stress.tally)},"check":${checkText}}`, stressTally: JSON.stringify(stress.tally),
      resultGzip: result.gzip, resultBr: result.br, checkGzip: checked?.gzip ?? null, checkBr: checked?.br ?? null,
      // The same now() (the transaction's start) in both: see STORED_COMPLETE.
      computedAt: db.fn.now(), answersComputedAt: db.fn.now(),
    };
    await db('cost_rollups').insert(row).onConflict('bom_id').merge();
    return { cost, stress };
  })();
  inFlight.set(key, work);
  try {
    return await work;
  } finally {
    inFlight.delete(key);
  }
}

/**
 * The BOM list's read in one statement: the workspace's BOMs (optionally by name), each
 * with its line count and stored roll-up (no results: what the list shows), and the
 * costing epoch. A roll-up without its brotli form was stored by older code (before the
 * stress check and the compressed forms were kept with it): its `hasStress` is false, and
 * it is computed again.
 */
export async function bomsWithRollups(db: DbOrTrx, workspaceId: string, nameLike?: string) {
  const { rows } = (await db.raw(
    `SELECT b.*, (SELECT count(*) FROM bom_lines l WHERE l.workspace_id = b.workspace_id AND l.bom_id = b.id)::int AS "lineCount",
            w.costing_epoch AS "workspaceEpoch", r.epoch AS "rEpoch", to_char(r.costing_date, 'YYYY-MM-DD') AS "rCostingDate", r.qty AS "rQty",
            r.currency AS "rCurrency", r.landed_per_unit AS "rLandedPerUnit", r.target_unit_cost AS "rTargetUnitCost", r.left_out AS "rLeftOut",
            r.warnings AS "rWarnings", r.stress_tally AS "rStressTally", ${STORED_COMPLETE} AS "rHasStress"
       FROM boms b JOIN workspaces w ON w.id = b.workspace_id
       LEFT JOIN cost_rollups r ON r.bom_id = b.id AND r.workspace_id = b.workspace_id
      WHERE b.workspace_id = ? ${nameLike === undefined ? '' : 'AND b.name ILIKE ?'}
      ORDER BY b.name, b.revision DESC`,
    nameLike === undefined ? [workspaceId] : [workspaceId, nameLike],
  )) as { rows: Record<string, unknown>[] };
  let epoch = '0';
  const boms: BomRow[] = [];
  const lineCount = new Map<string, number>();
  const byBom = new Map<string, RollupRow>();
  for (const row of rows) {
    const { lineCount: n, workspaceEpoch, rEpoch, rCostingDate, rQty, rCurrency, rLandedPerUnit, rTargetUnitCost, rLeftOut, rWarnings, rStressTally, rHasStress, ...bom } = row;
    epoch = String(workspaceEpoch);
    const b = bom as unknown as BomRow;
    boms.push(b);
    lineCount.set(b.id, n as number);
    if (rEpoch !== null) {
      byBom.set(b.id, {
        bomId: b.id, workspaceId, epoch: String(rEpoch), costingDate: rCostingDate as string, qty: rQty as number, currency: rCurrency as string,
        landedPerUnit: rLandedPerUnit as string | null, targetUnitCost: rTargetUnitCost as string | null, leftOut: rLeftOut as number, warnings: rWarnings as number,
        totals: undefined, stressTally: rStressTally as StoredStress['tally'], hasStress: Boolean(rHasStress),
      });
    }
  }
  // With no BOM the epoch is not needed: nothing is stale.
  return { boms, lineCount, read: { epoch, byBom } };
}

/** For the BOM list: stored roll-ups, computing only those that never existed. */
export async function rollupsFor(deps: Deps, workspaceId: string, boms: BomRow[], read: { epoch: string; byBom: Map<string, RollupRow> }) {
  const { epoch, byBom } = read;
  const out = new Map<string, RollupRow & { fresh: boolean }>();
  let stale = false;
  for (const bom of boms) {
    const r = byBom.get(bom.id);
    // A stored roll-up is served even when stale or incomplete (stored by older code), and
    // refreshed behind: a list of many BOMs never waits for their rolls. Only one that
    // never existed is computed now.
    if (r) {
      const fresh = r.hasStress && isFresh(r, epoch, bom);
      stale ||= !fresh;
      out.set(bom.id, { ...r, fresh });
      continue;
    }
    const { cost, stress } = await computeRollup(deps.db, workspaceId, bom, epoch);
    out.set(bom.id, {
      bomId: bom.id, workspaceId, epoch, costingDate: cost.date, qty: bom.plannedQty, currency: bom.reportingCurrency, landedPerUnit: cost.totals.landedPerUnit,
      targetUnitCost: bom.targetUnitCost, leftOut: cost.leftOut.count, warnings: cost.warnings.length + cost.lineWarningCount, totals: cost.totals,
      stressTally: stress.tally, hasStress: true, fresh: true,
    });
  }
  if (stale) await queueRefresh(deps, workspaceId);
  return out;
}

type StoredText = { epoch: string; costingDate: string; qty: number; complete: boolean; text?: string | null; bytes?: Buffer | null };

/**
 * The BOM, its workspace's costing epoch and one stored part of its roll-up, in one
 * statement (one round trip under load, not three, and one snapshot): compressed when the
 * client takes an encoding, else as text. With `waivers`, whether the BOM has any; then
 * the stored check comes as text (the waivers are added to it).
 */
async function readPlanned(db: DbOrTrx, workspaceId: string, bomId: string, part: { text: string; compressed?: string; waivers?: boolean }) {
  // Whether the BOM has waivers, looked up once (LATERAL) and used three times below.
  const waivers = part.waivers
    ? 'CROSS JOIN LATERAL (SELECT EXISTS (SELECT 1 FROM stress_waivers sw WHERE sw.workspace_id = b.workspace_id AND sw.bom_id = b.id) AS any) wv'
    : '';
  const waived = part.waivers ? 'wv.any' : 'false';
  const answer = part.compressed
    ? `CASE WHEN ${waived} THEN ${part.text} END AS "storedText", CASE WHEN NOT ${waived} THEN r.${part.compressed} END AS "storedBytes"`
    : `${part.text} AS "storedText"`;
  const { rows } = (await db.raw(
    `SELECT b.*, w.costing_epoch AS "workspaceEpoch", r.epoch AS "storedEpoch", to_char(r.costing_date, 'YYYY-MM-DD') AS "storedDate", r.qty AS "storedQty",
            ${STORED_COMPLETE} AS "storedComplete", ${waived} AS "waived", ${answer}
       FROM boms b JOIN workspaces w ON w.id = b.workspace_id
       LEFT JOIN cost_rollups r ON r.bom_id = b.id AND r.workspace_id = b.workspace_id
       ${waivers}
      WHERE b.workspace_id = ? AND b.id = ?`,
    [workspaceId, bomId],
  )) as { rows: Record<string, unknown>[] };
  if (!rows[0]) throw errors.notFound('BOM');
  const { workspaceEpoch, storedEpoch, storedDate, storedQty, storedComplete, storedText, storedBytes, waived: hasWaiver, ...bom } = rows[0];
  const stored: StoredText | undefined = storedEpoch === null
    ? undefined
    : { epoch: String(storedEpoch), costingDate: storedDate as string, qty: storedQty as number, complete: Boolean(storedComplete), text: storedText as string | null, bytes: storedBytes as Buffer | null };
  return { bom: bom as unknown as BomRow, epoch: String(workspaceEpoch ?? 0), stored, waived: Boolean(hasWaiver) };
}

function freshAnswer(s: StoredText | undefined, epoch: string, bom: BomRow, encoding: Encoding | null = null): RawJson | null {
  if (!s?.complete || !isFresh(s, epoch, bom)) return null;
  if (s.bytes && encoding) return new RawJson('', { encoding, bytes: s.bytes });
  return s.text ? new RawJson(s.text) : null;
}

/**
 * The cost roll at the planned quantity today: the stored one when fresh (sent as it is
 * stored, in the encoding the client takes or as text), else computed and stored.
 */
export async function plannedCost(deps: Deps, workspaceId: string, bomId: string, encoding: Encoding | null = null, askedQty?: number): Promise<CostView | RawJson> {
  const { bom, epoch, stored } = await readPlanned(deps.db, workspaceId, bomId, { text: 'r.result::text', compressed: encoding ? `result_${encoding}` : undefined });
  // Asked for a quantity that was the planned one a moment ago: it still answers at that quantity.
  if (askedQty !== undefined && askedQty !== bom.plannedQty) return costOf(deps.db, workspaceId, bom, askedQty);
  return freshAnswer(stored, epoch, bom, encoding) ?? refreshRollup(deps.db, workspaceId, bom, epoch);
}

/**
 * The totals at the planned quantity today, for the running panel: the stored roll-up
 * without its lines when fresh, else the totals-only roll (not stored: the refresh it
 * queues stores the whole one).
 */
export async function plannedTotals(deps: Deps, workspaceId: string, bomId: string): Promise<CostView | RawJson> {
  const { bom, epoch, stored } = await readPlanned(deps.db, workspaceId, bomId, { text: `jsonb_set(r.result, '{lines}', '[]')::text` });
  const fresh = freshAnswer(stored, epoch, bom);
  if (fresh) return fresh;
  await queueRefresh(deps, workspaceId);
  return costTotalsOf(deps.db, workspaceId, bom);
}

/**
 * The stress check: the one stored with a fresh roll-up, with the waivers read now (sent
 * as stored when the BOM has none); with a stale roll-up, checked now and a refresh
 * queued; with none, the roll-up is computed and stored first.
 */
export async function plannedStress(deps: Deps, workspaceId: string, bomId: string, encoding: Encoding | null = null): Promise<StressCheckView | RawJson> {
  const { bom, epoch, stored, waived } = await readPlanned(deps.db, workspaceId, bomId, { text: `(r.stress -> 'check')::text`, compressed: encoding ? `check_${encoding}` : undefined, waivers: true });
  const fresh = freshAnswer(stored, epoch, bom, encoding);
  if (fresh && fresh.text !== 'null') return waived ? withWaivers(deps.db, workspaceId, JSON.parse(fresh.text) as StressCheckView) : fresh;
  // Stored as null: the workspace has no stress policy (stressOf says so, 409).
  if (fresh || (stored?.complete && isFresh(stored, epoch, bom))) return stressOf(deps.db, workspaceId, bom);
  if (stored) {
    // Stale: checked now (no cost roll to wait for) and the roll-up refreshed behind.
    await queueRefresh(deps, workspaceId);
    return stressOf(deps.db, workspaceId, bom);
  }
  // Never stored: the roll-up is computed once for all who ask meanwhile, and stored.
  const { stress } = await computeRollup(deps.db, workspaceId, bom, epoch);
  if (!stress.check) return stressOf(deps.db, workspaceId, bom);
  return waived ? withWaivers(deps.db, workspaceId, structuredClone(stress.check)) : stress.check;
}

/** Queues one refresh of a workspace's stale roll-ups (at most one waiting per workspace). */
export async function queueRefresh(deps: Deps, workspaceId: string): Promise<void> {
  await deps.queue.ready;
  await deps.queue.boss.send(ROLLUP_QUEUE, { workspaceId }, { singletonKey: `rollup:${workspaceId}`, singletonSeconds: 1, retryLimit: 3 }).catch(() => undefined);
}

/** The worker: recomputes every stale roll-up of the workspace. */
export async function refreshWorkspace(deps: Deps, workspaceId: string): Promise<number> {
  const epoch = await epochOf(deps.db, workspaceId);
  const boms = (await scoped(deps.db, 'boms', workspaceId)) as BomRow[];
  const stored = (await scoped(deps.db, 'cost_rollups', workspaceId)
    // Read without opening the stored answers (large ones take long to decompress).
    .select('bomId', 'epoch', deps.db.raw(`to_char(costing_date, 'YYYY-MM-DD') as costing_date`), 'qty', deps.db.raw(`${STORED_COMPLETE.replaceAll('r.', '')} AS has_stress`))) as RollupRow[];
  const byBom = new Map(stored.map((r) => [r.bomId, r]));
  let n = 0;
  for (const bom of boms) {
    const r = byBom.get(bom.id);
    // One stored by older code (without the stress check or the compressed forms) counts as stale.
    if (r?.hasStress && isFresh(r, epoch, bom)) continue;
    await refreshRollup(deps.db, workspaceId, bom, epoch);
    n++;
  }
  return n;
}
