import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawn, type ChildProcess } from 'node:child_process';
import http from 'node:http';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { createTestDatabase, type TestDatabase } from '../helpers/db';
import { startMailSink, type MailSink } from '../../server/mail/sink';
import { startS3Fake, type S3Fake } from '../../server/files/s3-fake';
import { freePort } from '../helpers/ports';
import { tinyPdf } from '../helpers/factories';

/**
 * Two app server processes on two loopback ports, one database, one object store, one mail
 * sink: nothing lives in a server, so any server answers any request.
 */
let database: TestDatabase;
let sink: MailSink;
let s3: S3Fake;
let s3Dir: string;
const servers: { proc: ChildProcess; url: string }[] = [];
let env: Record<string, string>;

async function startServer(env: Record<string, string>): Promise<{ proc: ChildProcess; url: string }> {
  const port = await freePort();
  const proc = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: { ...process.env, ...env, PORT: String(port), NODE_ENV: 'test', LOG_LEVEL: 'warn', SERVE_CLIENT: 'false' },
    stdio: ['ignore', 'inherit', 'inherit', 'ipc'],
  });
  await new Promise<void>((resolve, reject) => {
    proc.once('message', () => resolve());
    proc.once('exit', (code) => reject(new Error(`server exited ${code}`)));
  });
  return { proc, url: `http://127.0.0.1:${port}` };
}

beforeAll(async () => {
  database = await createTestDatabase();
  sink = await startMailSink();
  s3Dir = mkdtempSync(join(tmpdir(), 'farthing-s3-two-'));
  s3 = await startS3Fake({ directory: s3Dir, bucket: 'farthing' });
  env = {
    DATABASE_URL: database.url, SESSION_SECRET: 'shared-secret-of-both-servers', SMTP_PORT: String(sink.smtpPort),
    S3_ENDPOINT: `http://127.0.0.1:${s3.port}`, JOB_POLL_SECONDS: '0.5', PUBLIC_URL: 'http://127.0.0.1:4100',
  };
  servers.push(await startServer(env), await startServer(env));
}, 90_000);

afterAll(async () => {
  for (const s of servers) {
    s.proc.kill('SIGTERM');
    await new Promise((r) => s.proc.once('exit', r));
  }
  await sink.close();
  await s3.close();
  rmSync(s3Dir, { recursive: true, force: true });
  await database.drop();
});

describe('two servers side by side', () => {
  it('a session from one is valid on the other; an upload through one downloads through the other', async () => {
    const [a, b] = servers;
    const signup = await request(a.url).post('/api/auth/signup').set('X-Requested-With', 'farthing')
      .send({ email: 'two@tinbell.example', password: 'two servers pw', name: 'Two', workspaceName: 'Two Co' }).expect(201);
    const cookie = signup.headers['set-cookie'][0].split(';')[0];
    await database.db('workspaces').update({ plan: 'factory', billingStatus: 'active' });
    const me = await request(b.url).get('/api/auth/me').set('Cookie', cookie).expect(200);
    expect(me.body.user.email).toBe('two@tinbell.example');

    const part = await request(a.url).post('/api/parts').set('Cookie', cookie).set('X-Requested-With', 'farthing').send({ internalPn: 'TWO-1', category: 'other' }).expect(201);
    const file = await request(a.url).post(`/api/parts/${part.body.id}/files`).set('Cookie', cookie).set('X-Requested-With', 'farthing').attach('file', tinyPdf, 'sheet.pdf').expect(201);
    const dl = await request(b.url).get(`/api/files/${file.body.id}`).set('Cookie', cookie).buffer(true).parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    }).expect(200);
    expect(Buffer.compare(dl.body as Buffer, tinyPdf)).toBe(0);
  });

  it('a queued e-mail is sent exactly once though both servers run the mail worker', async () => {
    const [a] = servers;
    const cookie = (await request(a.url).post('/api/auth/login').set('X-Requested-With', 'farthing').send({ email: 'two@tinbell.example', password: 'two servers pw' }).expect(200)).headers['set-cookie'][0].split(';')[0];
    for (let i = 0; i < 10; i++) {
      await request(a.url).post('/api/invites').set('Cookie', cookie).set('X-Requested-With', 'farthing').send({ email: `once-${i}@tinbell.example`, role: 'viewer' }).expect(201);
    }
    const until = Date.now() + 15_000;
    while (sink.inbox.filter((m) => m.to[0]?.startsWith('once-')).length < 10 && Date.now() < until) await new Promise((r) => setTimeout(r, 100));
    await new Promise((r) => setTimeout(r, 2000));
    const got = sink.inbox.filter((m) => m.to[0]?.startsWith('once-')).map((m) => m.to[0]).sort();
    expect(got).toEqual(Array.from({ length: 10 }, (_, i) => `once-${i}@tinbell.example`).sort());
  });

  it('a cost roll refreshed by an edit on one server is read fresh on the other', async () => {
    const [a, b] = servers;
    const cookie = (await request(a.url).post('/api/auth/login').set('X-Requested-With', 'farthing').send({ email: 'two@tinbell.example', password: 'two servers pw' }).expect(200)).headers['set-cookie'][0].split(';')[0];
    const send = (url: string) => ({
      post: (p: string, body: object) => request(url).post(p).set('Cookie', cookie).set('X-Requested-With', 'farthing').send(body),
      patch: (p: string, body: object) => request(url).patch(p).set('Cookie', cookie).set('X-Requested-With', 'farthing').send(body),
      get: (p: string) => request(url).get(p).set('Cookie', cookie),
    });
    const supplier = (await send(a.url).post('/api/suppliers', { name: 'Two supplier', country: 'US', currency: 'USD', defaultIncoterm: 'DDP' }).expect(201)).body;
    const part = (await send(a.url).post('/api/parts', { internalPn: 'TWO-R', category: 'resistor', ratings: {} }).expect(201)).body;
    const quote = (await send(a.url).post('/api/quotes', { partId: part.id, supplierId: supplier.id, currency: 'USD', incoterm: 'DDP', priceBreaks: [{ minQty: 1, unitPrice: '0.0100' }] }).expect(201)).body;
    const bom = (await send(a.url).post('/api/boms', { name: 'Two BOM', reportingCurrency: 'USD', plannedQty: 1000 }).expect(201)).body;
    await send(a.url).post(`/api/boms/${bom.id}/lines`, { partId: part.id, qtyPerUnit: '1' }).expect(201);
    const onB = async () => (await send(b.url).get('/api/boms').expect(200)).body.items.find((x: { id: string }) => x.id === bom.id).cost.landedPerUnit;
    // The list never waits for a recompute: the refresh queued by each write lands shortly.
    await expect.poll(onB, { timeout: 10_000 }).toBe('0.0100000000');
    await send(a.url).patch(`/api/quotes/${quote.id}`, { version: quote.version, priceBreaks: [{ minQty: 1, unitPrice: '0.0070' }] }).expect(200);
    await expect.poll(onB, { timeout: 10_000 }).toBe('0.0070000000');
  });

  it('PROCESS_ROLE=web under several processes runs web processes only (the jobs run elsewhere); a client that keeps its connection open is served by both, its connection closed every third request', async () => {
    const port = await freePort();
    const proc = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
      env: { ...process.env, ...env, WEB_CONCURRENCY: '2', PROCESS_ROLE: 'web', PORT: String(port), NODE_ENV: 'test', LOG_LEVEL: 'info', SERVE_CLIENT: 'false', MAX_REQUESTS_PER_CONNECTION: '3', NODE_CLUSTER_SCHED_POLICY: 'rr' },
      stdio: ['ignore', 'pipe', 'pipe', 'ipc'],
    });
    let logged = '';
    proc.stdout!.on('data', (d: Buffer) => (logged += d.toString()));
    try {
      const ready = await new Promise<{ processes: number; jobsProcesses: number }>((resolve, reject) => {
        proc.once('message', (m) => resolve(m as { processes: number; jobsProcesses: number }));
        proc.once('exit', (code) => reject(new Error(`server exited ${code}`)));
      });
      expect(ready).toMatchObject({ processes: 2, jobsProcesses: 0 });
      expect(readFileSync(`/proc/${proc.pid}/task/${proc.pid}/children`, 'utf8').split(' ').filter(Boolean)).toHaveLength(2);
      await request(`http://127.0.0.1:${port}`).get('/api/auth/me').expect(401);
      expect(logged).not.toMatch(/background jobs are running/);

      // Twelve requests in turn over a kept-alive connection: node:cluster gives each new
      // connection to a process, so the four connections reach both web processes.
      // (node:cluster's round-robin, Linux's default, pinned: it gives connections in turn.)
      const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
      const marker = `/api/auth/me?keep-alive-check`;
      const closes: (string | undefined)[] = [];
      try {
        for (let i = 0; i < 12; i++) {
          closes.push(await new Promise((resolve, reject) => {
            http.get({ host: '127.0.0.1', port, path: marker, agent }, (res) => {
              res.resume();
              res.on('end', () => resolve(res.headers.connection));
            }).on('error', reject);
          }));
        }
      } finally {
        agent.destroy();
      }
      expect(closes.filter((c) => c === 'close')).toHaveLength(4);
      const answeredBy = async () => new Set(logged.split('\n').filter((l) => l.includes(marker)).map((l) => (JSON.parse(l) as { pid: number }).pid));
      await expect.poll(async () => (await answeredBy()).size).toBe(2);
    } finally {
      proc.kill('SIGTERM');
      await new Promise((r) => proc.once('exit', r));
    }
  }, 30_000);

  it('one per core: with WEB_CONCURRENCY=2 on a new database it starts cleanly, runs two web processes and a jobs process, replaces one that dies, and stops them all', async () => {
    const port = await freePort();
    // A database no server has started on: every process sets up the job queues at once.
    const fresh = await createTestDatabase();
    const proc = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
      env: { ...process.env, ...env, DATABASE_URL: fresh.url, WEB_CONCURRENCY: '2', PORT: String(port), NODE_ENV: 'test', LOG_LEVEL: 'debug', SERVE_CLIENT: 'false' },
      stdio: ['ignore', 'pipe', 'pipe', 'ipc'],
    });
    let logged = '';
    proc.stdout!.on('data', (d: Buffer) => (logged += d.toString()));
    proc.stderr!.on('data', (d: Buffer) => (logged += d.toString()));
    const url = `http://127.0.0.1:${port}`;
    const children = () => readFileSync(`/proc/${proc.pid}/task/${proc.pid}/children`, 'utf8').split(' ').filter(Boolean).map(Number);
    const jobsPid = () => Number([...logged.matchAll(/"pid":(\d+)[^\n]*background jobs are running/g)].at(-1)?.[1]);
    try {
      const ready = await new Promise<{ processes: number; jobsProcesses: number }>((resolve, reject) => {
        proc.once('message', (m) => resolve(m as { processes: number; jobsProcesses: number }));
        proc.once('exit', (code) => reject(new Error(`server exited ${code}`)));
      });
      expect(ready).toMatchObject({ processes: 2, jobsProcesses: 1 });
      const first = children();
      expect(first).toHaveLength(3);
      // The log lines may reach us a moment after the ready message.
      await expect.poll(() => first.includes(jobsPid()), { timeout: 5_000 }).toBe(true);
      await expect.poll(() => logged.match(/Farthing is listening/g)?.length, { timeout: 5_000 }).toBe(2);
      await request(url).get('/api/auth/me').expect(401);

      // The web processes queue roll-up refreshes; only the jobs process does them, so a
      // fresh figure after an edit shows the jobs process at work, and after its replacement.
      const signup = await request(url).post('/api/auth/signup').set('X-Requested-With', 'farthing')
        .send({ email: 'cluster@tinbell.example', password: 'cluster test pw', name: 'Cluster', workspaceName: 'Cluster Co' }).expect(201);
      const cookie = signup.headers['set-cookie'][0].split(';')[0];
      const call = (method: 'post' | 'patch' | 'get', p: string, body?: object) => request(url)[method](p).set('Cookie', cookie).set('X-Requested-With', 'farthing').send(body);
      const supplier = (await call('post', '/api/suppliers', { name: 'Cluster supplier', country: 'US', currency: 'USD', defaultIncoterm: 'DDP' }).expect(201)).body;
      const part = (await call('post', '/api/parts', { internalPn: 'CL-R', category: 'resistor', ratings: {} }).expect(201)).body;
      let quote = (await call('post', '/api/quotes', { partId: part.id, supplierId: supplier.id, currency: 'USD', incoterm: 'DDP', priceBreaks: [{ minQty: 1, unitPrice: '0.0100' }] }).expect(201)).body;
      const bom = (await call('post', '/api/boms', { name: 'Cluster BOM', reportingCurrency: 'USD', plannedQty: 1000 }).expect(201)).body;
      await call('post', `/api/boms/${bom.id}/lines`, { partId: part.id, qtyPerUnit: '1' }).expect(201);
      const listed = async () => (await call('get', '/api/boms').expect(200)).body.items.find((x: { id: string }) => x.id === bom.id).cost;
      await expect.poll(async () => (await listed()).landedPerUnit, { timeout: 10_000 }).toBe('0.0100000000');
      quote = (await call('patch', `/api/quotes/${quote.id}`, { version: quote.version, priceBreaks: [{ minQty: 1, unitPrice: '0.0070' }] }).expect(200)).body;
      await expect.poll(async () => { const c = await listed(); return c.fresh && c.landedPerUnit; }, { timeout: 10_000 }).toBe('0.0070000000');

      const jobs = jobsPid();
      process.kill(jobs, 'SIGKILL');
      await expect.poll(() => children().filter((pid) => pid !== jobs).length, { timeout: 15_000 }).toBe(3);
      await expect.poll(() => jobsPid() !== jobs, { timeout: 15_000 }).toBe(true);
      for (let i = 0; i < 6; i++) await request(url).get('/api/auth/me').expect(401);
      await call('patch', `/api/quotes/${quote.id}`, { version: quote.version, priceBreaks: [{ minQty: 1, unitPrice: '0.0050' }] }).expect(200);
      await expect.poll(async () => { const c = await listed(); return c.fresh && c.landedPerUnit; }, { timeout: 15_000 }).toBe('0.0050000000');

      // Every refresh was done by a jobs process (the first or its replacement), none by a web
      // process (debug log lines carry the pid of the process that wrote them).
      const pidsOf = (msg: string) => [...logged.matchAll(new RegExp(`"pid":(\\d+)[^\\n]*"msg":"${msg}"`, 'g'))].map((m) => Number(m[1]));
      const refreshers = [...new Set(pidsOf('cost roll-ups refreshed'))];
      const web = pidsOf('Farthing is listening');
      expect(web).toHaveLength(2);
      expect(refreshers.length).toBeGreaterThan(0);
      expect(refreshers.filter((pid) => web.includes(pid))).toEqual([]);
      expect(refreshers.every((pid) => pidsOf('Farthing background jobs are running').includes(pid))).toBe(true);

      // Both queues exist once, and no process logged an error while they were made.
      const queues = await fresh.db.raw(`SELECT name FROM pgboss.queue ORDER BY name`);
      expect(queues.rows.map((q: { name: string }) => q.name)).toEqual(['cost-rollup', 'mail']);
      expect(logged).not.toMatch(/"level":(50|60)|deadlock|unhandled|did not start/);
      expect(logged).toMatch(/jobs process \d+ exited \(SIGKILL\); starting another/);
    } finally {
      const all = children();
      proc.kill('SIGTERM');
      await new Promise((r) => proc.once('exit', r));
      for (const pid of all) expect(existsSync(`/proc/${pid}`) && !readFileSync(`/proc/${pid}/status`, 'utf8').includes('State:\tZ'), `process ${pid}`).toBe(false);
      await fresh.drop();
    }
  }, 60_000);
});
