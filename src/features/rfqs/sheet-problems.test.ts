import { describe, expect, it } from 'vitest';
import { sheetProblemPlace } from './sheet-problems';

describe('sheet problems in the sheet’s own words', () => {
  it('names the row and the column heading of the downloaded sheet', () => {
    expect(sheetProblemPlace('row 2.validUntil')).toBe('Row 2, Valid until');
    expect(sheetProblemPlace('row 3.priceBreaks.1.unitPrice')).toBe('Row 3, Unit price 2');
    expect(sheetProblemPlace('row 3.priceBreaks.0.minQty')).toBe('Row 3, Qty 1');
    expect(sheetProblemPlace('row 4')).toBe('Row 4');
    expect(sheetProblemPlace('file')).toBe('The file');
  });
});
