/** The error body every API failure carries (see the HTTP contract). */
export interface ApiErrorBody {
  error: {
    code: string;
    message: string;
    details?: { path: string; message: string }[];
  };
}

export const errorCodes = {
  validation_failed: 400,
  unauthenticated: 401,
  plan_limit: 402,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  stale_version: 409,
  read_only: 409,
  link_expired: 410,
  too_large: 413,
  unsupported_type: 415,
  unreadable_file: 422,
  rate_limited: 429,
  internal: 500,
  database_unavailable: 503,
} as const;
export type ErrorCode = keyof typeof errorCodes;
