import type { ApiErrorBody } from '../shared/errors';

/**
 * The one way the client talks to the API. It speaks JSON, sends the session cookie,
 * adds the header the server's cross-site-request rule asks for on every state-changing
 * request, and turns every failure into an ApiError. It never navigates or shows
 * anything: callers decide what a failure means on screen.
 */

export type FieldProblem = { path: string; message: string };

export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: FieldProblem[];

  constructor(status: number, code: string, message: string, details: FieldProblem[] = []) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.details = details;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

/** Status 0: the request never got an answer (offline, server restarting). */
export const NETWORK_ERROR = 'network_error';

/**
 * Failures worth retrying on their own: the database is away (503) or the server could
 * not be reached. Everything else is an answer and retrying would only repeat it.
 */
export function isTransientError(error: unknown): boolean {
  if (!isApiError(error)) return false;
  return error.status === 0 || error.status === 503 || error.code === 'database_unavailable';
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export type RequestOptions = {
  body?: unknown;
  query?: Record<string, string | number | undefined>;
  signal?: AbortSignal;
};

const stateChanging = new Set<Method>(['POST', 'PATCH', 'PUT', 'DELETE']);

function withQuery(path: string, query: RequestOptions['query']): string {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined) params.set(key, String(value));
  }
  const text = params.toString();
  if (!text) return path;
  return path + (path.includes('?') ? '&' : '?') + text;
}

function looksLikeErrorBody(value: unknown): value is ApiErrorBody {
  if (typeof value !== 'object' || value === null || !('error' in value)) return false;
  const error = (value as { error: unknown }).error;
  return typeof error === 'object' && error !== null && 'code' in error;
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

export async function request<T>(method: Method, path: string, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  if (stateChanging.has(method)) headers['X-Requested-With'] = 'farthing';

  let response: Response;
  try {
    response = await fetch(withQuery(path, options.query), {
      method,
      headers,
      credentials: 'same-origin',
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (cause) {
    // An abort is the caller's own doing (TanStack Query cancelling): let it through as is.
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, NETWORK_ERROR, 'The server could not be reached.');
  }

  const payload = await readJson(response);
  if (!response.ok) {
    if (looksLikeErrorBody(payload)) {
      const { code, message, details } = payload.error;
      throw new ApiError(response.status, code, message || `Request failed (${response.status}).`, details ?? []);
    }
    const code = response.status === 503 ? 'database_unavailable' : 'http_error';
    throw new ApiError(response.status, code, `The server answered with an error (${response.status}).`);
  }
  return payload as T;
}

export const api = {
  get: <T>(path: string, options?: Omit<RequestOptions, 'body'>) => request<T>('GET', path, options),
  post: <T>(path: string, body?: unknown, options?: RequestOptions) => request<T>('POST', path, { ...options, body }),
  patch: <T>(path: string, body?: unknown, options?: RequestOptions) => request<T>('PATCH', path, { ...options, body }),
  put: <T>(path: string, body?: unknown, options?: RequestOptions) => request<T>('PUT', path, { ...options, body }),
  delete: <T = void>(path: string, options?: RequestOptions) => request<T>('DELETE', path, options),
};

/** Every list answers `{items, nextCursor}`. */
export type Page<T> = { items: T[]; nextCursor: string | null };

/**
 * Reads a list to its end by following `nextCursor`. For the short lists of settings
 * (members, invites, tokens), where one screen shows every row, and for long ones read
 * in pages (a BOM's lines, the parts library); `query` adds filters and a page size.
 * A list that changed between its pages answers 409: it is read again from the start
 * (at most three times), so the rows shown are one consistent read.
 */
export async function getAllPages<T>(
  path: string,
  signal?: AbortSignal,
  query: Record<string, string | number | undefined> = {},
): Promise<T[]> {
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await readPages<T>(path, signal, query);
    } catch (err) {
      if (!(err instanceof ApiError && err.status === 409 && attempt < 3)) throw err;
    }
  }
}

async function readPages<T>(path: string, signal: AbortSignal | undefined, query: Record<string, string | number | undefined>): Promise<T[]> {
  const items: T[] = [];
  let cursor: string | undefined;
  // A guard against a server that keeps answering: a list this long is not shown whole.
  for (let pageCount = 0; pageCount < 1000; pageCount += 1) {
    const page = await api.get<Page<T>>(path, { query: { ...query, cursor }, signal });
    items.push(...page.items);
    if (!page.nextCursor) return items;
    if (page.nextCursor === cursor) throw new ApiError(500, 'paging_stuck', 'The server answered the same page twice.');
    cursor = page.nextCursor;
  }
  throw new ApiError(413, 'list_too_long', 'This list is too long to show whole.');
}
