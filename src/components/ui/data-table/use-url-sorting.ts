import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { OnChangeFn, SortingState } from '@tanstack/react-table';

/**
 * Keeps a table's sort in the address (`?sort=name`, `?sort=-joinedAt` for descending),
 * so a sorted view survives reload and can be shared.
 */
export function useUrlSorting(param = 'sort'): [SortingState, OnChangeFn<SortingState>] {
  const [searchParams, setSearchParams] = useSearchParams();
  const raw = searchParams.get(param);

  const sorting = useMemo<SortingState>(() => {
    if (!raw) return [];
    const desc = raw.startsWith('-');
    const id = desc ? raw.slice(1) : raw;
    return id ? [{ id, desc }] : [];
  }, [raw]);

  const onSortingChange = useCallback<OnChangeFn<SortingState>>(
    (updater) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      setSearchParams(
        (params) => {
          const first = next[0];
          if (first) params.set(param, `${first.desc ? '-' : ''}${first.id}`);
          else params.delete(param);
          return params;
        },
        { replace: true },
      );
    },
    [param, setSearchParams, sorting],
  );

  return [sorting, onSortingChange];
}
