import { describe, expect, it } from 'vitest';
import { filtersFromParams, paramsWithFilters } from './use-url-column-filters';

describe('column filters in the address', () => {
  it('reads only the prefixed, non-empty parameters', () => {
    const params = new URLSearchParams('q=10k&f.mpn=RC0603&f.package=&sort=-mpn&f.=x');
    expect(filtersFromParams(params)).toEqual([{ id: 'mpn', value: 'RC0603' }]);
  });

  it('replaces the old filters and keeps the search and sort', () => {
    const params = new URLSearchParams('q=10k&f.mpn=RC&sort=mpn');
    const next = paramsWithFilters(params, [{ id: 'package', value: '0603' }, { id: 'maker', value: '' }]);
    expect(next.toString()).toBe('q=10k&sort=mpn&f.package=0603');
    expect(params.get('f.mpn')).toBe('RC');
  });

  it('round-trips', () => {
    const filters = [{ id: 'manufacturer', value: 'Tinbell & Co' }, { id: 'hsCode', value: '8533' }];
    expect(filtersFromParams(paramsWithFilters(new URLSearchParams(), filters))).toEqual(filters);
  });
});
