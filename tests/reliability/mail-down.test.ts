import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, signUp, waitForMail, type TestApp } from '../helpers/app';
import { startMailSink } from '../../server/mail/sink';
import { makePart, makeSupplier } from '../helpers/factories';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => t.close());

describe('mail while the mail server is down', () => {
  it('is queued in PostgreSQL and delivered, once, after the server is back', async () => {
    const buyer = await signUp(t);
    const part = await makePart(buyer.agent);
    const supplier = await makeSupplier(buyer.agent, { contactEmails: ['down@supplier.example'] });
    const port = t.sink.smtpPort;
    await t.sink.close();
    await buyer.agent.post('/api/rfqs').send({ title: 'Queued while down', partIds: [part.id], supplierIds: [supplier.id], quantities: [1000], replyBy: new Date(Date.now() + 7 * 86400_000).toISOString().slice(0, 10) }).expect(201);
    await buyer.agent.post('/api/invites').send({ email: 'later@tinbell.example', role: 'viewer' }).expect(201);
    // The worker tries, fails against the closed port, and keeps the jobs for a retry.
    await new Promise((r) => setTimeout(r, 2000));
    const jobs = await t.database.db.raw(`SELECT count(*)::int AS n FROM pgboss.job WHERE name = 'mail' AND state IN ('created','retry','active')`);
    expect(jobs.rows[0].n).toBeGreaterThanOrEqual(2);
    t.sink = await startMailSink({ smtpPort: port });
    await waitForMail(t.sink, 'down@supplier.example', 60_000, 'Queued while down');
    await waitForMail(t.sink, 'later@tinbell.example', 60_000);
    await new Promise((r) => setTimeout(r, 1500));
    expect(t.sink.inbox.filter((m) => m.subject.includes('Queued while down'))).toHaveLength(1);
  }, 90_000);
});
