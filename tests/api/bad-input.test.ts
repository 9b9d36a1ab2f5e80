import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { startTestApp, signUp, type TestApp } from '../helpers/app';
import { snapshot } from '../helpers/db';

let t: TestApp;
let owner: Awaited<ReturnType<typeof signUp>>;
beforeAll(async () => {
  t = await startTestApp();
  owner = await signUp(t);
});
afterAll(async () => t.close());

async function expect400(send: () => Promise<request.Response>) {
  const before = await snapshot(t.database.db);
  const res = await send();
  expect(res.status, JSON.stringify(res.body)).toBe(400);
  expect(res.body.error.code).toBe('validation_failed');
  expect(res.body.error.details?.length).toBeGreaterThan(0);
  expect(await snapshot(t.database.db)).toEqual(before);
  return res;
}

describe('bad input answers 400 with details and writes nothing', () => {
  it('malformed JSON', async () => {
    await expect400(() => owner.agent.post('/api/invites').set('Content-Type', 'application/json').send('{"email": "a@b.c", role: }'));
  });
  it('wrong types', async () => {
    const res = await expect400(() => owner.agent.post('/api/invites').send({ email: 42, role: ['owner'] }));
    expect(res.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual(['email', 'role']);
  });
  it('unknown fields', async () => {
    const res = await expect400(() => owner.agent.post('/api/invites').send({ email: 'x@tinbell.example', role: 'buyer', isAdmin: true }));
    expect(res.body.error.details[0].path).toBe('isAdmin');
  });
  it('huge strings', async () => {
    await expect400(() => owner.agent.post('/api/tokens').send({ name: 'x'.repeat(100_000) }));
    await expect400(() =>
      t.agent().post('/api/auth/signup').send({ email: `${'a'.repeat(300)}@tinbell.example`, password: 'long enough pw', name: 'n', workspaceName: 'w' }),
    );
  });
  it('an invalid role and a bad id', async () => {
    await expect400(() => owner.agent.post('/api/invites').send({ email: 'x@tinbell.example', role: 'admin' }));
    await expect400(() => owner.agent.patch('/api/members/abc').send({ role: 'viewer' }));
  });
  it('a body where none is taken', async () => {
    await expect400(() => owner.agent.get('/api/members').query({ limit: 5 }).then(() => owner.agent.post('/api/auth/logout').send({ everything: true })));
  });
  it('a body over 1 MB is 413, not a crash', async () => {
    const res = await owner.agent.post('/api/tokens').send({ name: 'x'.repeat(1_100_000) });
    expect(res.status).toBe(413);
  });
  it('errors never carry a stack trace', async () => {
    const res = await request(t.farthing.app).post('/api/auth/login').set('X-Requested-With', 'farthing').set('Content-Type', 'application/json').send('{');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts:\d+/);
  });
  it('an unknown API route is a 404 in the error shape', async () => {
    const res = await owner.agent.get('/api/nowhere').expect(404);
    expect(res.body.error.code).toBe('not_found');
  });
});
