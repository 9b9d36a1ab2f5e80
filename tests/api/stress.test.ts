import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from '../helpers/app';
import { workspaceWithEveryRole, type RoleWorkspace } from '../helpers/roles';
import { makePart, makeSupplier, makeQuote, makeProfile } from '../helpers/factories';

let t: TestApp;
let ws: RoleWorkspace;
let bomId: string;
let cheapChip: { id: string };
let hvChip: { id: string };
let capLine: { id: string; version: number };
let chipLine: { id: string; version: number };

beforeAll(async () => {
  t = await startTestApp();
  ws = await workspaceWithEveryRole(t, 'Stress Co');
  const o = ws.agents.owner;
  const s = await makeSupplier(o, { currency: 'USD', country: 'US', defaultIncoterm: 'DDP' });
  const profile = await makeProfile(o, { currency: 'USD' });
  // 1206 chip, 0.25 W, LEV 200 V, 22 MΩ [CHIP-TF; C] and an HV chip with LEV 800 V (demo values).
  cheapChip = await makePart(o, { internalPn: 'R-22M-1206', ratings: { resistanceOhm: '22M', powerW: '1/4W', levV: '200V' } });
  hvChip = await makePart(o, { internalPn: 'R-22M-HV', ratings: { resistanceOhm: '22M', powerW: '1/4W', levV: '800V' } });
  const cheapTenK = await makePart(o, { internalPn: 'R-10K-HV', ratings: { resistanceOhm: '10k', powerW: '1/4W', levV: '800V' } });
  const disc = await makePart(o, { internalPn: 'C-1N-2KV', category: 'capacitor', ratings: { capacitanceF: '1n', ratedVoltageV: '2kV', dielectric: 'hv_ceramic' } });
  await makeQuote(o, cheapChip.id, s.id, { currency: 'USD', incoterm: 'DDP', priceBreaks: [{ minQty: 1, unitPrice: '0.0020' }] });
  await makeQuote(o, hvChip.id, s.id, { currency: 'USD', incoterm: 'DDP', priceBreaks: [{ minQty: 1, unitPrice: '0.0090' }] });
  await makeQuote(o, cheapTenK.id, s.id, { currency: 'USD', incoterm: 'DDP', priceBreaks: [{ minQty: 1, unitPrice: '0.0010' }] });
  await makeQuote(o, disc.id, s.id, { currency: 'USD', incoterm: 'DDP', priceBreaks: [{ minQty: 1, unitPrice: '0.0140' }] });
  const d = ws.agents.designer;
  bomId = (await d.post('/api/boms').send({ name: 'Ioniser', reportingCurrency: 'USD', profileId: profile.id, plannedQty: 1000, ambientC: '40' }).expect(201)).body.id;
  // 1.5 kV across the 2 kV disc: 75 % > 70 % Shelf-grade hv_ceramic limit → beyond policy.
  capLine = (await d.post(`/api/boms/${bomId}/lines`).send({ refDes: 'C1', partId: disc.id, qtyPerUnit: '1', operatingPoint: { voltageV: '1.5kV' } }).expect(201)).body;
  // 160 V across a 200 V LEV chip: 80 % = the Shelf-grade resistor voltage limit → passes (close).
  chipLine = (await d.post(`/api/boms/${bomId}/lines`).send({ refDes: 'R1', partId: cheapChip.id, qtyPerUnit: '1', operatingPoint: { voltageV: '160V' } }).expect(201)).body;
});
afterAll(async () => t.close());

describe('the stress check', () => {
  it('answers in the contract shape with statuses, a tally and the caution', async () => {
    const res = await ws.agents.viewer.get(`/api/boms/${bomId}/stress`).expect(200);
    expect(res.body).toHaveProperty('policyId');
    expect(res.body.summary).toEqual({ clear: 0, close: 1, beyondPolicy: 1, overRating: 0, needsData: 0 });
    expect(res.body.caution).toMatch(/High voltage can injure/);
    const cap = res.body.lines.find((l: { lineId: string }) => l.lineId === capLine.id);
    expect(cap.status).toBe('beyond_policy');
    expect(cap.checks[0]).toMatchObject({ check: 'capacitor.voltage', applied: 1500, rated: 2000, ratio: 0.75, limit: 0.7, status: 'beyond_policy' });
    // The BOM list never waits for a recompute: it shows the stored tally, and the refresh
    // queued by the last line added lands shortly.
    const listed = async () => (await ws.agents.viewer.get('/api/boms').expect(200)).body.items.find((b: { id: string }) => b.id === bomId);
    await expect.poll(async () => (await listed()).cost.fresh, { timeout: 10_000 }).toBe(true);
    expect((await listed()).stress).toEqual({ clear: 0, close: 1, beyondPolicy: 1, overRating: 0, needsData: 0 });
  });

  it('the check stored with the roll-up answers as the live one, with waivers read at request time', async () => {
    const d = ws.agents.designer;
    const disc = (await d.get(`/api/boms/${bomId}/lines`)).body.items.find((l: { id: string }) => l.id === capLine.id);
    const id = (await d.post('/api/boms').send({ name: 'Ioniser stored check', reportingCurrency: 'USD', plannedQty: 1000, ambientC: '40' }).expect(201)).body.id;
    const line = (await d.post(`/api/boms/${id}/lines`).send({ refDes: 'C9', partId: disc.partId, qtyPerUnit: '1', operatingPoint: { voltageV: '1.5kV' } }).expect(201)).body;
    const db = t.database.db;
    // Live: no roll-up stored.
    await db('cost_rollups').where({ bomId: id }).delete();
    const live = (await ws.agents.viewer.get(`/api/boms/${id}/stress`).expect(200)).body;
    // Stored: the cost roll at the planned quantity stores the roll-up with the check.
    await ws.agents.viewer.get(`/api/boms/${id}/cost`).expect(200);
    const row = await db('cost_rollups').where({ bomId: id }).first(db.raw(`stress -> 'check' -> 'summary' AS summary`));
    expect(row.summary).toEqual(live.summary);
    const stored = await ws.agents.viewer.get(`/api/boms/${id}/stress`).set('Accept-Encoding', 'gzip, deflate, br').expect(200);
    expect(stored.headers['content-type']).toMatch(/application\/json/);
    // To a browser (it accepts brotli and gzip) the stored check goes as it was compressed when stored.
    expect(stored.headers['content-encoding']).toBe('br');
    expect(stored.body).toEqual(live);
    const plain = await ws.agents.viewer.get(`/api/boms/${id}/stress`).set('Accept-Encoding', 'identity').expect(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.body).toEqual(live);
    expect(stored.body.lines[0]).toMatchObject({ lineId: line.id, internalPn: 'C-1N-2KV', status: 'beyond_policy', waiver: null });
    // A waiver is not a costing input: the roll-up stays fresh and the waiver shows on it.
    await d.post(`/api/boms/${id}/lines/${line.id}/waivers`).send({ reason: 'Potted module; approved after the humidity test.' }).expect(201);
    const waived = (await ws.agents.viewer.get(`/api/boms/${id}/stress`).set('Accept-Encoding', 'gzip').expect(200)).body;
    expect(waived.lines[0].waiver).toMatchObject({ reason: 'Potted module; approved after the humidity test.', waivedBy: expect.any(String) });
    expect((await db('cost_rollups').where({ bomId: id }).first(db.raw(`stress -> 'check' -> 'summary' AS summary`))).summary).toEqual(live.summary);
  });

  it('readers of the stress check with no roll-up stored get the check and the roll-up is stored; without a policy the answer is a clear 409', async () => {
    const d = ws.agents.designer;
    const db = t.database.db;
    const id = (await d.post('/api/boms').send({ name: 'Ioniser cold start', reportingCurrency: 'USD', plannedQty: 1000, ambientC: '25' }).expect(201)).body.id;
    await d.post(`/api/boms/${id}/lines`).send({ refDes: 'R1', partId: hvChip.id, qtyPerUnit: '1', operatingPoint: { voltageV: '100V' } }).expect(201);
    await db('cost_rollups').where({ bomId: id }).delete();
    // Five readers at once with nothing stored: all get the check, and the roll-up is stored.
    const answers = await Promise.all(Array.from({ length: 5 }, () => ws.agents.viewer.get(`/api/boms/${id}/stress`).expect(200)));
    for (const a of answers) expect(a.body.lines[0]).toMatchObject({ refDes: 'R1', status: 'clear' });
    const stored = await db('cost_rollups').where({ bomId: id }).first('computedAt', db.raw(`stress_tally AS tally`));
    expect(stored.tally).toEqual(answers[0].body.summary);
    // In a workspace without any stress policy: 409 saying so, and its fresh roll-up is not computed again.
    const bare = await workspaceWithEveryRole(t, 'No policy Co');
    await db('workspaces').where({ id: bare.workspaceId }).update({ defaultStressPolicyId: null });
    await db('stress_policies').where({ workspaceId: bare.workspaceId }).delete();
    const plain = (await bare.agents.designer.post('/api/boms').send({ name: 'Night light', reportingCurrency: 'USD', plannedQty: 1000 }).expect(201)).body.id;
    await bare.agents.viewer.get(`/api/boms/${plain}/cost`).expect(200);
    const noPolicy = await db('cost_rollups').where({ bomId: plain }).first('computedAt', db.raw(`stress -> 'check' AS "check"`));
    expect(noPolicy.check).toBeNull();
    const refused = await bare.agents.viewer.get(`/api/boms/${plain}/stress`).expect(409);
    expect(refused.body.error.message).toMatch(/no stress policy/);
    await bare.agents.viewer.get(`/api/boms/${plain}/stress`).expect(409);
    expect((await db('cost_rollups').where({ bomId: plain }).first('computedAt')).computedAt).toEqual(noPolicy.computedAt);
  });

  it('blocks release over the absolute rating; beyond policy needs a written waiver, kept in the audit log', async () => {
    const d = ws.agents.designer;
    const chip = (await d.get(`/api/boms/${bomId}/lines`)).body.items.find((l: { id: string }) => l.id === chipLine.id);
    // 250 V on the 200 V chip: over its rating.
    const hot = await d.patch(`/api/boms/${bomId}/lines/${chip.id}`).send({ operatingPoint: { voltageV: '250V' }, version: chip.version }).expect(200);
    // The BOM list's tally is stored with the roll-up; an operating point is a stress input,
    // so the stored tally follows it (refreshed behind the edit).
    await expect.poll(async () => (await ws.agents.viewer.get('/api/boms').expect(200)).body.items.find((b: { id: string }) => b.id === bomId), { timeout: 10_000 })
      .toMatchObject({ stress: { clear: 0, close: 0, beyondPolicy: 1, overRating: 1, needsData: 0 }, cost: { fresh: true } });
    await d.post(`/api/boms/${bomId}/state`).send({ state: 'in_review' }).expect(200);
    const blocked = await ws.agents.owner.post(`/api/boms/${bomId}/state`).send({ state: 'released' }).expect(409);
    expect(blocked.body.error.message).toMatch(/absolute rating/);
    await d.post(`/api/boms/${bomId}/lines/${chip.id}/waivers`).send({ reason: 'We accept this risk for the demo.' }).expect(409);

    await d.post(`/api/boms/${bomId}/state`).send({ state: 'draft' }).expect(200);
    await d.patch(`/api/boms/${bomId}/lines/${chip.id}`).send({ operatingPoint: { voltageV: '150V' }, version: hot.body.version }).expect(200);
    await d.post(`/api/boms/${bomId}/state`).send({ state: 'in_review' }).expect(200);
    const needsWaiver = await ws.agents.owner.post(`/api/boms/${bomId}/state`).send({ state: 'released' }).expect(409);
    expect(needsWaiver.body.error.message).toMatch(/waiver/);
    await d.post(`/api/boms/${bomId}/lines/${capLine.id}/waivers`).send({ reason: 'short' }).expect(400);
    await ws.agents.buyer.post(`/api/boms/${bomId}/lines/${capLine.id}/waivers`).send({ reason: 'Buyers may not waive stress.' }).expect(403);
    // A waiver lapses when the line changes: write one, change the operating point, and release is blocked again.
    await d.post(`/api/boms/${bomId}/lines/${capLine.id}/waivers`).send({ reason: 'First waiver, before the voltage was revised.' }).expect(201);
    await d.post(`/api/boms/${bomId}/state`).send({ state: 'draft' }).expect(200);
    const cap = (await d.get(`/api/boms/${bomId}/lines`)).body.items.find((l: { id: string }) => l.id === capLine.id);
    await new Promise((r) => setTimeout(r, 20));
    await d.patch(`/api/boms/${bomId}/lines/${capLine.id}`).send({ operatingPoint: { voltageV: '1.45kV' }, version: cap.version }).expect(200);
    await d.post(`/api/boms/${bomId}/state`).send({ state: 'in_review' }).expect(200);
    await ws.agents.owner.post(`/api/boms/${bomId}/state`).send({ state: 'released' }).expect(409);
    const lapsed = (await d.get(`/api/boms/${bomId}/stress`)).body.lines.find((l: { lineId: string }) => l.lineId === capLine.id);
    expect(lapsed.waiver).toBeNull();
    await d.post(`/api/boms/${bomId}/lines/${capLine.id}/waivers`).send({ reason: 'Disc run at 72 % in a potted module; approved after the humidity test.' }).expect(201);
    const released = await ws.agents.owner.post(`/api/boms/${bomId}/state`).send({ state: 'released' }).expect(200);
    expect(released.body.state).toBe('released');
    const log = await ws.agents.owner.get('/api/audit').expect(200);
    expect(log.body.items.find((e: { action: string }) => e.action === 'waive')).toMatchObject({ entity: 'line', entityId: capLine.id });
  });

  it('the cheapest part that passes, and the swap that makes the next revision of a released BOM', async () => {
    const d = ws.agents.designer;
    const lines = (await d.get(`/api/boms/${bomId}/lines`)).body.items;
    const chip = lines.find((l: { refDes: string }) => l.refDes === 'R1');
    // Drive the chip beyond policy in a new revision: 190 V is 95 % of its 200 V LEV.
    const rev = (await d.post(`/api/boms/${bomId}/revisions`).expect(201)).body;
    const revChip = (await d.get(`/api/boms/${rev.id}/lines`)).body.items.find((l: { refDes: string }) => l.refDes === 'R1');
    const hot = await d.patch(`/api/boms/${rev.id}/lines/${revChip.id}`).send({ operatingPoint: { voltageV: '190V' }, version: revChip.version }).expect(200);
    const alt = await d.get(`/api/boms/${rev.id}/lines/${revChip.id}/alternatives`).expect(200);
    expect(alt.body.currentStatus).toBe('beyond_policy');
    expect(alt.body.candidates[0]).toMatchObject({ id: hvChip.id, status: 'clear' });
    // Only parts of the same value are offered: a 10 kΩ chip that passes is not a 22 MΩ bleeder.
    expect(alt.body.candidates.every((c: { internalPn: string }) => c.internalPn.includes('22M'))).toBe(true);
    // And a swap keeps the category.
    const disc = (await d.get(`/api/boms/${rev.id}/lines`)).body.items.find((l: { refDes: string }) => l.refDes === 'C1');
    await d.post(`/api/boms/${rev.id}/lines/${revChip.id}/swap`).send({ partId: disc.partId, version: hot.body.version }).expect(400);
    // The HV chip costs 0.0070 more per piece, one per unit.
    expect(Number(alt.body.candidates[0].costDifference)).toBeCloseTo(0.007, 9);
    const swapped = await d.post(`/api/boms/${rev.id}/lines/${revChip.id}/swap`).send({ partId: hvChip.id, version: hot.body.version }).expect(200);
    expect(swapped.body.newRevision).toBe(false);
    const after = await d.get(`/api/boms/${rev.id}/stress`).expect(200);
    expect(after.body.lines.find((l: { refDes: string }) => l.refDes === 'R1').status).toBe('clear');

    // On the released revision the swap makes the next revision instead.
    const onReleased = await d.post(`/api/boms/${bomId}/lines/${chip.id}/swap`).send({ partId: hvChip.id, version: chip.version }).expect(200);
    expect(onReleased.body.newRevision).toBe(true);
    expect(onReleased.body.revision).toBe(3);
  });
});

describe('stress policies', () => {
  it('three seeded policies with sources; designers copy and edit; bad limits are refused', async () => {
    const list = await ws.agents.viewer.get('/api/stress-policies').expect(200);
    expect(list.body.items.map((p: { name: string }) => p.name)).toEqual(['Shelf-grade', 'Careful', 'Hi-rel']);
    const shelf = list.body.items[0];
    expect(shelf.isDefault).toBe(true);
    expect(shelf.limits.capacitor.hv_ceramic).toMatchObject({ value: 0.7 });
    expect(shelf.limits.capacitor.hv_ceramic.source).toBeTruthy();
    const copy = await ws.agents.designer.post('/api/stress-policies').send({ name: 'Shelf-grade, humid', limits: { ...shelf.limits, capacitor: { ...shelf.limits.capacitor, hv_ceramic: { value: 0.6, source: 'our humidity tests' } } } }).expect(201);
    await ws.agents.designer.patch(`/api/stress-policies/${copy.body.id}`).send({ version: copy.body.version, limits: { ...shelf.limits, led: { current: { value: 1.4 } } } }).expect(400);
    await ws.agents.buyer.post('/api/stress-policies').send({ name: 'x', limits: shelf.limits }).expect(403);
  });

  it('a new workspace default re-checks the BOMs that use it, and the stored tally on the BOM list follows', async () => {
    const listed = async () => (await ws.agents.viewer.get('/api/boms').expect(200)).body.items.find((b: { id: string }) => b.id === bomId);
    const live = async () => (await ws.agents.viewer.get(`/api/boms/${bomId}/stress`).expect(200)).body.summary;
    const policies = (await ws.agents.viewer.get('/api/stress-policies').expect(200)).body.items as { id: string; name: string; limits: Record<string, Record<string, unknown>> }[];
    const byName = (n: string) => policies.find((p) => p.name === n)!;
    const shelf = byName('Shelf-grade');
    // The chip runs at 75 % of its LEV: inside Shelf-grade's 80 %, beyond a 50 % limit.
    const strict = await ws.agents.designer.post('/api/stress-policies')
      .send({ name: 'Resistors at half', limits: { ...shelf.limits, resistor: { ...shelf.limits.resistor, voltage: { value: 0.5, source: 'test policy' } } } }).expect(201);
    const before = await live();
    await expect.poll(listed, { timeout: 10_000 }).toMatchObject({ stress: before, cost: { fresh: true } });
    await ws.agents.owner.post(`/api/stress-policies/${strict.body.id}/default`).expect(200);
    const after = await live();
    expect(after).not.toEqual(before);
    await expect.poll(listed, { timeout: 10_000 }).toMatchObject({ stress: after, cost: { fresh: true } });
    await ws.agents.owner.post(`/api/stress-policies/${shelf.id}/default`).expect(200);
  });
});

describe('circuit helpers over HTTP', () => {
  it('multiplier: n = 3, Vpk = 2 kV, 1 mA, 50 kHz, 1 nF → 12 kV no-load, 120 V ripple, 440 V drop [CW; C]', async () => {
    const res = await ws.agents.viewer.post('/api/tools/multiplier').send({ stages: 3, vPeakV: 2000, loadCurrentA: 0.001, frequencyHz: 50000, capacitanceF: 1e-9 }).expect(200);
    expect(res.body.noLoadV).toBeCloseTo(12000, 6);
    expect(res.body.ripplePeakToPeakV).toBeCloseTo(120, 6);
    expect(res.body.dropV).toBeCloseTo(440, 6);
    expect(res.body.loadedV).toBeCloseTo(11560, 6);
    expect(res.body.formula).toBeTruthy();
    expect(res.body.caution).toMatch(/High voltage/);
  });
  it('bad input is a 400 naming the field', async () => {
    const zero = await ws.agents.viewer.post('/api/tools/discharge').send({ capacitanceF: 0, resistanceOhm: 1e7, v0V: 2000, safeV: 60 }).expect(400);
    expect(zero.body.error.details[0].path).toBe('capacitanceF');
    const above = await ws.agents.viewer.post('/api/tools/discharge').send({ capacitanceF: 1e-6, resistanceOhm: 1e7, v0V: 50, safeV: 60 }).expect(400);
    expect(JSON.stringify(above.body.error.details)).toMatch(/safeV/);
    await ws.agents.viewer.post('/api/tools/accessible-part').send({ capacitanceF: -1, voltageV: 1000 }).expect(400);
  });
  it('resistor string: 2 kV over 22 MΩ 1206 chips (LEV 200 V, ±5 %) needs 14 at 80 % [P]', async () => {
    const res = await ws.agents.viewer.post('/api/tools/resistor-string').send({ totalV: 2000, resistanceOhm: 22e6, powerW: 0.25, levV: 200, tolerancePct: 5, limit: 0.8 }).expect(200);
    expect(res.body.count).toBe(14);
    expect(res.body.worstEachV).toBeCloseTo(156.7, 1);
  });
});
