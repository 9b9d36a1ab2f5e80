import { describe, expect, it } from 'vitest';
import type { ImportField } from './api';
import {
  columnsUsedTwice,
  commitProblems,
  initialMapping,
  mappingForRequest,
  mappingGaps,
  mappingKey,
  mappingProblemsByField,
  problemsByField,
  shownFields,
} from './mapping';

// The fields of the quote import, as the server lists them.
const fields: ImportField[] = [
  { name: 'internalPn', label: 'Internal PN', required: false },
  { name: 'mpn', label: 'MPN', required: false },
  { name: 'supplier', label: 'Supplier', required: false },
  { name: 'currency', label: 'Currency', required: false },
  { name: 'minQty', label: 'Break quantity', required: true },
  { name: 'unitPrice', label: 'Unit price', required: true },
];

describe('the import mapping step', () => {
  it('starts from the suggested columns and drops any the file does not have', () => {
    const state = initialMapping({ fields, columns: ['PN', 'Qty', 'Price'], mapping: { internalPn: 'PN', minQty: 'Qty', unitPrice: 'Price', currency: 'CCY' } });
    expect(state.columns).toEqual({ internalPn: 'PN', mpn: '', supplier: '', currency: '', minQty: 'Qty', unitPrice: 'Price' });
    expect(state.supplierId).toBe('');
  });

  it('names every field for the request, null where the file has no column', () => {
    const state = { columns: { internalPn: 'PN', minQty: 'Qty', unitPrice: 'Price' }, supplierId: '4' };
    expect(mappingForRequest(state, fields)).toEqual({ internalPn: 'PN', mpn: null, supplier: null, currency: null, minQty: 'Qty', unitPrice: 'Price' });
  });

  it('says what is still to choose, by the server rules', () => {
    const gaps = mappingGaps({ columns: { minQty: 'Qty' }, supplierId: '' }, fields);
    expect(Object.keys(gaps).sort()).toEqual(['internalPn', 'supplier', 'unitPrice']);
    expect(gaps.unitPrice).toBe('choose the column for Unit price');
    // An MPN column serves as the part number; one supplier for the file serves as the supplier.
    expect(mappingGaps({ columns: { mpn: 'MPN', minQty: 'Qty', unitPrice: 'Price' }, supplierId: '4' }, fields)).toEqual({});
  });

  it('notices a column chosen twice', () => {
    expect(columnsUsedTwice({ columns: { internalPn: 'PN', mpn: 'PN', minQty: 'Qty' }, supplierId: '' })).toEqual(['PN']);
  });

  it('tells a changed mapping from the one checked', () => {
    const a = { columns: { minQty: 'Qty', unitPrice: 'Price' }, supplierId: '' };
    const b = { columns: { unitPrice: 'Price', minQty: 'Qty' }, supplierId: '' };
    expect(mappingKey(a)).toBe(mappingKey(b));
    expect(mappingKey({ ...a, supplierId: '2' })).not.toBe(mappingKey(a));
  });

  it('puts the server mapping problems on their fields', () => {
    expect(mappingProblemsByField([{ path: 'mapping.supplier', message: 'choose a supplier column' }, { path: 'supplierId', message: 'refers to a missing supplier' }])).toEqual({
      supplier: 'choose a supplier column',
      supplierId: 'refers to a missing supplier',
    });
  });

  it('groups a row problems by cell and shows only mapped fields', () => {
    const row = { row: 3, values: {}, problems: [{ field: 'currency', message: 'a' }, { field: 'currency', message: 'b' }, { field: 'minQty', message: 'c' }] };
    expect(problemsByField(row)).toEqual({ currency: ['a', 'b'], minQty: ['c'] });
    expect(shownFields(fields, { internalPn: 'PN', mpn: null, minQty: 'Q' }).map((f) => f.name)).toEqual(['internalPn', 'minQty']);
  });

  it('words a refused commit by row and field label', () => {
    expect(commitProblems([{ path: 'row 5.unitPrice', message: 'must be greater than 0' }, { path: '', message: 'Nothing imported.' }], fields)).toEqual([
      'Row 5, Unit price: must be greater than 0',
      'Nothing imported.',
    ]);
  });
});
