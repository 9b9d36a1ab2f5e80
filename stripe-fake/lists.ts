import { invalid } from './errors';
import type { ApiList } from './objects';

export interface PageParams {
  limit?: number;
  starting_after?: string;
  ending_before?: string;
}

/**
 * One page of a list that is already in the service's order (newest first), cut by
 * `limit` (default 10) after `starting_after` or before `ending_before`, which is what the
 * SDK's auto-pagination sends for the next page.
 */
export function page<T extends { id: string }>(all: T[], params: PageParams, url: string): ApiList<T> {
  const limit = params.limit ?? 10;
  const indexOf = (id: string, param: string) => {
    const at = all.findIndex((o) => o.id === id);
    if (at < 0) throw invalid(`Invalid ${param}: no object '${id}' in this list.`, param);
    return at;
  };
  if (params.ending_before !== undefined && params.starting_after === undefined) {
    const end = indexOf(params.ending_before, 'ending_before');
    const from = Math.max(0, end - limit);
    return { object: 'list', url, has_more: from > 0, data: all.slice(from, end) };
  }
  const start = params.starting_after === undefined ? 0 : indexOf(params.starting_after, 'starting_after') + 1;
  return { object: 'list', url, has_more: start + limit < all.length, data: all.slice(start, start + limit) };
}
