import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import passport from 'passport';
import { routeTable } from '../../server/routes';
import { can } from '../../src/shared/permissions';
import { roles } from '../../src/shared/schemas/common';
import { startTestApp, signUp, type TestApp } from '../helpers/app';
import { workspaceWithEveryRole, type RoleWorkspace } from '../helpers/roles';
import { snapshot } from '../helpers/db';

let t: TestApp;
let ws: RoleWorkspace;
beforeAll(async () => {
  t = await startTestApp();
  ws = await workspaceWithEveryRole(t, 'Session Co');
});
afterAll(async () => t.close());

const sid = (res: request.Response) => (res.headers['set-cookie'] as unknown as string[] | undefined)?.find((c) => c.startsWith('farthing.sid='))?.split(';')[0];

describe('sessions and access', () => {
  it('session fixation: a session id planted before sign-in is not the one after', async () => {
    const { body } = await signUp(t);
    const raw = request(t.farthing.app);
    // An attacker's cookie from an earlier anonymous request (a failed sign-in).
    const first = await raw.post('/api/auth/login').set('X-Requested-With', 'farthing').send({ email: body.email, password: 'wrong password' });
    const planted = sid(first) ?? 'farthing.sid=s%3Aplanted.fake';
    const login = await raw.post('/api/auth/login').set('X-Requested-With', 'farthing').set('Cookie', planted).send({ email: body.email, password: body.password }).expect(200);
    expect(sid(login)).toBeDefined();
    expect(sid(login)).not.toBe(planted);
    await raw.get('/api/auth/me').set('Cookie', planted).expect(401);
  });

  it('activity keeps a session alive, writing its expiry at most every ten minutes', async () => {
    const { body } = await signUp(t);
    const agent = t.agent();
    await agent.post('/api/auth/login').send({ email: body.email, password: body.password }).expect(200);
    const expiry = async () => {
      const r = await t.database.db.raw(`SELECT expire FROM session WHERE sess::jsonb -> 'passport' ->> 'user' = (SELECT id::text FROM users WHERE email = ?)`, [body.email]);
      return new Date(r.rows[0].expire).getTime();
    };
    const signedIn = await expiry();
    expect(signedIn).toBeGreaterThan(Date.now() + 13 * 24 * 3600 * 1000);
    // Requests straight after sign-in write nothing back.
    await t.database.db('session').whereRaw(`sess::jsonb -> 'passport' ->> 'user' = (SELECT id::text FROM users WHERE email = ?)`, [body.email]).update({ expire: new Date(signedIn - 60_000) });
    await agent.get('/api/auth/me').expect(200);
    expect(await expiry()).toBe(signedIn - 60_000);
    // Eleven minutes on, the next request moves the expiry forward again.
    const now = Date.now();
    const clock = vi.spyOn(Date, 'now').mockReturnValue(now + 11 * 60_000);
    try {
      await agent.get('/api/auth/me').expect(200);
    } finally {
      clock.mockRestore();
    }
    expect(await expiry()).toBeGreaterThan(now + 11 * 60_000 + 13 * 24 * 3600 * 1000);
  });

  it('sign-out invalidates the session on the server, not only in the browser', async () => {
    const { body } = await signUp(t);
    const agent = t.agent();
    const cookie = sid(await agent.post('/api/auth/login').send({ email: body.email, password: body.password }).expect(200))!;
    await agent.post('/api/auth/logout').expect(204);
    await request(t.farthing.app).get('/api/auth/me').set('Cookie', cookie).expect(401);
    const rows = await t.database.db.raw(`SELECT count(*)::int AS n FROM session WHERE sess::jsonb -> 'passport' ->> 'user' = (SELECT id::text FROM users WHERE email = ?)`, [body.email]);
    expect(rows.rows[0].n).toBe(1); // only the sign-up agent's session remains
  });

  it('a revoked API token fails at once', async () => {
    const token = (await ws.agents.owner.post('/api/tokens').send({ name: 'ci' }).expect(201)).body;
    const raw = request(t.farthing.app);
    await raw.get('/api/parts').set('Authorization', `Bearer ${token.token}`).expect(200);
    await ws.agents.owner.delete(`/api/tokens/${token.id}`).expect(204);
    await raw.get('/api/parts').set('Authorization', `Bearer ${token.token}`).expect(401);
  });

  it('cross-site form posts cannot change data', async () => {
    const cookie = sid(await ws.agents.owner.post('/api/auth/login').send({ email: (await t.database.db('users').where({ id: ws.userIds.owner }).first()).email, password: 'role password 123' }).expect(200))!;
    const before = await snapshot(t.database.db);
    const raw = request(t.farthing.app);
    const forms = [
      raw.post('/api/suppliers').set('Cookie', cookie).set('Origin', 'https://evil.example').type('form').send('name=Evil&country=CN&currency=CNY&defaultIncoterm=FOB'),
      raw.post('/api/invites').set('Cookie', cookie).type('text/plain').send('{"email":"evil@evil.example","role":"owner"}'),
      raw.post('/api/boms').set('Cookie', cookie).set('Content-Type', 'multipart/form-data; boundary=x').send('--x\r\nContent-Disposition: form-data; name="name"\r\n\r\nEvil\r\n--x--'),
    ];
    for (const res of await Promise.all(forms)) expect(res.status).toBe(403);
    expect(await snapshot(t.database.db)).toEqual(before);
  });

  it('role escalation through every route fails', async () => {
    // A viewer, buyer or designer tries to make themselves owner, invite an owner, or act on owner-only routes.
    for (const role of ['viewer', 'buyer', 'designer'] as const) {
      await ws.agents[role].patch(`/api/members/${ws.userIds[role]}`).send({ role: 'owner' }).expect(403);
      await ws.agents[role].post('/api/invites').send({ email: `esc-${role}@tinbell.example`, role: 'owner' }).expect(403);
    }
    // And generated from the route table: every route a role may not call answers 403 with a valid-looking body.
    const denied = routeTable(passport).filter((r) => r.access !== 'public' && r.access !== 'signedIn');
    let checked = 0;
    for (const r of denied) {
      for (const role of roles) {
        if (can(role, r.access as never)) continue;
        const res = await ws.agents[role][r.method](r.path.replace(/:[A-Za-z]+/g, '1')).send(r.method === 'get' || r.method === 'delete' ? undefined : { role: 'owner', version: 1 });
        expect(res.status, `${role} ${r.method} ${r.path}`).toBe(403);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(50);
    const owners = await t.database.db('memberships').where({ workspaceId: ws.workspaceId, role: 'owner' }).count('* as n').first();
    expect(Number(owners!.n)).toBe(1);
  });
});
