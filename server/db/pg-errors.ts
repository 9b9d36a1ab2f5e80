import { HttpError, errors } from '../http/errors';

/**
 * Translates PostgreSQL failures into client errors in one place, so services lean
 * on constraints instead of check-then-insert.
 */
const connectionCodes = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT', 'ENOTFOUND', 'EHOSTUNREACH']);

interface PgLikeError {
  code?: string;
  constraint?: string;
  column?: string;
  detail?: string;
  name?: string;
  message?: string;
}

export function isDatabaseUnavailable(err: unknown): boolean {
  const e = err as PgLikeError;
  if (!e || typeof e !== 'object') return false;
  if (e.name === 'KnexTimeoutError') return true;
  if (e.code && connectionCodes.has(e.code)) return true;
  // 57P01 admin shutdown, 57P02 crash shutdown, 57P03 cannot connect now, 53300 too many
  // connections, 08xxx connection exceptions
  if (e.code && (/^57P0[123]$/.test(e.code) || e.code === '53300' || e.code.startsWith('08'))) return true;
  const m = e.message ?? '';
  return /Connection terminated|connect ECONNREFUSED|the database system is (starting up|shutting down)|Client has encountered a connection error/i.test(m);
}

const snakeToCamel = (s: string) => s.replace(/_([a-z0-9])/g, (_, c: string) => c.toUpperCase());

/** The field a unique or foreign-key constraint guards, from its conventional name. */
function fieldOf(e: PgLikeError): string {
  if (e.column) return snakeToCamel(e.column);
  const m = /\(([^)]+)\)=/.exec(e.detail ?? '');
  if (m) return m[1].split(',').map((c) => snakeToCamel(c.trim())).filter((c) => c !== 'workspaceId').join(',');
  return '';
}

export function mapPgError(err: unknown): HttpError | null {
  if (err instanceof HttpError) return err;
  if (isDatabaseUnavailable(err)) return errors.unavailable();
  const e = err as PgLikeError;
  switch (e?.code) {
    case '23505':
      return errors.conflict('A record with this value already exists.', [{ path: fieldOf(e), message: 'is already taken' }]);
    case '23503':
      return errors.validation('A referenced record does not exist in this workspace.', [
        { path: fieldOf(e), message: 'refers to a missing record' },
      ]);
    case '23502':
      return errors.validation('A required value is missing.', [{ path: fieldOf(e), message: 'is required' }]);
    case '22001':
      return errors.validation('A value is too long.', [{ path: fieldOf(e), message: 'is too long' }]);
    case '23514':
      return errors.validation('A value is out of range.', [{ path: e.constraint ?? '', message: 'is out of range' }]);
    case '22P02':
    case '22003':
      return errors.validation('A value has the wrong form.', [{ path: fieldOf(e), message: 'has the wrong form' }]);
    default:
      return null;
  }
}
