import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { gridColumns, type ParseContext } from './grid-columns';
import { lineFromDraft } from './line-changes';
import { parseTsv, pasteChange } from './paste';
import type { PartSummary } from '../api';

const part = (id: string, internalPn: string, mpn: string): PartSummary => ({ id, internalPn, mpn, description: '', package: '1206', category: 'resistor', ratings: {} });
// Invented demo parts of the Tinbell arc lighter.
const ctx: ParseContext = {
  parts: new Map([
    ['11', part('11', 'TB-R-22M', 'RC1206-22M')],
    ['12', part('12', 'TB-C-2N2', 'HV2N2-2KV')],
  ]),
};
const visible = gridColumns.filter((c) => !c.optional);
const col = (id: string) => visible.findIndex((c) => c.id === id);
const lines = [
  lineFromDraft('1', 0, { refDes: 'R1', qtyPerUnit: '1' }),
  lineFromDraft('2', 1, { refDes: 'C1', qtyPerUnit: '1', partId: '12' }),
];
const design = { design: true, pin: true };

describe('reading a block copied from a spreadsheet', () => {
  it('splits tabs and line breaks, dropping the trailing line break', () => {
    expect(parseTsv('R1\tTB-R-22M\t1\r\nR2 R3\tRC1206-22M\t2\r\n')).toEqual([
      ['R1', 'TB-R-22M', '1'],
      ['R2 R3', 'RC1206-22M', '2'],
    ]);
    expect(parseTsv('a\n\nb')).toEqual([['a'], [''], ['b']]);
    expect(parseTsv('a\t\tc')).toEqual([['a', '', 'c']]);
  });

  it('reads quoted cells holding tabs, line breaks and quotes', () => {
    expect(parseTsv('"two\nlines"\t"say ""2 kV"""\tplain\n')).toEqual([['two\nlines', 'say "2 kV"', 'plain']]);
    // A quote inside plain text is just a character.
    expect(parseTsv('5" wire\t1')).toEqual([['5" wire', '1']]);
  });

  it('round-trips any grid of plain cells', () => {
    const cell = fc.string({ maxLength: 8 }).filter((s) => !/[\t\r\n"]/.test(s));
    fc.assert(
      fc.property(fc.array(fc.array(cell, { minLength: 1, maxLength: 5 }), { minLength: 1, maxLength: 6 }), (grid) => {
        const text = grid.map((row) => row.join('\t')).join('\n') + '\n';
        const expected = grid.map((row) => (row.length === 1 && row[0] === '' ? [''] : row));
        expect(parseTsv(text)).toEqual(expected);
      }),
    );
  });
});

describe('pasting at the active cell', () => {
  it('updates existing lines and appends new ones in one change', () => {
    const cells = parseTsv('R1 R2\tTB-R-22M\tPart\t2\nR3\tRC1206-22M\tpart\t1\nR4\tnot-in-library\tpart\t1\n');
    const { change, errors } = pasteChange(cells, { row: 0, col: col('refDes') }, lines, visible, ctx, design);
    expect(errors).toEqual([]);
    expect(change.update).toEqual([
      { id: '1', patch: { refDes: 'R1 R2', partId: '11', unresolved: null, pinnedQuoteId: null, kind: 'part', qtyPerUnit: '2' } },
      { id: '2', patch: { refDes: 'R3', partId: '11', unresolved: null, pinnedQuoteId: null, kind: 'part', qtyPerUnit: '1' } },
    ]);
    expect(change.create).toHaveLength(1);
    // A part number the library does not know becomes an unresolved line, as an import does.
    expect(change.create[0].draft).toMatchObject({ refDes: 'R4', partId: null, unresolved: 'not-in-library', qtyPerUnit: '1' });
  });

  it('starts at the active column and steps over read-only columns', () => {
    // Qty per unit, then (past the read-only Check column) attrition and DNP.
    const { change } = pasteChange([['4', '2.5%', 'yes']], { row: 1, col: col('qtyPerUnit') }, lines, visible, ctx, design);
    expect(change.update).toEqual([{ id: '2', patch: { qtyPerUnit: '4', attritionPct: '2.5', dnp: true } }]);
  });

  it('reads operating points in the trade notation', () => {
    const withOp = gridColumns;
    const at = withOp.findIndex((c) => c.id === 'voltageV');
    const { change, errors } = pasteChange([['1.9kV', '700mA', '250mW', '85']], { row: 0, col: at }, lines, withOp, ctx, design);
    expect(errors).toEqual([]);
    expect(change.update[0].patch.operatingPoint).toEqual({ voltageV: 1900, currentA: 0.7, powerW: 0.25, ambientC: 85 });
  });

  it('names every cell it cannot read and sends nothing for them', () => {
    const { errors } = pasteChange([['R1', 'TB-R-22M', 'gizmo', '-1']], { row: 0, col: 0 }, lines, visible, ctx, design);
    expect(errors).toEqual([
      'Row 1, Kind: Kind must be part, labour, packaging, test, tooling or other',
      'Row 1, Qty per unit: Qty per unit must be greater than 0',
    ]);
  });

  it('skips cells that would change nothing and counts cells past the last column', () => {
    const last = visible.length - 1;
    const { change, ignored } = pasteChange([['', 'extra']], { row: 0, col: last }, lines, visible, ctx, design);
    expect(change.update).toEqual([]);
    expect(ignored).toBe(1);
  });

  it('gives a role that may only pin quotes nothing to paste into', () => {
    const { change } = pasteChange([['R9', 'TB-R-22M']], { row: 0, col: 0 }, lines, visible, ctx, { design: false, pin: true });
    expect(change.update).toEqual([]);
    expect(change.create).toEqual([]);
  });
});
