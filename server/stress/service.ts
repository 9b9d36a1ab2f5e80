import type { DbOrTrx, Trx } from '../db/knex';
import type { Deps } from '../deps';
import type { Auth } from '../http/route';
import { scoped } from '../db/scope';
import { errors } from '../http/errors';
import { checkBom, type StressLineInput } from '../derating';
import { linesOf, type BomRow, type LineRow } from '../boms/repository';
import { policyFor } from './policies';

export interface WaiverRow {
  id: string;
  lineId: string;
  policyId: string | null;
  reason: string;
  waivedBy: string | null;
  waivedByName: string | null;
  createdAt: Date;
}

export const operatingPointOf = (l: LineRow) => ({ voltageV: l.opVoltageV, currentA: l.opCurrentA, powerW: l.opPowerW, ambientC: l.opAmbientC });

type PartInfo = { id: string; category: string; ratings: Record<string, unknown>; internalPn: string; mpn: string };

async function partsById(db: DbOrTrx, workspaceId: string, ids: string[]) {
  if (!ids.length) return new Map<string, PartInfo>();
  const rows = (await scoped(db, 'parts', workspaceId).andWhereRaw('id = ANY(?::bigint[])', [ids]).select('id', 'category', 'ratings', 'internalPn', 'mpn')) as PartInfo[];
  return new Map(rows.map((p) => [p.id, p]));
}

export function stressInputs(lines: LineRow[], parts: Map<string, PartInfo>): StressLineInput[] {
  return lines
    .filter((l) => l.kind === 'part' && l.partId && !l.dnp)
    .map((l) => {
      const p = parts.get(l.partId!);
      return { lineId: l.id, refDes: l.refDes || null, partId: l.partId, category: p?.category, ratings: p?.ratings, operatingPoint: operatingPointOf(l) };
    });
}

export interface WaiverView {
  id: string;
  reason: string;
  waivedBy: string | null;
  createdAt: string;
}

/**
 * The stress check of one BOM under its policy, each line with its part's names and no
 * waiver yet: everything here follows the costing epoch, so the roll-up stores it.
 */
export async function stressCheckOf(db: DbOrTrx, workspaceId: string, bom: BomRow) {
  const [lines, policy] = await Promise.all([linesOf(db, workspaceId, bom.id), policyFor(db, workspaceId, bom.stressPolicyId)]);
  const parts = await partsById(db, workspaceId, [...new Set(lines.map((l) => l.partId).filter((x): x is string => Boolean(x)))]);
  const result = checkBom({ lines: stressInputs(lines, parts), policy: { id: policy.id, name: policy.name, limits: policy.limits }, bomAmbientC: Number(bom.ambientC) });
  return {
    ...result,
    bomId: bom.id,
    policyName: policy.name,
    ambientC: Number(bom.ambientC),
    lines: result.lines.map((l) => {
      const p = l.partId ? parts.get(l.partId) : undefined;
      return { ...l, internalPn: p?.internalPn ?? null, mpn: p?.mpn ?? null, waiver: null as WaiverView | null };
    }),
  };
}

export type StressCheckView = Awaited<ReturnType<typeof stressCheckOf>>;

/**
 * The check with the waivers that still hold. A waiver lapses when what it waived changes:
 * the line (operating point, part), the part's ratings, or the policy.
 */
export async function withWaivers(db: DbOrTrx, workspaceId: string, check: StressCheckView): Promise<StressCheckView> {
  const waivers = (await scoped(db, 'stress_waivers', workspaceId).andWhere({ bomId: check.bomId })
    .leftJoin('users', 'users.id', 'stress_waivers.waivedBy')
    .orderBy('stress_waivers.id', 'desc')
    .select('stress_waivers.id', 'stress_waivers.lineId', 'stress_waivers.policyId', 'stress_waivers.reason', 'stress_waivers.waivedBy', 'users.name as waivedByName', 'stress_waivers.createdAt')) as WaiverRow[];
  if (!waivers.length) return check;
  const lineIds = [...new Set(waivers.map((w) => w.lineId))];
  const lines = (await scoped(db, 'bom_lines', workspaceId).andWhereRaw('id = ANY(?::bigint[])', [lineIds]).select('id', 'partId', 'updatedAt')) as { id: string; partId: string | null; updatedAt: Date }[];
  const partIds = [...new Set(lines.map((l) => l.partId).filter((x): x is string => Boolean(x)))];
  const parts = partIds.length ? ((await scoped(db, 'parts', workspaceId).andWhereRaw('id = ANY(?::bigint[])', [partIds]).select('id', 'updatedAt')) as { id: string; updatedAt: Date }[]) : [];
  const lineById = new Map(lines.map((l) => [l.id, l]));
  const partChanged = new Map(parts.map((p) => [p.id, new Date(p.updatedAt).getTime()]));
  const waiverOf = new Map<string, WaiverRow>();
  for (const w of waivers) {
    if (waiverOf.has(w.lineId)) continue;
    const line = lineById.get(w.lineId);
    const at = new Date(w.createdAt).getTime();
    const partAt = line?.partId ? partChanged.get(line.partId) : undefined;
    const stillHolds = line && w.policyId === check.policyId && at >= new Date(line.updatedAt).getTime() && (partAt === undefined || at >= partAt);
    if (stillHolds) waiverOf.set(w.lineId, w);
  }
  return {
    ...check,
    lines: check.lines.map((l) => {
      const w = waiverOf.get(l.lineId);
      return w ? { ...l, waiver: { id: w.id, reason: w.reason, waivedBy: w.waivedByName, createdAt: new Date(w.createdAt).toISOString() } } : l;
    }),
  };
}

/** The stress check of one BOM under its policy, with each line's part and any waiver. */
export async function stressOf(db: DbOrTrx, workspaceId: string, bom: BomRow): Promise<StressCheckView> {
  return withWaivers(db, workspaceId, await stressCheckOf(db, workspaceId, bom));
}

/**
 * Release rule: no line over its rating, and every line beyond the policy carries a
 * written waiver. Checked inside the release transaction.
 */
export async function assertReleasable(trx: Trx, _deps: Deps, auth: Auth, bom: BomRow): Promise<void> {
  const s = await stressOf(trx, auth.workspaceId, bom);
  const over = s.lines.filter((l) => l.status === 'over_rating');
  if (over.length) {
    throw errors.conflict(
      `Release blocked: ${over.length} line(s) run beyond the part's absolute rating (${over.map((l) => l.refDes || l.internalPn).join(', ')}).`,
      over.map((l) => ({ path: `lines.${l.lineId}`, message: 'over rating' })),
    );
  }
  const unwaived = s.lines.filter((l) => l.status === 'beyond_policy' && !l.waiver);
  if (unwaived.length) {
    throw errors.conflict(
      `Release needs a written waiver for ${unwaived.length} line(s) beyond the policy (${unwaived.map((l) => l.refDes || l.internalPn).join(', ')}).`,
      unwaived.map((l) => ({ path: `lines.${l.lineId}`, message: 'beyond policy without a waiver' })),
    );
  }
}

export async function lineOf(db: DbOrTrx, workspaceId: string, bomId: string, lineId: string): Promise<LineRow> {
  const line = (await scoped(db, 'bom_lines', workspaceId).andWhere({ id: lineId, bomId }).first()) as LineRow | undefined;
  if (!line) throw errors.notFound('line');
  return line;
}
