import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { ColumnFiltersState, OnChangeFn } from '@tanstack/react-table';

/** `?f.mpn=0603&f.package=sot` ↔ TanStack's column filters; only text filters travel. */
export function filtersFromParams(params: URLSearchParams, prefix = 'f.'): ColumnFiltersState {
  const filters: ColumnFiltersState = [];
  for (const [key, value] of params) {
    if (key.startsWith(prefix) && key.length > prefix.length && value) filters.push({ id: key.slice(prefix.length), value });
  }
  return filters;
}

/** Writes the filters into `params` (a copy), dropping the old ones and empty boxes. */
export function paramsWithFilters(params: URLSearchParams, filters: ColumnFiltersState, prefix = 'f.'): URLSearchParams {
  const next = new URLSearchParams(params);
  for (const key of [...next.keys()]) if (key.startsWith(prefix)) next.delete(key);
  for (const filter of filters) {
    const text = typeof filter.value === 'string' ? filter.value : String(filter.value ?? '');
    if (text) next.set(`${prefix}${filter.id}`, text);
  }
  return next;
}

/**
 * Keeps a table's per-column filters in the address, as `useUrlSorting` keeps its
 * sort: a filtered view survives reload and can be shared.
 */
export function useUrlColumnFilters(prefix = 'f.'): [ColumnFiltersState, OnChangeFn<ColumnFiltersState>] {
  const [searchParams, setSearchParams] = useSearchParams();
  const key = searchParams.toString();
  // eslint-disable-next-line react-hooks/exhaustive-deps -- the text of the address is the dependency
  const filters = useMemo(() => filtersFromParams(searchParams, prefix), [key, prefix]);

  const onChange = useCallback<OnChangeFn<ColumnFiltersState>>(
    (updater) => {
      setSearchParams(
        (params) => paramsWithFilters(params, typeof updater === 'function' ? updater(filtersFromParams(params, prefix)) : updater, prefix),
        { replace: true },
      );
    },
    [prefix, setSearchParams],
  );

  return [filters, onChange];
}
