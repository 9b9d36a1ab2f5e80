import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import pino from 'pino';
import { createApp } from '../../server/app';
import { startTestApp, signUp, type TestApp } from '../helpers/app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => t.close());

describe('sessions live in PostgreSQL', () => {
  it('a session survives a server restart (a new app over the same database)', async () => {
    const { agent, body } = await signUp(t);
    const login = await agent.post('/api/auth/login').send({ email: body.email, password: body.password }).expect(200);
    const cookie = login.headers['set-cookie'][0].split(';')[0];
    await t.farthing.close();
    const restarted = createApp({ db: t.database.db, config: t.config, logger: pino({ level: 'silent' }) });
    try {
      const me = await request(restarted.app).get('/api/auth/me').set('Cookie', cookie).expect(200);
      expect(me.body.user.email).toBe(body.email);
    } finally {
      t.farthing = restarted;
    }
  });
});
