import { afterEach, describe, expect, it, vi } from 'vitest';
import { api, ApiError, getAllPages, isTransientError } from './api-client';

type Call = { url: string; init: RequestInit };

/** Stands in for the network: records each request and answers from a script. */
function answer(...responses: (Response | Error)[]) {
  const calls: Call[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init: RequestInit) => {
      calls.push({ url, init });
      const next = responses.shift();
      if (!next) throw new Error(`unexpected request to ${url}`);
      if (next instanceof Error) throw next;
      return next;
    }),
  );
  return calls;
}

const jsonResponse = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('api client', () => {
  it('sends the cross-site header and the session cookie on every state-changing method', async () => {
    const calls = answer(new Response(null, { status: 204 }), new Response(null, { status: 204 }), new Response(null, { status: 204 }), new Response(null, { status: 204 }));
    await api.post('/api/auth/logout');
    await api.patch('/api/members/7', { role: 'buyer' });
    await api.put('/api/things/1', {});
    await api.delete('/api/tokens/3');
    for (const call of calls) {
      expect((call.init.headers as Record<string, string>)['X-Requested-With']).toBe('farthing');
      expect(call.init.credentials).toBe('same-origin');
    }
    expect(calls[1].init.body).toBe('{"role":"buyer"}');
    expect((calls[1].init.headers as Record<string, string>)['Content-Type']).toBe('application/json');
  });

  it('does not add the cross-site header to reads', async () => {
    const calls = answer(jsonResponse(200, { items: [], nextCursor: null }));
    await api.get('/api/members');
    expect((calls[0].init.headers as Record<string, string>)['X-Requested-With']).toBeUndefined();
    expect(calls[0].init.credentials).toBe('same-origin');
  });

  it('turns the error body into an ApiError with status, code, message and field details', async () => {
    answer(
      jsonResponse(400, {
        error: { code: 'validation_failed', message: 'Check the fields.', details: [{ path: 'email', message: 'must be an e-mail address' }] },
      }),
    );
    const error = await api.post('/api/auth/signup', {}).catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 400,
      code: 'validation_failed',
      message: 'Check the fields.',
      details: [{ path: 'email', message: 'must be an e-mail address' }],
    });
  });

  it('treats a database outage and an unreachable server as worth retrying, a 401 not', async () => {
    answer(jsonResponse(503, { error: { code: 'database_unavailable', message: 'Database unavailable.' } }), new TypeError('fetch failed'), jsonResponse(401, { error: { code: 'unauthenticated', message: 'Sign in.' } }));
    const outage = await api.get('/api/members').catch((caught: unknown) => caught);
    const offline = await api.get('/api/members').catch((caught: unknown) => caught);
    const signedOut = await api.get('/api/members').catch((caught: unknown) => caught);
    expect(outage).toMatchObject({ status: 503, code: 'database_unavailable' });
    expect(offline).toMatchObject({ status: 0, code: 'network_error' });
    expect([outage, offline, signedOut].map(isTransientError)).toEqual([true, true, false]);
  });

  it('gives a plain error for an answer that is not our error shape (a proxy page)', async () => {
    answer(new Response('<html>Bad gateway</html>', { status: 502 }));
    await expect(api.get('/api/members')).rejects.toMatchObject({ status: 502, code: 'http_error' });
  });

  it('reads a list to its end by following nextCursor', async () => {
    const calls = answer(
      jsonResponse(200, { items: [{ id: '1' }], nextCursor: 'c2' }),
      jsonResponse(200, { items: [{ id: '2' }], nextCursor: null }),
    );
    expect(await getAllPages<{ id: string }>('/api/tokens')).toEqual([{ id: '1' }, { id: '2' }]);
    expect(calls.map((call) => call.url)).toEqual(['/api/tokens', '/api/tokens?cursor=c2']);
  });

  it('reads a list again from the start when it changed between pages (409), at most three times', async () => {
    const changed = jsonResponse(409, { error: { code: 'conflict', message: 'The lines changed while they were read page by page.' } });
    const calls = answer(
      jsonResponse(200, { items: [{ id: '1' }], nextCursor: 'a' }),
      changed,
      jsonResponse(200, { items: [{ id: '3' }], nextCursor: 'b' }),
      jsonResponse(200, { items: [{ id: '1' }], nextCursor: null }),
    );
    expect(await getAllPages<{ id: string }>('/api/boms/7/lines')).toEqual([{ id: '3' }, { id: '1' }]);
    expect(calls.map((call) => call.url)).toEqual(['/api/boms/7/lines', '/api/boms/7/lines?cursor=a', '/api/boms/7/lines', '/api/boms/7/lines?cursor=b']);
    const again = () => [jsonResponse(200, { items: [{ id: '1' }], nextCursor: 'a' }), jsonResponse(409, { error: { code: 'conflict', message: 'changed' } })];
    answer(...again(), ...again(), ...again());
    await expect(getAllPages('/api/boms/7/lines')).rejects.toMatchObject({ status: 409 });
  });

  it('never returns part of a list: a server answering the same page twice is an error', async () => {
    answer(jsonResponse(200, { items: [{ id: '1' }], nextCursor: 'a' }), jsonResponse(200, { items: [{ id: '1' }], nextCursor: 'a' }));
    await expect(getAllPages('/api/tokens')).rejects.toMatchObject({ code: 'paging_stuck' });
  });
});
