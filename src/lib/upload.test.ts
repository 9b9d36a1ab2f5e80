import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client';
import { progressPercent, readUploadAnswer } from './upload';

function caught(fn: () => unknown): ApiError {
  try {
    fn();
  } catch (error) {
    if (error instanceof ApiError) return error;
    throw error;
  }
  throw new Error('expected an ApiError');
}

describe('reading an upload answer', () => {
  it('gives the body of a success', () => {
    expect(readUploadAnswer<{ imported: number }>(200, '{"imported":3}')).toEqual({ imported: 3 });
  });

  it('keeps the server message and details of a refusal', () => {
    const error = caught(() =>
      readUploadAnswer(400, JSON.stringify({ error: { code: 'validation_failed', message: '2 row(s) have problems; nothing was imported.', details: [{ path: 'row 3.currency', message: 'must be an ISO 4217 code such as USD' }] } })),
    );
    expect(error.status).toBe(400);
    expect(error.message).toBe('2 row(s) have problems; nothing was imported.');
    expect(error.details).toEqual([{ path: 'row 3.currency', message: 'must be an ISO 4217 code such as USD' }]);
  });

  it('words a bare 413 from a proxy that sent no JSON', () => {
    const error = caught(() => readUploadAnswer(413, '<html>Request Entity Too Large</html>'));
    expect(error.code).toBe('too_large');
    expect(error.message).toMatch(/too large/);
  });

  it('treats status 0 as an unreachable server', () => {
    expect(caught(() => readUploadAnswer(0, '')).code).toBe('network_error');
  });
});

describe('upload progress', () => {
  it('is a whole percent, unknown while the total is unknown', () => {
    expect(progressPercent({ loaded: 512, total: 2048 })).toBe(25);
    expect(progressPercent({ loaded: 5, total: null })).toBeNull();
    expect(progressPercent(null)).toBeNull();
    expect(progressPercent({ loaded: 3000, total: 2048 })).toBe(100);
  });
});
