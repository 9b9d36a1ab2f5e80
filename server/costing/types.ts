/**
 * Input and output shapes of the costing engine. Plain data, as the API and knex deliver
 * it: decimals (money, prices, rates, percentages, decimal quantities) are strings such as
 * "0.000810", integer counts are numbers, ids are strings, dates are "YYYY-MM-DD".
 * Field names follow the HTTP contract (camelCase) so database rows map straight in.
 */

export type DecimalString = string;
/** A calendar date, "YYYY-MM-DD". */
export type IsoDate = string;
/** An ISO 4217 code such as "USD". */
export type CurrencyCode = string;

export type Incoterm =
  | 'EXW' | 'FCA' | 'FAS' | 'FOB' | 'CFR' | 'CPT' | 'CIF' | 'CIP' | 'DAP' | 'DPU' | 'DDP';

export type PartCategory =
  | 'resistor' | 'capacitor' | 'bjt' | 'mosfet' | 'diode' | 'led' | 'inductor' | 'transformer'
  | 'switch' | 'battery' | 'pcb' | 'enclosure' | 'wire' | 'packaging' | 'other';

export type Mount = 'smt' | 'tht' | 'hand' | 'none';

export type LineKind = 'part' | 'labour' | 'packaging' | 'test' | 'tooling' | 'other';

export type DutyBasis = 'FOB' | 'CIF';
export type FreightBasis = 'value' | 'weight';

/** The landed-cost adders, in shipping order. */
export type AdderName = 'origin' | 'freight' | 'insurance' | 'duty' | 'fees' | 'destination';

// ---------------------------------------------------------------------------------------
// Inputs

/** One row of the FX table: 1 `base` = `rate` `quote` on `date`. */
export interface FxRate {
  date: IsoDate;
  base: CurrencyCode;
  quote: CurrencyCode;
  rate: DecimalString;
}

export interface PriceBreak {
  minQty: number;
  unitPrice: DecimalString;
}

export interface Quote {
  id: string;
  partId: string;
  supplierId: string;
  currency: CurrencyCode;
  incoterm: Incoterm;
  /** Minimum order quantity, ≥ 1. */
  moq: number;
  /** Reel or pack size, ≥ 1. */
  orderMultiple: number;
  /** Unknown lead time (null) cannot pass a maximum lead time and loses lead-time ties. */
  leadTimeDays: number | null;
  validFrom?: IsoDate | null;
  validUntil?: IsoDate | null;
  priceBreaks: PriceBreak[];
  /** ISO 8601 timestamp; the older quote wins a tie. */
  createdAt?: string | null;
}

export interface Supplier {
  id: string;
  active: boolean;
  name?: string;
}

export interface Part {
  id: string;
  category: PartCategory;
  mount: Mount;
  pins?: number | null;
  hsCode?: string | null;
  unitWeightG?: DecimalString | null;
  internalPn?: string | null;
  mpn?: string | null;
}

export interface DutyRate {
  hsPrefix: string;
  ratePct: DecimalString;
}

/**
 * A landed-cost profile. Every field is optional; absent amounts and percentages are 0.
 * Percentages are in percent ("3.7" = 3.7 %). Assembly rates and `feesPerShipment` are in
 * `currency` (default: the reporting currency); `freightPerShipment` in `freightCurrency`
 * (default: `currency`).
 */
export interface LandedCostProfile {
  currency?: CurrencyCode | null;
  originPct?: DecimalString | null;
  freightPct?: DecimalString | null;
  freightPerShipment?: DecimalString | null;
  freightCurrency?: CurrencyCode | null;
  shipments?: number | null;
  /** Default `value`. */
  freightBasis?: FreightBasis | null;
  insurancePct?: DecimalString | null;
  /** Default `CIF`, the basis of the EU, the UK and most WTO members. */
  dutyBasis?: DutyBasis | null;
  dutyRates?: DutyRate[] | null;
  defaultDutyPct?: DecimalString | null;
  feesPerShipment?: DecimalString | null;
  destinationPct?: DecimalString | null;
  maxLeadTimeDays?: number | null;
  attritionPct?: Partial<Record<PartCategory, DecimalString>> | null;
  smtRatePerPlacement?: DecimalString | null;
  thtRatePerJoint?: DecimalString | null;
  handRatePerOp?: DecimalString | null;
}

export interface BomLine {
  id: string;
  refDes?: string | null;
  kind: LineKind;
  partId?: string | null;
  /** Pieces (or metres…) per finished unit; for a cost line, the multiplier of `unitCost`. */
  qtyPerUnit: DecimalString;
  /** The line's own attrition in percent; null falls back to the profile's category default. */
  attritionPct?: DecimalString | null;
  pinnedQuoteId?: string | null;
  dnp?: boolean | null;
  /** Cost lines: cost per item, times `qtyPerUnit`, per finished unit. */
  unitCost?: DecimalString | null;
  /** Cost lines: a one-time amount (tooling, NRE) amortised over the build or `amortisationQty`. */
  oneTimeCost?: DecimalString | null;
  /** Currency of `unitCost` and `oneTimeCost`; default the reporting currency. */
  currency?: CurrencyCode | null;
}

/** What the cost roll needs from the BOM itself. */
export interface BomCosting {
  /** Build quantity N, a positive integer. */
  qty: number;
  /** Costing date: picks valid quotes and FX rows. */
  date: IsoDate;
  reportingCurrency: CurrencyCode;
  amortisationQty?: number | null;
  /** In the reporting currency. */
  targetUnitCost?: DecimalString | null;
}

export interface CostRollInput {
  bom: BomCosting;
  profile: LandedCostProfile;
  lines: BomLine[];
  /** The parts the lines refer to. */
  parts: Part[];
  /** All quotes for those parts (grouped by `partId` inside the engine). */
  quotes: Quote[];
  /** The suppliers the quotes refer to. */
  suppliers: Supplier[];
  fxRates: FxRate[];
  /** Triangulation currency; default EUR. */
  pivot?: CurrencyCode;
}

export interface QuoteBoardInput {
  partId: string;
  /** Pieces needed. */
  qty: number;
  date: IsoDate;
  /** Currency the board compares in. */
  currency: CurrencyCode;
  profile: LandedCostProfile;
  /** The part's HS code picks the duty rate. */
  part: Pick<Part, 'hsCode'>;
  quotes: Quote[];
  suppliers: Supplier[];
  fxRates: FxRate[];
  pivot?: CurrencyCode;
}

export interface ShelfLadderInput {
  /** Shelf price including VAT. */
  price: DecimalString;
  vatPct: DecimalString;
  retailerMarginPct: DecimalString;
  importerMarginPct: DecimalString;
  freightToStorePerUnit: DecimalString;
  /** The computed landed cost per unit to compare with, same currency as `price`. */
  landedPerUnit?: DecimalString | null;
}

// ---------------------------------------------------------------------------------------
// Outputs (money to 6 decimals; unit prices and per-unit figures to 10)

/** An FX row the engine used, for the export's list of rates. */
export interface FxRateUsed {
  date: IsoDate;
  base: CurrencyCode;
  quote: CurrencyCode;
  rate: DecimalString;
  /** True when the row was used the other way round (B→A to convert A→B). */
  inverted: boolean;
}

export type FxRoute = 'same' | 'direct' | 'inverse' | 'pivot';

export type IneligibleReason =
  | 'expired'
  | 'not_yet_valid'
  | 'inactive_supplier'
  | 'lead_time'
  | 'missing_fx';

export interface Offer {
  quoteId: string;
  supplierId: string;
  eligible: boolean;
  /** The first of `reasons`, null when eligible. */
  reason: IneligibleReason | null;
  reasons: IneligibleReason[];
  incoterm: Incoterm;
  leadTimeDays: number | null;
  orderQty: number;
  excessQty: number;
  /** In the quote's currency. */
  unitPrice: DecimalString;
  unitPriceCurrency: CurrencyCode;
  /** The rest in the board's currency; null when no FX rate converts the quote. */
  unitPriceConverted: DecimalString | null;
  goodsValue: DecimalString | null;
  excessValue: DecimalString | null;
  origin: DecimalString | null;
  freight: DecimalString | null;
  insurance: DecimalString | null;
  duty: DecimalString | null;
  destination: DecimalString | null;
  landed: DecimalString | null;
  landedPerPiece: DecimalString | null;
  fxRate: DecimalString | null;
  fxRates: FxRateUsed[];
}

export interface QuoteBoardResult {
  partId: string;
  qty: number;
  date: IsoDate;
  currency: CurrencyCode;
  dutyPct: DecimalString;
  offers: Offer[];
  cheapestQuoteId: string | null;
}

export type LineWarningCode =
  | 'no_part'
  | 'no_quote'
  | 'no_cost'
  | 'missing_fx'
  | 'missing_weight'
  | 'missing_pins'
  | 'pinned_not_cheapest'
  | 'pinned_expired'
  | 'pinned_not_yet_valid'
  | 'pinned_inactive_supplier'
  | 'pinned_lead_time'
  | 'pinned_not_found';

export type LeftOutReason = 'no_part' | 'no_quote' | 'no_cost' | 'missing_fx' | 'missing_weight';

export interface LineWarning {
  code: LineWarningCode;
  /** Machine-readable context, e.g. "CNY->GBP 2026-12-01". */
  detail?: string;
}

export type LineStatus = 'costed' | 'dnp' | 'left_out';

export interface CostRollLine {
  lineId: string;
  refDes: string | null;
  kind: LineKind;
  status: LineStatus;
  partId: string | null;
  /** Part category, or the line kind for cost lines. */
  category: string;
  quoteId: string | null;
  supplierId: string | null;
  incoterm: Incoterm | null;
  requiredQty: number | null;
  orderQty: number | null;
  excessQty: number | null;
  unitPrice: DecimalString | null;
  unitPriceCurrency: CurrencyCode | null;
  unitPriceConverted: DecimalString | null;
  goodsValue: DecimalString;
  excessValue: DecimalString;
  origin: DecimalString;
  /** freightPct × G plus `freightShare`. */
  freight: DecimalString;
  /** The line's share of the build's per-shipment freight (part of `freight`). */
  freightShare: DecimalString;
  insurance: DecimalString;
  customsValue: DecimalString | null;
  dutyPct: DecimalString | null;
  duty: DecimalString;
  fees: DecimalString;
  destination: DecimalString;
  /** Assembly of this line for the whole build. */
  assembly: DecimalString;
  /** Cost lines: per finished unit and one-time amount, in the reporting currency. */
  costPerUnit: DecimalString | null;
  oneTimeCost: DecimalString | null;
  /** The line's whole charge to this build (one-time costs: the amortised share). */
  landed: DecimalString;
  landedPerUnit: DecimalString;
  fxRates: FxRateUsed[];
  warnings: LineWarning[];
}

export interface CostTotals {
  goods: DecimalString;
  excessValue: DecimalString;
  origin: DecimalString;
  freight: DecimalString;
  insurance: DecimalString;
  duty: DecimalString;
  fees: DecimalString;
  destination: DecimalString;
  /** Assembly for the whole build, and per unit. */
  assembly: DecimalString;
  assemblyPerUnit: DecimalString;
  costLinesPerUnit: DecimalString;
  /** Sum of one-time costs (whole amounts) and their amortised share per unit. */
  oneTimeTotal: DecimalString;
  oneTimePerUnit: DecimalString;
  landedTotal: DecimalString;
  landedPerUnit: DecimalString;
  landedPerUnitExclOneTime: DecimalString;
  targetUnitCost: DecimalString | null;
  /** landedPerUnit − targetUnitCost: positive means over target. */
  gapToTarget: DecimalString | null;
}

export interface CategoryTotal {
  category: string;
  lineCount: number;
  goods: DecimalString;
  excessValue: DecimalString;
  adders: DecimalString;
  assembly: DecimalString;
  landed: DecimalString;
  landedPerUnit: DecimalString;
}

export interface SupplierTotal {
  supplierId: string;
  lineCount: number;
  goods: DecimalString;
  excessValue: DecimalString;
  landed: DecimalString;
  landedPerUnit: DecimalString;
}

export type RollWarningCode =
  | 'missing_fx'
  | 'shipments_zero'
  | 'freight_unallocated'
  | 'fees_unallocated'
  | 'freight_weight_zero'
  | 'lines_left_out';

export interface RollWarning {
  code: RollWarningCode;
  detail?: string;
}

export interface LeftOutLine {
  lineId: string;
  refDes: string | null;
  reason: LeftOutReason;
  detail?: string;
}

export interface CostRollResult {
  qty: number;
  date: IsoDate;
  currency: CurrencyCode;
  lines: CostRollLine[];
  totals: CostTotals;
  byCategory: CategoryTotal[];
  bySupplier: SupplierTotal[];
  warnings: RollWarning[];
  leftOut: { count: number; lines: LeftOutLine[] };
  dnp: { count: number; lineIds: string[] };
  /** How many warnings the lines carry in all (known without the lines: the running panel). */
  lineWarningCount: number;
  /** Every FX row used anywhere in the roll (for the export). */
  fxRates: FxRateUsed[];
}

export type CurvePoint = Omit<CostRollResult, 'lines'>;

export interface VolumeCurveResult {
  date: IsoDate;
  currency: CurrencyCode;
  points: CurvePoint[];
}

export type ShelfRungName =
  | 'shelf_price'
  | 'net_of_vat'
  | 'retailer_buying_price'
  | 'importer_net'
  | 'allowed_landed';

export interface ShelfLadderResult {
  rungs: { name: ShelfRungName; value: DecimalString }[];
  allowedLandedCost: DecimalString;
  /** Allowed landed cost as a share of the shelf price, in percent. */
  allowedSharePct: DecimalString;
  landedPerUnit: DecimalString | null;
  /** landedPerUnit − allowedLandedCost: positive means the product costs too much. */
  gap: DecimalString | null;
}
