import { queryOptions } from '@tanstack/react-query';
import { api, getAllPages, type Page } from '../../lib/api-client';
import type { BomState } from '../../shared/schemas/boms';
import type { Line, LineKind } from './lines/line-types';

export type { Line, LineKind, LinePatch, OperatingPoint } from './lines/line-types';

/** The stored roll-up the BOM list shows: landed cost per unit at the planned quantity. */
export type BomCostSummary = {
  qty: number;
  currency: string;
  landedPerUnit: string | null;
  leftOut: number;
  warnings: number;
  costingDate: string;
};

export type Shelf = {
  price: string | null;
  vatPct: string;
  retailerMarginPct: string;
  importerMarginPct: string;
  freightToStorePerUnit: string;
};

export type Bom = {
  id: string;
  familyId: string;
  name: string;
  revision: number;
  state: BomState;
  reportingCurrency: string;
  profileId: string | null;
  stressPolicyId: string | null;
  ambientC: number;
  plannedQty: number;
  targetUnitCost: string | null;
  amortisationQty: number | null;
  shelf: Shelf;
  notes: string;
  releasedAt: string | null;
  version: number;
  createdAt: string;
  updatedAt: string;
};

export type BomListItem = Bom & {
  lineCount: number;
  cost: BomCostSummary | null;
  /** Lines by stress status under the BOM's policy; null when the workspace has no policy. */
  stress: { clear: number; close: number; beyondPolicy: number; overRating: number; needsData: number } | null;
};

export type BomRevision = { id: string; revision: number; state: BomState; releasedAt: string | null };
export type BomDetail = Bom & { revisions: BomRevision[] };

export type Warning = { code: string; detail?: string };

export type CostLine = {
  lineId: string;
  refDes: string | null;
  kind: LineKind;
  status: 'costed' | 'dnp' | 'left_out';
  partId: string | null;
  internalPn: string | null;
  mpn: string | null;
  category: string;
  quoteId: string | null;
  supplierId: string | null;
  supplierName: string | null;
  incoterm: string | null;
  requiredQty: number | null;
  orderQty: number | null;
  excessQty: number | null;
  unitPrice: string | null;
  unitPriceCurrency: string | null;
  unitPriceConverted: string | null;
  goodsValue: string;
  excessValue: string;
  origin: string;
  freight: string;
  insurance: string;
  duty: string;
  fees: string;
  destination: string;
  assembly: string;
  costPerUnit: string | null;
  oneTimeCost: string | null;
  landed: string;
  landedPerUnit: string;
  warnings: Warning[];
};

export type CostTotals = {
  goods: string;
  excessValue: string;
  origin: string;
  freight: string;
  insurance: string;
  duty: string;
  fees: string;
  destination: string;
  assembly: string;
  assemblyPerUnit: string;
  costLinesPerUnit: string;
  oneTimeTotal: string;
  oneTimePerUnit: string;
  landedTotal: string;
  landedPerUnit: string;
  landedPerUnitExclOneTime: string;
  targetUnitCost: string | null;
  gapToTarget: string | null;
};

export type CategoryTotal = { category: string; lineCount: number; goods: string; landed: string; landedPerUnit: string };
export type SupplierTotal = { supplierId: string; supplierName: string | null; lineCount: number; goods: string; landed: string; landedPerUnit: string };
export type LeftOutLine = { lineId: string; refDes: string | null; reason: string; detail?: string };

export type CostRoll = {
  qty: number;
  date: string;
  currency: string;
  profileId: string | null;
  profileName: string | null;
  lines: CostLine[];
  totals: CostTotals;
  byCategory: CategoryTotal[];
  bySupplier: SupplierTotal[];
  warnings: Warning[];
  leftOut: { count: number; lines: LeftOutLine[] };
  dnp?: { count: number; lineIds: string[] };
  /** Warnings on the lines in all (also when the lines are left out of the answer). */
  lineWarningCount: number;
};

export type CurvePoint = Omit<CostRoll, 'lines' | 'profileId' | 'profileName'>;
export type VolumeCurve = { date: string; currency: string; points: CurvePoint[] };

export type ShelfRungName = 'shelf_price' | 'net_of_vat' | 'retailer_buying_price' | 'importer_net' | 'allowed_landed';
export type ShelfLadder = {
  qty: number;
  currency: string;
  shelf: Shelf;
  rungs: { name: ShelfRungName; value: string }[];
  allowedLandedCost: string;
  allowedSharePct: string;
  landedPerUnit: string | null;
  gap: string | null;
  leftOut: number;
};

export type Snapshot = { id: string; name: string; qty: number; date: string; landedPerUnit: string; currency: string; createdAt: string };

export type CompareSide = { partId: string | null; internalPn: string | null; supplierName: string | null; orderQty: number | null; unitPrice: string | null; landed: string; landedPerUnit: string };
export type CostCompare = {
  currency: string;
  left: { ref: string; label: string; qty: number; date: string };
  right: { ref: string; label: string; qty: number; date: string };
  totals: { name: string; left: string | null; right: string | null; change: string | null }[];
  lines: {
    key: string;
    refDes: string | null;
    internalPn: string | null;
    change: 'added' | 'removed' | 'part_changed' | 'cost_changed' | 'same';
    left: CompareSide | null;
    right: CompareSide | null;
    landedPerUnitChange: string | null;
  }[];
};

export type ImportPreview = {
  columns: string[];
  fields: { name: string; label: string; required: boolean }[];
  mapping: Record<string, string | null>;
  mappingProblems: { path: string; message: string }[];
  totalRows: number;
  problemRows: number;
  matchedRows: number;
  unresolvedRows: number;
  rows: { row: number; values: Record<string, string>; problems: { field: string; message: string }[]; warnings: string[]; matched: 'mpn' | 'internalPn' | null }[];
  imported?: number;
};

/** A landed-cost profile as the New BOM form and the duty-basis note need it. */
export type ProfileChoice = { id: string; name: string; currency: string; dutyBasis: 'FOB' | 'CIF' | null };

/** A library part as the part picker and the grid's part column show it. */
export type PartSummary = { id: string; internalPn: string; mpn: string; description: string; package: string; category: string; ratings: Record<string, unknown> };

/** A quote a buyer may pin on a line. */
export type PartQuote = {
  id: string;
  supplierName: string;
  currency: string;
  incoterm: string;
  moq: number;
  priceBreaks: { minQty: number; unitPrice: string }[];
  expired: boolean;
};

export type CostParams = { qty?: number; date?: string };

/**
 * Keys of the BOM area, hierarchical: everything one BOM revision owns sits under
 * `detail(id)`, so a line edit can name exactly the derived reads it changes (cost,
 * curve, ladder, stress) without touching the lines it has already written itself.
 */
export const bomKeys = {
  all: ['boms'] as const,
  lists: () => [...bomKeys.all, 'list'] as const,
  list: () => [...bomKeys.lists(), {}] as const,
  details: () => [...bomKeys.all, 'detail'] as const,
  detail: (id: string) => [...bomKeys.details(), id] as const,
  lines: (id: string) => [...bomKeys.detail(id), 'lines'] as const,
  costs: (id: string) => [...bomKeys.detail(id), 'cost'] as const,
  cost: (id: string, params: CostParams) => [...bomKeys.costs(id), { qty: params.qty ?? null, date: params.date ?? null }] as const,
  curves: (id: string) => [...bomKeys.detail(id), 'curve'] as const,
  curve: (id: string, quantities: string) => [...bomKeys.curves(id), quantities] as const,
  ladders: (id: string) => [...bomKeys.detail(id), 'ladder'] as const,
  ladder: (id: string, qty: number | null) => [...bomKeys.ladders(id), qty] as const,
  /** The stress check (read by the stress area under this same key), so line edits invalidate it. */
  stress: (id: string) => [...bomKeys.detail(id), 'stress'] as const,
  snapshots: (id: string) => [...bomKeys.detail(id), 'snapshots'] as const,
  compares: () => [...bomKeys.all, 'compare'] as const,
  compare: (left: string, right: string, qty: number | null) => [...bomKeys.compares(), { left, right, qty }] as const,
  profileChoices: () => [...bomKeys.all, 'profile-choices'] as const,
  partSearch: (q: string) => [...bomKeys.all, 'part-search', q] as const,
  partQuotes: (partId: string) => [...bomKeys.all, 'part-quotes', partId] as const,
};

/**
 * The whole parts library by id, for naming the part of every line. Kept under the
 * parts area's root key (`['parts', …]`) on purpose: any parts mutation that
 * invalidates that root refreshes the names here too, without the areas importing
 * each other.
 */
export const partIndexKey = ['parts', 'bom-index'] as const;

const enc = encodeURIComponent;

export const bomsQueryOptions = () =>
  queryOptions({
    queryKey: bomKeys.list(),
    queryFn: ({ signal }) => getAllPages<BomListItem>('/api/boms', signal),
  });

export const bomQueryOptions = (id: string) =>
  queryOptions({
    queryKey: bomKeys.detail(id),
    queryFn: ({ signal }) => api.get<BomDetail>(`/api/boms/${enc(id)}`, { signal }),
  });

export const linesQueryOptions = (id: string) =>
  queryOptions({
    queryKey: bomKeys.lines(id),
    queryFn: ({ signal }) => getAllPages<Line>(`/api/boms/${enc(id)}/lines`, signal),
    // The grid writes saved lines into this cache itself; a refetch on every focus
    // would only fight with edits in flight.
    staleTime: 5 * 60_000,
    refetchOnWindowFocus: false,
  });

export const costQueryOptions = (id: string, params: CostParams = {}) =>
  queryOptions({
    queryKey: bomKeys.cost(id, params),
    queryFn: ({ signal }) => api.get<CostRoll>(`/api/boms/${enc(id)}/cost`, { query: { qty: params.qty, date: params.date }, signal }),
  });

/** The totals without the lines (`view=totals`): what the running panel shows, cheap on a large BOM. */
export const costTotalsQueryOptions = (id: string, qty: number) =>
  queryOptions({
    queryKey: [...bomKeys.costs(id), 'totals', { qty }] as const,
    queryFn: ({ signal }) => api.get<CostRoll>(`/api/boms/${enc(id)}/cost`, { query: { qty, view: 'totals' }, signal }),
  });

/** `quantities` is the comma-separated list as typed, or '' for the server's default twelve. */
export const curveQueryOptions = (id: string, quantities: string) =>
  queryOptions({
    queryKey: bomKeys.curve(id, quantities),
    queryFn: ({ signal }) => api.get<VolumeCurve>(`/api/boms/${enc(id)}/cost/curve`, { query: { qty: quantities || undefined }, signal }),
  });

export const ladderQueryOptions = (id: string, qty: number | null) =>
  queryOptions({
    queryKey: bomKeys.ladder(id, qty),
    queryFn: ({ signal }) => api.get<ShelfLadder>(`/api/boms/${enc(id)}/shelf-ladder`, { query: { qty: qty ?? undefined }, signal }),
  });

export const snapshotsQueryOptions = (id: string) =>
  queryOptions({
    queryKey: bomKeys.snapshots(id),
    queryFn: ({ signal }) => getAllPages<Snapshot>(`/api/boms/${enc(id)}/snapshots`, signal),
  });

export const compareQueryOptions = (left: string, right: string, qty: number | null) =>
  queryOptions({
    queryKey: bomKeys.compare(left, right, qty),
    queryFn: ({ signal }) => api.get<CostCompare>('/api/cost-compare', { query: { left, right, qty: qty ?? undefined }, signal }),
  });

export const profileChoicesQueryOptions = () =>
  queryOptions({
    queryKey: bomKeys.profileChoices(),
    queryFn: ({ signal }) => getAllPages<ProfileChoice>('/api/landed-cost-profiles', signal),
  });

// Large pages: a library of 10,000 parts arrives in one request.
const PART_INDEX_PAGE = 20_000;

export const partIndexQueryOptions = () =>
  queryOptions({
    queryKey: partIndexKey,
    queryFn: async ({ signal }) => {
      const parts = await getAllPages<PartSummary>('/api/parts', signal, { limit: PART_INDEX_PAGE });
      return new Map(parts.map((p) => [p.id, p]));
    },
    staleTime: 60_000,
  });

/** The first matches of a search in the trade's words ("22M 1206", an MPN, an internal PN). */
export const partSearchQueryOptions = (q: string) =>
  queryOptions({
    queryKey: bomKeys.partSearch(q),
    queryFn: async ({ signal }) => (await api.get<Page<PartSummary>>('/api/parts', { query: { q: q.trim() || undefined, limit: 20 }, signal })).items,
    staleTime: 30_000,
  });

export const partQuotesQueryOptions = (partId: string) =>
  queryOptions({
    queryKey: bomKeys.partQuotes(partId),
    queryFn: ({ signal }) => getAllPages<PartQuote>(`/api/parts/${enc(partId)}/quotes`, signal),
  });

/** How a part reads in the grid and the picker: our number, then the maker's. */
export function partLabel(part: Pick<PartSummary, 'internalPn' | 'mpn'>): string {
  return part.mpn ? `${part.internalPn} · ${part.mpn}` : part.internalPn;
}
