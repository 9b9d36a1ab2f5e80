import { linePatchBody, lineKinds, operatingPoint } from '../../../shared/schemas/boms';
import { formatValue, type Quantity } from '../../../shared/units';
import { trimDecimal } from '../../../lib/money';
import { fieldMessage } from '../../../lib/form-errors';
import type { PartSummary } from '../api';
import type { Line, LineKind, LinePatch, OperatingPoint } from './line-types';

/**
 * The columns of the Lines grid as plain data: how each shows a line as text, how typed
 * or pasted text becomes a patch, and who may change it. The grid component renders
 * these; paste and the tests use them without React.
 */

export type EditorKind = 'text' | 'select' | 'toggle' | 'part' | 'quote' | 'none';

/** Who may change a column: designers and owners (`boms.write`), anyone who may pin a quote, or nobody. */
export type ColumnAccess = 'design' | 'pin' | 'none';

export type ColumnId =
  | 'refDes'
  | 'part'
  | 'kind'
  | 'qtyPerUnit'
  | 'check'
  | 'attritionPct'
  | 'dnp'
  | 'unitCost'
  | 'oneTimeCost'
  | 'currency'
  | 'voltageV'
  | 'currentA'
  | 'powerW'
  | 'ambientC'
  | 'pinnedQuote'
  | 'note';

export type ParseContext = {
  /** Library parts by id, to name a line's part and to resolve pasted part numbers. */
  parts: ReadonlyMap<string, PartSummary>;
};

export type ParseResult = { ok: true; patch: LinePatch } | { ok: false; message: string };

export type GridColumn = {
  id: ColumnId;
  label: string;
  width: number;
  editor: EditorKind;
  access: ColumnAccess;
  numeric?: boolean;
  /** Hidden unless chosen (the operating point). */
  optional?: boolean;
  /** The cell as plain text: the editor's starting text and what copy puts on the clipboard. */
  text: (line: Line, ctx: ParseContext) => string;
  /** Typed or pasted text → the change to save; absent for columns that are not edited as text. */
  parse?: (text: string, ctx: ParseContext) => ParseResult;
  options?: readonly { value: string; label: string }[];
};

export const kindLabels: Record<LineKind, string> = {
  part: 'Part',
  labour: 'Labour',
  packaging: 'Packaging',
  test: 'Test',
  tooling: 'Tooling',
  other: 'Other',
};

const shape = linePatchBody.shape;

function firstIssue(error: { issues: { message: string }[] }, label: string): string {
  return fieldMessage(label, error.issues[0]?.message) ?? `${label} is not valid`;
}

/** A decimal as people paste it: thousands separators and spaces dropped, a trailing % allowed. */
function cleanDecimal(text: string): string {
  return text.trim().replace(/[,\s]/g, '').replace(/%$/, '');
}

function decimalColumn(
  id: 'qtyPerUnit' | 'attritionPct' | 'unitCost' | 'oneTimeCost',
  label: string,
  width: number,
  nullable: boolean,
): GridColumn {
  const schema = shape[id];
  return {
    id,
    label,
    width,
    editor: 'text',
    access: 'design',
    numeric: true,
    text: (line) => trimDecimal(line[id]),
    parse: (text) => {
      const clean = cleanDecimal(text);
      if (clean === '') return nullable ? { ok: true, patch: { [id]: null } } : { ok: false, message: `${label} is required` };
      const result = schema.safeParse(clean);
      if (!result.success) return { ok: false, message: firstIssue(result.error, label) };
      return { ok: true, patch: { [id]: result.data } };
    },
  };
}

const opQuantities = { voltageV: 'voltage', currentA: 'current', powerW: 'power', ambientC: 'temperature' } as const satisfies Record<
  keyof OperatingPoint,
  Quantity
>;

function operatingColumn(id: keyof OperatingPoint, label: string): GridColumn {
  const quantity = opQuantities[id];
  const schema = operatingPoint.shape[id];
  return {
    id,
    label,
    width: 108,
    editor: 'text',
    access: 'design',
    numeric: true,
    optional: true,
    text: (line) => {
      const value = line.operatingPoint?.[id];
      return value === null || value === undefined ? '' : formatValue(value, quantity);
    },
    parse: (text) => {
      if (text.trim() === '') return { ok: true, patch: { operatingPoint: { [id]: null } } };
      const result = schema.safeParse(text.trim());
      if (!result.success || result.data === null || result.data === undefined) {
        return { ok: false, message: result.success ? `${label} is required` : firstIssue(result.error, label) };
      }
      return { ok: true, patch: { operatingPoint: { [id]: result.data } } };
    },
  };
}

/** The part a pasted text names: an exact internal PN or MPN, ignoring case. */
export function findPartByNumber(text: string, parts: ReadonlyMap<string, PartSummary>): PartSummary | null {
  const wanted = text.trim().toLowerCase();
  if (!wanted) return null;
  for (const part of parts.values()) {
    if (part.internalPn.toLowerCase() === wanted || (part.mpn && part.mpn.toLowerCase() === wanted)) return part;
  }
  return null;
}

/** How the part column names a line's part; an unresolved import row shows its own text. */
export function partText(line: Pick<Line, 'partId' | 'unresolved'>, parts: ReadonlyMap<string, PartSummary>): string {
  if (line.partId) {
    const part = parts.get(line.partId);
    if (!part) return `Part ${line.partId}`;
    return part.mpn ? `${part.internalPn} ${part.mpn}` : part.internalPn;
  }
  return line.unresolved ?? '';
}

const yes = /^(y|yes|true|1|x|dnp)$/i;
const no = /^(n|no|false|0|)$/i;

export const gridColumns: readonly GridColumn[] = [
  {
    id: 'refDes',
    label: 'Ref des',
    width: 150,
    editor: 'text',
    access: 'design',
    text: (line) => line.refDes,
    parse: (text) => {
      const result = shape.refDes.safeParse(text);
      return result.success ? { ok: true, patch: { refDes: result.data } } : { ok: false, message: firstIssue(result.error, 'Ref des') };
    },
  },
  {
    id: 'part',
    label: 'Part',
    width: 230,
    editor: 'part',
    access: 'design',
    text: (line, ctx) => partText(line, ctx.parts),
    // Pasted text names a part by its number; anything else is kept as an unresolved line.
    parse: (text, ctx) => {
      const trimmed = text.trim();
      if (!trimmed) return { ok: true, patch: { partId: null, unresolved: null, pinnedQuoteId: null } };
      const part = findPartByNumber(trimmed, ctx.parts);
      if (part) return { ok: true, patch: { partId: part.id, unresolved: null, pinnedQuoteId: null } };
      return { ok: true, patch: { partId: null, unresolved: trimmed.slice(0, 200), pinnedQuoteId: null } };
    },
  },
  {
    id: 'kind',
    label: 'Kind',
    width: 110,
    editor: 'select',
    access: 'design',
    options: lineKinds.map((kind) => ({ value: kind, label: kindLabels[kind] })),
    text: (line) => kindLabels[line.kind] ?? line.kind,
    parse: (text) => {
      const wanted = text.trim().toLowerCase();
      const kind = lineKinds.find((k) => k === wanted || kindLabels[k].toLowerCase() === wanted || (k === 'labour' && wanted === 'labor'));
      return kind ? { ok: true, patch: { kind } } : { ok: false, message: 'Kind must be part, labour, packaging, test, tooling or other' };
    },
  },
  decimalColumn('qtyPerUnit', 'Qty per unit', 112, false),
  { id: 'check', label: 'Check', width: 170, editor: 'none', access: 'none', text: () => '' },
  decimalColumn('attritionPct', 'Attrition %', 92, true),
  {
    id: 'dnp',
    label: 'DNP',
    width: 64,
    editor: 'toggle',
    access: 'design',
    text: (line) => (line.dnp ? 'Yes' : ''),
    parse: (text) => {
      if (yes.test(text.trim())) return { ok: true, patch: { dnp: true } };
      if (no.test(text.trim())) return { ok: true, patch: { dnp: false } };
      return { ok: false, message: 'DNP must be yes or no' };
    },
  },
  decimalColumn('unitCost', 'Unit cost', 104, true),
  decimalColumn('oneTimeCost', 'One-time cost', 128, true),
  {
    id: 'currency',
    label: 'Currency',
    width: 84,
    editor: 'text',
    access: 'design',
    text: (line) => line.currency ?? '',
    parse: (text) => {
      if (text.trim() === '') return { ok: true, patch: { currency: null } };
      const result = shape.currency.safeParse(text);
      return result.success ? { ok: true, patch: { currency: result.data ?? null } } : { ok: false, message: firstIssue(result.error, 'Currency') };
    },
  },
  operatingColumn('voltageV', 'Voltage'),
  operatingColumn('currentA', 'Current'),
  operatingColumn('powerW', 'Power'),
  operatingColumn('ambientC', 'Ambient'),
  { id: 'pinnedQuote', label: 'Pinned quote', width: 220, editor: 'quote', access: 'pin', text: () => '' },
  {
    id: 'note',
    label: 'Note',
    width: 220,
    editor: 'text',
    access: 'design',
    text: (line) => line.note,
    parse: (text) => {
      const result = shape.note.safeParse(text);
      return result.success ? { ok: true, patch: { note: result.data } } : { ok: false, message: firstIssue(result.error, 'Note') };
    },
  },
];

export const optionalColumnIds = gridColumns.filter((c) => c.optional).map((c) => c.id);

/** Whether a role's rights let it change a column of an editable BOM. */
export function canEditColumn(column: GridColumn, rights: { design: boolean; pin: boolean }): boolean {
  if (column.access === 'design') return rights.design;
  if (column.access === 'pin') return rights.pin;
  return false;
}
