import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, signUp, waitForMail, linkIn, type TestApp } from '../helpers/app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => t.close());

describe('sign-up, sign-in, sign-out', () => {
  it('sign-up creates a workspace with the user as owner and signs in', async () => {
    const { agent, body } = await signUp(t, { workspaceName: 'Tinbell Lab' });
    const me = await agent.get('/api/auth/me').expect(200);
    expect(me.body.user.email).toBe(body.email);
    expect(me.body.role).toBe('owner');
    expect(me.body.workspace.name).toBe('Tinbell Lab');
    expect(me.body.workspaces).toHaveLength(1);
  });

  it('a taken e-mail is a 409 naming the field', async () => {
    const { body } = await signUp(t);
    const res = await t.agent().post('/api/auth/signup').send({ ...body, workspaceName: 'Other' }).expect(409);
    expect(res.body.error.details[0].path).toBe('email');
  });

  it('sign-in sets a session cookie; sign-out destroys the session on the server', async () => {
    const { body } = await signUp(t);
    const agent = t.agent();
    const login = await agent.post('/api/auth/login').send({ email: body.email, password: body.password }).expect(200);
    const cookie = login.headers['set-cookie'][0];
    expect(cookie).toMatch(/farthing\.sid=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    await agent.get('/api/auth/me').expect(200);
    await agent.post('/api/auth/logout').expect(204);
    await agent.get('/api/auth/me').expect(401);
    // The old cookie replayed by hand is dead too: the session row is gone.
    const replay = await t.agent().get('/api/auth/me').set('Cookie', cookie.split(';')[0]);
    expect(replay.status).toBe(401);
  });

  it('a wrong password and an unknown e-mail get the same generic 401', async () => {
    const { body } = await signUp(t);
    const a = await t.agent().post('/api/auth/login').send({ email: body.email, password: 'wrong password!' }).expect(401);
    const b = await t.agent().post('/api/auth/login').send({ email: 'nobody@tinbell.example', password: 'wrong password!' }).expect(401);
    expect(a.body.error.message).toBe(b.body.error.message);
    expect(a.body.error.message).toBe('E-mail or password is wrong.');
  });

  it('the session id changes at sign-in (no fixation)', async () => {
    const { body } = await signUp(t);
    const agent = t.agent();
    const first = await agent.post('/api/auth/login').send({ email: body.email, password: body.password }).expect(200);
    const second = await agent.post('/api/auth/login').send({ email: body.email, password: body.password }).expect(200);
    expect(first.headers['set-cookie'][0].split(';')[0]).not.toBe(second.headers['set-cookie'][0].split(';')[0]);
  });
});

describe('rate limit on sign-in', () => {
  it('answers 429 after the configured number of attempts a minute', async () => {
    const limited = await startTestApp({ RATE_LIMIT_AUTH_PER_MINUTE: '3' });
    try {
      const agent = limited.agent();
      for (let i = 0; i < 3; i++) await agent.post('/api/auth/login').send({ email: 'x@tinbell.example', password: 'wrong-password' }).expect(401);
      const res = await agent.post('/api/auth/login').send({ email: 'x@tinbell.example', password: 'wrong-password' }).expect(429);
      expect(res.body.error.code).toBe('rate_limited');
    } finally {
      await limited.close();
    }
  });
});

describe('invite and accept', () => {
  it('an owner invites a buyer by e-mail; the link from the mail makes a buyer account', async () => {
    const owner = await signUp(t, { workspaceName: 'Invite Co' });
    const email = `buyer-${Date.now()}@tinbell.example`;
    await owner.agent.post('/api/invites').send({ email, role: 'buyer' }).expect(201);
    const mail = await waitForMail(t.sink, email);
    expect(mail.subject).toContain('Invite Co');
    const token = linkIn(mail.text, '/invite');

    const preview = await t.agent().get('/api/invites/preview').query({ token }).expect(200);
    expect(preview.body).toMatchObject({ email, workspaceName: 'Invite Co', role: 'buyer' });

    const buyer = t.agent();
    const res = await buyer.post('/api/invites/accept').send({ token, name: 'Bea', password: 'buyer password 1' }).expect(200);
    expect(res.body.role).toBe('buyer');
    expect((await buyer.get('/api/auth/me').expect(200)).body.workspace.name).toBe('Invite Co');
    // One-time: the same link fails now.
    await t.agent().post('/api/invites/accept').send({ token, name: 'Bea', password: 'buyer password 1' }).expect(400);
    const members = await owner.agent.get('/api/members').expect(200);
    expect(members.body.items.map((m: { email: string }) => m.email)).toContain(email);
  });

  it('an expired invitation is refused', async () => {
    const owner = await signUp(t);
    const email = `late-${Date.now()}@tinbell.example`;
    await owner.agent.post('/api/invites').send({ email, role: 'viewer' }).expect(201);
    const token = linkIn((await waitForMail(t.sink, email)).text, '/invite');
    await t.database.db('invites').where({ email }).update({ expiresAt: new Date(Date.now() - 1000) });
    await t.agent().get('/api/invites/preview').query({ token }).expect(404);
    await t.agent().post('/api/invites/accept').send({ token, name: 'Late', password: 'late password 1' }).expect(400);
  });

  it('a designer may not invite (403) and a workspace keeps one owner (409)', async () => {
    const owner = await signUp(t);
    const { agent: designer } = await invitedMember(owner.agent, 'des', 'designer');
    await designer.post('/api/invites').send({ email: 'x@tinbell.example', role: 'owner' }).expect(403);
    await designer.patch(`/api/members/${owner.user.id}`).send({ role: 'viewer' }).expect(403);
    await owner.agent.patch(`/api/members/${owner.user.id}`).send({ role: 'viewer' }).expect(409);
  });
});

/** A new user invited by mail into the inviter's workspace with a role, signed in as they accept. */
async function invitedMember(inviter: ReturnType<TestApp['agent']>, prefix: string, role: string) {
  const email = `${prefix}-${Date.now()}@tinbell.example`;
  await inviter.post('/api/invites').send({ email, role }).expect(201);
  const token = linkIn((await waitForMail(t.sink, email)).text, '/invite');
  const agent = t.agent();
  const accepted = await agent.post('/api/invites/accept').send({ token, name: prefix, password: `${prefix} password 1` }).expect(200);
  return { agent, accepted };
}

describe('roles apply at once', () => {
  it("a member's next request after a role change or removal uses the new role, signed in all along", async () => {
    const owner = await signUp(t);
    const { agent: member, accepted } = await invitedMember(owner.agent, 'mover', 'designer');
    const partBody = () => ({ internalPn: `MV-${Date.now()}-${Math.random()}`, category: 'other' });
    await member.post('/api/parts').send(partBody()).expect(201);
    await owner.agent.patch(`/api/members/${accepted.body.user.id}`).send({ role: 'viewer' }).expect(200);
    await member.post('/api/parts').send(partBody()).expect(403);
    expect((await member.get('/api/auth/me').expect(200)).body.role).toBe('viewer');
    await owner.agent.delete(`/api/members/${accepted.body.user.id}`).expect(204);
    await member.get('/api/parts').expect(401);
  });
});

describe('password reset', () => {
  it('a reset link by mail sets a new password once and signs out other sessions', async () => {
    const { agent, body } = await signUp(t);
    await t.agent().post('/api/auth/password-reset').send({ email: body.email }).expect(202);
    // Unknown addresses get the same answer.
    await t.agent().post('/api/auth/password-reset').send({ email: 'ghost@tinbell.example' }).expect(202);
    const token = linkIn((await waitForMail(t.sink, body.email)).text, '/reset-password');
    await t.agent().post('/api/auth/password-reset/confirm').send({ token, password: 'a brand new password' }).expect(204);
    await t.agent().post('/api/auth/password-reset/confirm').send({ token, password: 'another new password' }).expect(400);
    await agent.get('/api/auth/me').expect(401);
    await t.agent().post('/api/auth/login').send({ email: body.email, password: body.password }).expect(401);
    await t.agent().post('/api/auth/login').send({ email: body.email, password: 'a brand new password' }).expect(200);
  });
});

describe('several workspaces', () => {
  it('a user in two workspaces switches between them with a different role in each', async () => {
    const a = await signUp(t, { workspaceName: 'Alpha' });
    const b = await signUp(t, { workspaceName: 'Beta' });
    await b.agent.post('/api/invites').send({ email: a.body.email, role: 'viewer' }).expect(201);
    const token = linkIn((await waitForMail(t.sink, a.body.email)).text, '/invite');
    // An existing account joins with its own password.
    await t.agent().post('/api/invites/accept').send({ token, name: 'x', password: 'not my password' }).expect(400);
    const joined = t.agent();
    await joined.post('/api/invites/accept').send({ token, name: 'x', password: a.body.password }).expect(200);
    const me = await a.agent.get('/api/auth/me').expect(200);
    expect(me.body.workspaces.map((w: { name: string }) => w.name).sort()).toEqual(['Alpha', 'Beta']);
    const sw = await a.agent.post('/api/auth/switch').send({ workspaceId: b.workspace.id }).expect(200);
    expect(sw.body).toMatchObject({ role: 'viewer', workspace: { name: 'Beta' } });
    expect((await a.agent.get('/api/auth/me')).body.role).toBe('viewer');
    // The role that applies is the one in the workspace now chosen, from the next request on.
    await a.agent.post('/api/parts').send({ internalPn: `SW-${Date.now()}`, category: 'other' }).expect(403);
    await a.agent.post('/api/auth/switch').send({ workspaceId: a.workspace.id }).expect(200);
    await a.agent.post('/api/parts').send({ internalPn: `SW-${Date.now()}`, category: 'other' }).expect(201);
    await a.agent.post('/api/auth/switch').send({ workspaceId: b.workspace.id }).expect(200);
    // A workspace the user is not in is not found.
    const c = await signUp(t, { workspaceName: 'Gamma' });
    await a.agent.post('/api/auth/switch').send({ workspaceId: c.workspace.id }).expect(404);
  });
});

describe('API tokens', () => {
  it('a script signs in with a Bearer token acting with the user role; a revoked token fails', async () => {
    const { agent } = await signUp(t, { workspaceName: 'Script Co' });
    const created = await agent.post('/api/tokens').send({ name: 'nightly import' }).expect(201);
    expect(created.body.token).toMatch(/^fth_/);
    const list = await agent.get('/api/tokens').expect(200);
    expect(list.body.items[0]).not.toHaveProperty('token');
    const me = await t.agent().get('/api/auth/me').set('Authorization', `Bearer ${created.body.token}`).expect(200);
    expect(me.body).toMatchObject({ role: 'owner', workspace: { name: 'Script Co' } });
    // No CSRF header needed with a token: it is not an ambient credential.
    const raw = t.farthing.app;
    const { default: request } = await import('supertest');
    await request(raw).post('/api/invites').set('Authorization', `Bearer ${created.body.token}`).send({ email: `tok-${Date.now()}@tinbell.example`, role: 'viewer' }).expect(201);
    await agent.delete(`/api/tokens/${created.body.id}`).expect(204);
    await t.agent().get('/api/auth/me').set('Authorization', `Bearer ${created.body.token}`).expect(401);
    await t.agent().get('/api/auth/me').set('Authorization', 'Bearer fth_forged').expect(401);
  });
});

describe('cross-site requests', () => {
  it('a state-changing request with the session cookie but without our header is refused', async () => {
    const { agent, body } = await signUp(t);
    const { default: request } = await import('supertest');
    const cookie = (await agent.post('/api/auth/login').send({ email: body.email, password: body.password })).headers['set-cookie'][0].split(';')[0];
    const res = await request(t.farthing.app).post('/api/invites').set('Cookie', cookie).send({ email: 'csrf@tinbell.example', role: 'owner' });
    expect(res.status).toBe(403);
    expect(await t.database.db('invites').where({ email: 'csrf@tinbell.example' }).first()).toBeUndefined();
  });
});
