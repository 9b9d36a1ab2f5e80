import type { ErrorCode } from '../../src/shared/errors';
import { errorCodes } from '../../src/shared/errors';

export interface ErrorDetail {
  path: string;
  message: string;
}

/** An error meant for the client: its code picks the status, its message is shown as is. */
export class HttpError extends Error {
  readonly status: number;
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly details?: ErrorDetail[],
  ) {
    super(message);
    this.status = errorCodes[code];
  }
}

export const errors = {
  validation: (message: string, details?: ErrorDetail[]) => new HttpError('validation_failed', message, details),
  unauthenticated: (message = 'Sign in to continue.') => new HttpError('unauthenticated', message),
  forbidden: (message = 'Your role in this workspace may not do this.') => new HttpError('forbidden', message),
  notFound: (what = 'record') => new HttpError('not_found', `No such ${what} in this workspace.`),
  stale: (what = 'record') =>
    new HttpError('stale_version', `This ${what} was changed by someone else; reload it and try again.`),
  conflict: (message: string, details?: ErrorDetail[]) => new HttpError('conflict', message, details),
  planLimit: (message: string) => new HttpError('plan_limit', message),
  tooLarge: (message: string) => new HttpError('too_large', message),
  unsupported: (message: string) => new HttpError('unsupported_type', message),
  unreadable: (message: string) => new HttpError('unreadable_file', message),
  readOnly: (message: string) => new HttpError('read_only', message),
  linkExpired: (message: string) => new HttpError('link_expired', message),
  rateLimited: () => new HttpError('rate_limited', 'Too many attempts; wait a minute and try again.'),
  unavailable: () =>
    new HttpError('database_unavailable', 'The database is unavailable right now; please retry in a few seconds.'),
};
