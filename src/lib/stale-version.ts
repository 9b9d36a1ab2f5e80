import { isApiError } from './api-client';

/** An update sent with an old `version`: someone else saved the record first (409). */
export function isStaleVersion(error: unknown): boolean {
  return isApiError(error) && error.status === 409 && error.code === 'stale_version';
}

export const STALE_VERSION_MESSAGE =
  'This record was changed by someone else while you were editing. Reload it to see their changes, then make yours again.';
