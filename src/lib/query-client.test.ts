import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client';
import { retryDelay, shouldRetry } from './query-client';

describe('retry policy', () => {
  it('keeps retrying while the database is away', () => {
    const outage = new ApiError(503, 'database_unavailable', 'Database unavailable.');
    expect(shouldRetry(0, outage)).toBe(true);
    expect(shouldRetry(20, outage)).toBe(true);
    expect(shouldRetry(30, outage)).toBe(false);
  });

  it('never retries an answer that will not change', () => {
    for (const status of [400, 401, 403, 404, 409]) {
      expect(shouldRetry(0, new ApiError(status, 'x', 'x'))).toBe(false);
    }
  });

  it('retries another server fault once', () => {
    const fault = new ApiError(500, 'internal', 'Internal error.');
    expect(shouldRetry(0, fault)).toBe(true);
    expect(shouldRetry(1, fault)).toBe(false);
  });

  it('waits longer after each failure, never more than five seconds', () => {
    const delays = [0, 1, 2, 3, 4, 10].map(retryDelay);
    expect(delays).toEqual([500, 1000, 2000, 4000, 5000, 5000]);
  });
});
