import type { lineKinds } from '../../../shared/schemas/boms';

export type LineKind = (typeof lineKinds)[number];

/** Operating point in base units (V, A, W, °C); null where not given. */
export type OperatingPoint = { voltageV: number | null; currentA: number | null; powerW: number | null; ambientC: number | null };

/** One BOM line as GET /api/boms/:id/lines answers it. */
export type Line = {
  id: string;
  bomId?: string;
  position: number;
  kind: LineKind;
  refDes: string;
  partId: string | null;
  qtyPerUnit: string;
  attritionPct: string | null;
  pinnedQuoteId: string | null;
  dnp: boolean;
  note: string;
  unitCost: string | null;
  oneTimeCost: string | null;
  currency: string | null;
  operatingPoint: OperatingPoint;
  /** The text of an imported row that matched no part; cleared once a part is chosen. */
  unresolved: string | null;
  version: number;
};

/** The editable fields of a line: what a PATCH may carry besides `version`. */
export type LinePatch = Partial<Omit<Line, 'id' | 'bomId' | 'version' | 'operatingPoint'>> & {
  operatingPoint?: Partial<OperatingPoint>;
};

/** A new line; the server fills what is left out (kind part, quantity 1). */
export type LineDraft = LinePatch;
