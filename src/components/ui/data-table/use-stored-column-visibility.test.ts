import { describe, expect, it } from 'vitest';
import { readVisibility } from './use-stored-column-visibility';

describe('remembered columns', () => {
  it('lays the stored choice over the defaults', () => {
    expect(readVisibility('{"hsCode":true,"mpn":false}', { hsCode: false, weight: false })).toEqual({ hsCode: true, mpn: false, weight: false });
  });

  it('ignores a damaged or foreign value', () => {
    expect(readVisibility('not json', { hsCode: false })).toEqual({ hsCode: false });
    expect(readVisibility('[true]', {})).toEqual({});
    expect(readVisibility('{"mpn":"no"}', {})).toEqual({});
    expect(readVisibility(null, { a: false })).toEqual({ a: false });
  });
});
