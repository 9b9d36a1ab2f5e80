import { describe, expect, it } from 'vitest';
import { expandRefDes, refDesMismatch } from './ref-des';

describe('reference designators', () => {
  it('expands ranges and lists (common practice in BOMs)', () => {
    expect(expandRefDes('R1-R4').refs).toEqual(['R1', 'R2', 'R3', 'R4']);
    expect(expandRefDes('C3, C5-7 C9').refs).toEqual(['C3', 'C5', 'C6', 'C7', 'C9']);
    expect(expandRefDes('').refs).toEqual([]);
  });
  it('rejects backwards or mixed ranges with a reason', () => {
    expect(expandRefDes('R4-R1').error).toMatch(/backwards/);
    expect(expandRefDes('R1-C4').error).toMatch(/one prefix/);
    expect(expandRefDes('R1-R99999').error).toMatch(/too long/);
  });
  it('warns only when the count disagrees with the quantity', () => {
    expect(refDesMismatch('R1-R4', '4')).toBe(false);
    expect(refDesMismatch('R1-R4', '3')).toBe(true);
    expect(refDesMismatch('', '3')).toBe(false);
  });
});
