import { queryOptions } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
// Types only (erased at build): the derating engine is the source of these shapes.
import type { CheckResult, CheckedCategory, StressStatus, StressSummary } from '../../../server/derating';

export type { CheckResult, CheckName, Confidence, StressStatus, StressSummary, StressUnit } from '../../../server/derating';

export type StressWaiver = { id: string; reason: string; waivedBy: string | null; createdAt: string };

/** One rated line of a BOM with its checks, its worst status and any waiver on record. */
export type StressLine = {
  lineId: string;
  refDes: string | null;
  partId: string | null;
  internalPn: string | null;
  mpn: string | null;
  category: CheckedCategory;
  status: StressStatus;
  checks: CheckResult[];
  waiver: StressWaiver | null;
};

/** GET /api/boms/:id/stress */
export type StressCheck = {
  bomId: string;
  policyId: string;
  policyName: string;
  ambientC: number;
  lines: StressLine[];
  summary: StressSummary;
  caution: string;
};

export type Alternative = {
  id: string;
  internalPn: string;
  mpn: string;
  manufacturer: string;
  description: string;
  package: string;
  status: StressStatus;
  /** The BOM's landed cost per unit at the planned quantity with this part on the line. */
  landedPerUnit: string;
  /** landedPerUnit minus the BOM's landed cost per unit as it is now. */
  costDifference: string;
};

/** GET /api/boms/:id/lines/:lineId/alternatives */
export type Alternatives = {
  lineId: string;
  bomId: string;
  partId: string;
  currentStatus: StressStatus;
  currentLandedPerUnit: string;
  currency: string;
  qty: number;
  /** `passing` for a line that fails (any passing part), `cheaper` for one that passes. */
  direction: 'passing' | 'cheaper';
  candidates: Alternative[];
};

export type SwapResult = { bomId: string; revision: number; newRevision: boolean; line: { id: string; version: number } };

/**
 * The stress check lives under the BOM's detail key, `['boms', 'detail', id, 'stress']`,
 * spelled out here because areas do not import each other: the BOM area's line saves
 * already invalidate exactly this key, and invalidating the BOM's detail key (after a
 * swap or an operating-point write) refreshes lines, cost roll and stress together.
 */
export const stressKeys = {
  bom: (bomId: string) => ['boms', 'detail', bomId] as const,
  lines: (bomId: string) => [...stressKeys.bom(bomId), 'lines'] as const,
  check: (bomId: string) => [...stressKeys.bom(bomId), 'stress'] as const,
  alternatives: (bomId: string, lineId: string) => [...stressKeys.check(bomId), 'alternatives', lineId] as const,
  /** Every BOM's page (a new revision changes the family's revision list) and the BOM list's tallies. */
  details: () => ['boms', 'detail'] as const,
  lists: () => ['boms', 'list'] as const,
  compares: () => ['boms', 'compare'] as const,
};

const enc = encodeURIComponent;

export const stressQueryOptions = (bomId: string) =>
  queryOptions({
    queryKey: stressKeys.check(bomId),
    queryFn: ({ signal }) => api.get<StressCheck>(`/api/boms/${enc(bomId)}/stress`, { signal }),
  });

export const alternativesQueryOptions = (bomId: string, lineId: string) =>
  queryOptions({
    queryKey: stressKeys.alternatives(bomId, lineId),
    queryFn: ({ signal }) => api.get<Alternatives>(`/api/boms/${enc(bomId)}/lines/${enc(lineId)}/alternatives`, { signal }),
  });
