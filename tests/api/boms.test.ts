import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, signUp, type TestApp } from '../helpers/app';
import { snapshot } from '../helpers/db';
import { workspaceWithEveryRole, type RoleWorkspace } from '../helpers/roles';
import { makePart, makeSupplier, makeQuote, makeProfile } from '../helpers/factories';

let t: TestApp;
let ws: RoleWorkspace;
let partA: { id: string };
let partB: { id: string };
let quoteA: { id: string; version: number };
let profile: { id: string };

beforeAll(async () => {
  t = await startTestApp();
  ws = await workspaceWithEveryRole(t, 'BOM Co');
  const owner = ws.agents.owner;
  const s = await makeSupplier(owner, { currency: 'USD', country: 'US', defaultIncoterm: 'DDP' });
  partA = await makePart(owner, { internalPn: 'A-10K', mpn: 'MPN-A' });
  partB = await makePart(owner, { internalPn: 'B-CAP', mpn: 'MPN-B', category: 'capacitor', ratings: {} });
  // All-units tiers of the reference's worked example [QTY-DISC]: 1+ 0.0100 … 10,000+ 0.0008.
  quoteA = await makeQuote(owner, partA.id, s.id, { currency: 'USD', incoterm: 'DDP', priceBreaks: [
    { minQty: 1, unitPrice: '0.0100' }, { minQty: 100, unitPrice: '0.0050' }, { minQty: 1000, unitPrice: '0.0020' }, { minQty: 5000, unitPrice: '0.0012' }, { minQty: 10000, unitPrice: '0.0008' },
  ] });
  await makeQuote(owner, partB.id, s.id, { currency: 'USD', incoterm: 'DDP', priceBreaks: [{ minQty: 1, unitPrice: '0.0150' }] });
  profile = await makeProfile(owner, { currency: 'USD' });
});
afterAll(async () => t.close());

async function newBom(over: Record<string, unknown> = {}) {
  const res = await ws.agents.designer.post('/api/boms').send({ name: `Torch ${Date.now()}`, reportingCurrency: 'USD', profileId: profile.id, plannedQty: 1000, ...over }).expect(201);
  return res.body as { id: string; version: number; revision: number };
}

describe('BOMs, lines and the cost roll', () => {
  it('a designer builds a BOM; the cost roll answers in the contract shape', async () => {
    const bom = await newBom({ targetUnitCost: '0.05' });
    const d = ws.agents.designer;
    await d.post(`/api/boms/${bom.id}/lines`).send({ refDes: 'R1-R4', partId: partA.id, qtyPerUnit: '4' }).expect(201);
    await d.post(`/api/boms/${bom.id}/lines`).send({ refDes: 'C1', partId: partB.id, qtyPerUnit: 1 }).expect(201);
    await d.post(`/api/boms/${bom.id}/lines`).send({ kind: 'tooling', note: 'Housing mould', oneTimeCost: '300', currency: 'USD', qtyPerUnit: '1' }).expect(201);
    const uses = await ws.agents.viewer.get(`/api/parts/${partA.id}/boms`).expect(200);
    expect(uses.body.items.find((u: { id: string }) => u.id === bom.id)).toMatchObject({ refDes: 'R1-R4', qtyPerUnit: '4' });
    const cost = await d.get(`/api/boms/${bom.id}/cost`).query({ qty: 1000 }).expect(200);
    expect(Object.keys(cost.body)).toEqual(expect.arrayContaining(['qty', 'date', 'currency', 'lines', 'totals', 'byCategory', 'bySupplier', 'warnings', 'leftOut']));
    for (const key of ['lineId', 'refDes', 'partId', 'quoteId', 'supplierId', 'requiredQty', 'orderQty', 'unitPrice', 'unitPriceCurrency', 'goodsValue', 'excessValue', 'origin', 'freight', 'insurance', 'duty', 'fees', 'destination', 'assembly', 'landed', 'landedPerUnit', 'warnings']) {
      expect(cost.body.lines[0], key).toHaveProperty(key);
    }
    for (const key of ['goods', 'excessValue', 'origin', 'freight', 'insurance', 'duty', 'fees', 'destination', 'assembly', 'costLinesPerUnit', 'oneTimePerUnit', 'landedTotal', 'landedPerUnit', 'targetUnitCost', 'gapToTarget']) {
      expect(cost.body.totals, key).toHaveProperty(key);
    }
    const r = cost.body.lines.find((l: { refDes: string }) => l.refDes === 'R1-R4');
    // 4,000 needed at 0.0020 = 8.00 against 5,000 at 0.0012 = 6.00: buying up to the break wins [QTY-DISC].
    expect(r).toMatchObject({ requiredQty: 4000, orderQty: 5000, goodsValue: '6.000000' });
    // 6.00 + 15.00 + 300 one-time, over 1,000 units (DDP: no adders) = 0.321 per unit.
    expect(Number(cost.body.totals.landedPerUnit)).toBeCloseTo(0.321, 9);
    expect(Number(cost.body.totals.gapToTarget)).toBeCloseTo(0.271, 9);

    const curve = await d.get(`/api/boms/${bom.id}/cost/curve`).query({ qty: '1000,5000,10000' }).expect(200);
    expect(curve.body.points.map((p: { qty: number }) => p.qty)).toEqual([1000, 5000, 10000]);
    const perUnit = curve.body.points.map((p: { totals: { landedPerUnit: string } }) => Number(p.totals.landedPerUnit));
    expect(perUnit[2]).toBeLessThan(perUnit[0]);
  });

  it('the BOM list finds BOMs by name, with each one\'s line count; % and _ are plain characters', async () => {
    const tag = `Q${Date.now()}`;
    const a = await newBom({ name: `${tag} torch 100% brass` });
    await newBom({ name: `${tag} torch 1000 brass` });
    await ws.agents.designer.post(`/api/boms/${a.id}/lines`).send({ refDes: 'R1', partId: partA.id, qtyPerUnit: '1' }).expect(201);
    const byName = async (q: string) => (await ws.agents.viewer.get('/api/boms').query({ q }).expect(200)).body.items as { id: string; name: string; lineCount: number }[];
    expect((await byName(`${tag} TORCH`)).map((b) => b.name).sort()).toEqual([`${tag} torch 1000 brass`, `${tag} torch 100% brass`].sort());
    const percent = await byName(`${tag} torch 100%`);
    expect(percent.map((b) => b.name)).toEqual([`${tag} torch 100% brass`]);
    expect(percent[0].lineCount).toBe(1);
    expect(await byName(`${tag}_torch`)).toEqual([]);
  });

  it('lines left out are counted and named, never costed at zero silently', async () => {
    const bom = await newBom();
    const orphan = await makePart(ws.agents.owner, { internalPn: `NOQ-${Date.now()}` });
    await ws.agents.designer.post(`/api/boms/${bom.id}/lines`).send({ refDes: 'R9', partId: orphan.id, qtyPerUnit: '1' }).expect(201);
    const cost = await ws.agents.viewer.get(`/api/boms/${bom.id}/cost`).expect(200);
    expect(cost.body.leftOut.count).toBe(1);
    expect(cost.body.leftOut.lines[0].reason).toBe('no_quote');
    // The running panel's read: the same totals and counts without the lines, at the
    // planned quantity (stored roll-up or totals-only roll) and at another quantity.
    for (const qty of [undefined, 777]) {
      const full = await ws.agents.viewer.get(`/api/boms/${bom.id}/cost`).query(qty ? { qty } : {}).expect(200);
      const totals = await ws.agents.viewer.get(`/api/boms/${bom.id}/cost`).query({ ...(qty ? { qty } : {}), view: 'totals' }).expect(200);
      expect(totals.body.lines).toEqual([]);
      expect(totals.body.totals).toEqual(full.body.totals);
      expect(totals.body.leftOut).toEqual(full.body.leftOut);
      expect(totals.body.lineWarningCount).toBe(full.body.lines.reduce((n: number, l: { warnings: unknown[] }) => n + l.warnings.length, 0));
      expect(totals.body.lineWarningCount).toBeGreaterThan(0);
    }
  });

  it('the cost roll reads each quote as saved: validity dates, lead time, MOQ and order multiple', async () => {
    const owner = ws.agents.owner;
    const s = await makeSupplier(owner, { currency: 'USD', country: 'US', defaultIncoterm: 'DDP' });
    const part = await makePart(owner, { internalPn: `TERMS-${Date.now()}` });
    const terms = { currency: 'USD', incoterm: 'DDP' };
    // The two cheapest are out of date: one expired, one not valid yet.
    await makeQuote(owner, part.id, s.id, { ...terms, validUntil: '2020-01-31', priceBreaks: [{ minQty: 1, unitPrice: '0.0001' }] });
    await makeQuote(owner, part.id, s.id, { ...terms, validFrom: '2099-01-01', priceBreaks: [{ minQty: 1, unitPrice: '0.0002' }] });
    // No lead time given; MOQ 2,500 in multiples of 500.
    const reel = await makeQuote(owner, part.id, s.id, { ...terms, leadTimeDays: null, moq: 2500, orderMultiple: 500, priceBreaks: [{ minQty: 1, unitPrice: '0.001000' }] });
    const quick = await makeQuote(owner, part.id, s.id, { ...terms, leadTimeDays: 10, priceBreaks: [{ minQty: 1, unitPrice: '0.004000' }] });
    const lineOf = async (profileId: string) => {
      const bom = await newBom({ profileId });
      await ws.agents.designer.post(`/api/boms/${bom.id}/lines`).send({ refDes: 'R1', partId: part.id, qtyPerUnit: '1' }).expect(201);
      return (await ws.agents.viewer.get(`/api/boms/${bom.id}/cost`).expect(200)).body.lines[0];
    };
    // Order quantity, excess and the cheapest whole order as costing.md sets them (demo prices):
    // 1,000 needed: the reel's 2,500 at 0.001 (2.50, 1.50 of it excess) beats 1,000 at 0.004 (4.00).
    expect(await lineOf(profile.id)).toMatchObject({ quoteId: reel.id, requiredQty: 1000, orderQty: 2500, goodsValue: '2.500000', excessValue: '1.500000' });
    // With a lead-time limit a quote without a lead time cannot pass it (costing.md).
    const limited = await makeProfile(owner, { maxLeadTimeDays: 30 });
    expect(await lineOf(limited.id)).toMatchObject({ quoteId: quick.id, orderQty: 1000, goodsValue: '4.000000' });
  });

  it('the lines list pages in position order (ties by id); the pages together are the whole list, once each', async () => {
    const bom = await newBom();
    // Positions with ties and gaps: 0, 5, 5, 5, 9, 12, 12.
    const positions = [5, 0, 12, 5, 9, 5, 12];
    await ws.agents.designer.post(`/api/boms/${bom.id}/lines/bulk`).send({ create: positions.map((position, i) => ({ position, refDes: `R${i + 1}`, partId: partA.id, qtyPerUnit: '1' })) }).expect(200);
    const whole = (await ws.agents.viewer.get(`/api/boms/${bom.id}/lines`).expect(200)).body;
    expect(whole.nextCursor).toBeNull();
    expect(whole.items.map((l: { position: number }) => l.position)).toEqual([0, 5, 5, 5, 9, 12, 12]);
    const pages: { items: { id: string }[]; nextCursor: string | null }[] = [];
    let cursor: string | undefined;
    do {
      const page = (await ws.agents.viewer.get(`/api/boms/${bom.id}/lines`).query({ limit: 3, ...(cursor ? { cursor } : {}) }).expect(200)).body;
      pages.push(page);
      cursor = page.nextCursor ?? undefined;
    } while (cursor);
    expect(pages.map((p) => p.items.length)).toEqual([3, 3, 1]);
    expect(pages.flatMap((p) => p.items)).toEqual(whole.items);
    // Lines moved, added or removed between two pages: 409, and a read from the start is consistent.
    const first = (await ws.agents.viewer.get(`/api/boms/${bom.id}/lines`).query({ limit: 3 }).expect(200)).body;
    const moved = whole.items[6];
    await ws.agents.designer.patch(`/api/boms/${bom.id}/lines/${moved.id}`).send({ version: moved.version, position: 1 }).expect(200);
    const changed = await ws.agents.viewer.get(`/api/boms/${bom.id}/lines`).query({ limit: 3, cursor: first.nextCursor }).expect(409);
    expect(changed.body.error.message).toMatch(/read them again from the first page/);
    await ws.agents.designer.delete(`/api/boms/${bom.id}/lines/${whole.items[0].id}`).expect(204);
    // Six lines left: five on the first page; the sixth, deleted, leaves the second page empty.
    const five = (await ws.agents.viewer.get(`/api/boms/${bom.id}/lines`).query({ limit: 5 }).expect(200)).body;
    const all = (await ws.agents.viewer.get(`/api/boms/${bom.id}/lines`).expect(200)).body.items;
    expect(all).toHaveLength(6);
    await ws.agents.designer.delete(`/api/boms/${bom.id}/lines/${all[5].id}`).expect(204);
    await ws.agents.viewer.get(`/api/boms/${bom.id}/lines`).query({ limit: 5, cursor: five.nextCursor }).expect(409);
    // A cursor is the API's own: anything else is a 400 that names the field.
    const bad = await ws.agents.viewer.get(`/api/boms/${bom.id}/lines`).query({ cursor: "5' OR 1=1" }).expect(400);
    expect(bad.body.error.details[0].path).toBe('cursor');
    await ws.agents.viewer.get(`/api/boms/${bom.id}/lines`).query({ limit: 0 }).expect(400);
  });

  it('bulk edits apply in one transaction: one stale version and nothing changes', async () => {
    const bom = await newBom();
    const d = ws.agents.designer;
    const a = (await d.post(`/api/boms/${bom.id}/lines`).send({ partId: partA.id, qtyPerUnit: '1', refDes: 'R1' }).expect(201)).body;
    const b = (await d.post(`/api/boms/${bom.id}/lines`).send({ partId: partB.id, qtyPerUnit: '1', refDes: 'C1' }).expect(201)).body;
    const before = await snapshot(t.database.db);
    await d.post(`/api/boms/${bom.id}/lines/bulk`).send({
      create: [{ partId: partA.id, qtyPerUnit: '2', refDes: 'R2 R3' }],
      update: [{ id: a.id, version: a.version, qtyPerUnit: '3' }, { id: b.id, version: b.version + 5, qtyPerUnit: '9' }],
    }).expect(409);
    expect(await snapshot(t.database.db)).toEqual(before);
    const ok = await d.post(`/api/boms/${bom.id}/lines/bulk`).send({
      create: [{ partId: partA.id, qtyPerUnit: '2', refDes: 'R2 R3' }],
      update: [{ id: a.id, version: a.version, qtyPerUnit: '3' }],
      delete: [{ id: b.id, version: b.version }],
    }).expect(200);
    expect(ok.body.created).toHaveLength(1);
    expect((await d.get(`/api/boms/${bom.id}/lines`)).body.items).toHaveLength(2);
  });

  it('a line from another workspace, or a quote for another part, cannot be pinned or used', async () => {
    const bom = await newBom();
    const other = await signUp(t);
    const foreign = await makePart(other.agent);
    await ws.agents.designer.post(`/api/boms/${bom.id}/lines`).send({ partId: foreign.id, qtyPerUnit: '1' }).expect(400);
    const line = (await ws.agents.designer.post(`/api/boms/${bom.id}/lines`).send({ partId: partB.id, qtyPerUnit: '1' }).expect(201)).body;
    await ws.agents.buyer.patch(`/api/boms/${bom.id}/lines/${line.id}`).send({ pinnedQuoteId: quoteA.id, version: line.version }).expect(400);
    await ws.agents.designer.patch(`/api/boms/${bom.id}/lines/${line.id}`).send({ partId: foreign.id, version: line.version }).expect(400);
    // A line pinned to part A's quote: its quantity may change, its part may not move to B
    // while the pin stays (the pin is checked against the part the line would have).
    const pinnedLine = (await ws.agents.designer.post(`/api/boms/${bom.id}/lines`).send({ partId: partA.id, qtyPerUnit: '1', pinnedQuoteId: quoteA.id }).expect(201)).body;
    const moreOf = (await ws.agents.designer.patch(`/api/boms/${bom.id}/lines/${pinnedLine.id}`).send({ qtyPerUnit: '2', version: pinnedLine.version }).expect(200)).body;
    const res = await ws.agents.designer.patch(`/api/boms/${bom.id}/lines/${pinnedLine.id}`).send({ partId: partB.id, version: moreOf.version }).expect(400);
    expect(res.body.error.details[0].path).toBe('pinnedQuoteId');
  });

  it('a buyer may pin a quote on a line but not change its quantity', async () => {
    const bom = await newBom();
    const line = (await ws.agents.designer.post(`/api/boms/${bom.id}/lines`).send({ partId: partA.id, qtyPerUnit: '1' }).expect(201)).body;
    await ws.agents.buyer.patch(`/api/boms/${bom.id}/lines/${line.id}`).send({ qtyPerUnit: '2', version: line.version }).expect(403);
    const pinned = await ws.agents.buyer.patch(`/api/boms/${bom.id}/lines/${line.id}`).send({ pinnedQuoteId: quoteA.id, version: line.version }).expect(200);
    expect(pinned.body.pinnedQuoteId).toBe(quoteA.id);
    await ws.agents.viewer.patch(`/api/boms/${bom.id}/lines/${line.id}`).send({ pinnedQuoteId: null, version: pinned.body.version }).expect(403);
  });
});

describe('states and revisions', () => {
  it('Draft → In review → Released by an owner only; released is read-only; a new revision copies the lines', async () => {
    const bom = await newBom();
    const d = ws.agents.designer;
    await d.post(`/api/boms/${bom.id}/lines`).send({ partId: partA.id, qtyPerUnit: '2', refDes: 'R1 R2' }).expect(201);
    await d.post(`/api/boms/${bom.id}/state`).send({ state: 'released' }).expect(409);
    await d.post(`/api/boms/${bom.id}/state`).send({ state: 'in_review' }).expect(200);
    const denied = await d.post(`/api/boms/${bom.id}/state`).send({ state: 'released' }).expect(403);
    expect(denied.body.error.message).toMatch(/owner/);
    const released = await ws.agents.owner.post(`/api/boms/${bom.id}/state`).send({ state: 'released' }).expect(200);
    expect(released.body.state).toBe('released');
    expect(released.body.releasedAt).not.toBeNull();

    const blocked = await d.post(`/api/boms/${bom.id}/lines`).send({ partId: partA.id, qtyPerUnit: '1' }).expect(409);
    expect(blocked.body.error.message).toMatch(/released and read-only; make a new revision/);
    await d.patch(`/api/boms/${bom.id}`).send({ name: 'x', version: released.body.version }).expect(409);
    await d.post(`/api/boms/${bom.id}/state`).send({ state: 'draft' }).expect(409);

    const next = await d.post(`/api/boms/${bom.id}/revisions`).expect(201);
    expect(next.body).toMatchObject({ revision: 2, state: 'draft' });
    const lines = await d.get(`/api/boms/${next.body.id}/lines`).expect(200);
    expect(lines.body.items).toHaveLength(1);
    expect(lines.body.items[0]).toMatchObject({ refDes: 'R1 R2', qtyPerUnit: '2' });
    const detail = await d.get(`/api/boms/${next.body.id}`).expect(200);
    expect(detail.body.revisions.map((r: { revision: number }) => r.revision)).toEqual([1, 2]);
    const log = await ws.agents.owner.get('/api/audit').expect(200);
    expect(log.body.items.some((e: { action: string; entityId: string }) => e.action === 'state' && e.entityId === bom.id)).toBe(true);
  });
});

describe('BOM import', () => {
  it('matches rows by MPN or internal PN, keeps unmatched rows as unresolved lines, all in one commit', async () => {
    const bom = await newBom();
    const csv = ['Designator,Qty,Manufacturer PN,Our PN,Description', '"R1,R2,R3,R4",4,MPN-A,,10k', 'C1,1,,B-CAP,2n2', 'U1,1,NOT-IN-LIBRARY,,Timer IC'].join('\n');
    const preview = await ws.agents.designer.post(`/api/boms/${bom.id}/import`).attach('file', Buffer.from(csv), 'bom.csv').expect(200);
    expect(preview.body).toMatchObject({ totalRows: 3, problemRows: 0, matchedRows: 2, unresolvedRows: 1 });
    expect((await ws.agents.designer.get(`/api/boms/${bom.id}/lines`)).body.items).toHaveLength(0);
    await ws.agents.designer.post(`/api/boms/${bom.id}/import`).query({ commit: 'true' }).attach('file', Buffer.from(csv), 'bom.csv').expect(200);
    const lines = (await ws.agents.designer.get(`/api/boms/${bom.id}/lines`)).body.items;
    expect(lines).toHaveLength(3);
    expect(lines.find((l: { refDes: string }) => l.refDes === 'U1')).toMatchObject({ partId: null, unresolved: 'NOT-IN-LIBRARY' });
    expect(lines.find((l: { refDes: string }) => l.refDes === 'R1,R2,R3,R4')).toMatchObject({ partId: partA.id, qtyPerUnit: '4' });
  });

  it('a bad row blocks the commit and nothing is written', async () => {
    const bom = await newBom();
    const before = await snapshot(t.database.db);
    const csv = ['Designator,Qty,MPN', 'R1,1,MPN-A', 'R2,-3,MPN-A', 'R5-R2,1,MPN-A'].join('\n');
    const res = await ws.agents.designer.post(`/api/boms/${bom.id}/import`).query({ commit: 'true' }).attach('file', Buffer.from(csv), 'bom.csv').expect(400);
    expect(res.body.error.details.map((d: { path: string }) => d.path)).toEqual(['row 3.qtyPerUnit', 'row 4.refDes']);
    expect(await snapshot(t.database.db)).toEqual(before);
  });
});

describe('the stored roll-up', () => {
  it('the BOM list reads the landed cost at the planned quantity and it follows a quote change', async () => {
    const bom = await newBom({ plannedQty: 1000 });
    await ws.agents.designer.post(`/api/boms/${bom.id}/lines`).send({ partId: partB.id, qtyPerUnit: '1' }).expect(201);
    await expect.poll(async () => (await ws.agents.viewer.get('/api/boms').expect(200)).body.items.find((b: { id: string }) => b.id === bom.id).cost, { timeout: 10_000 })
      .toMatchObject({ landedPerUnit: '0.0150000000', fresh: true });
    const stored = await t.database.db('cost_rollups').where({ bomId: bom.id }).first();
    expect(stored.landedPerUnit).toBe('0.0150000000');
    const q = (await ws.agents.owner.get('/api/quotes').query({ partId: partB.id })).body.items[0];
    await ws.agents.buyer.patch(`/api/quotes/${q.id}`).send({ version: q.version, priceBreaks: [{ minQty: 1, unitPrice: '0.0120' }] }).expect(200);
    // The list never waits for a recompute: the refresh is queued by the write and lands shortly.
    await expect.poll(async () => (await ws.agents.viewer.get('/api/boms').expect(200)).body.items.find((b: { id: string }) => b.id === bom.id).cost, { timeout: 10_000 })
      .toMatchObject({ landedPerUnit: '0.0120000000', fresh: true });
    const fresh = await t.database.db('cost_rollups').where({ bomId: bom.id }).first();
    expect(fresh.result.totals.landedPerUnit).toBe('0.0120000000');

    // A note changes no cost: the costing epoch stays and the roll-up stays fresh. A
    // quantity does: the epoch moves and the refresh follows.
    const epoch = async () => String((await t.database.db('workspaces').where({ id: fresh.workspaceId }).first('costingEpoch')).costingEpoch);
    const line = (await ws.agents.viewer.get(`/api/boms/${bom.id}/lines`).expect(200)).body.items[0];
    const before = await epoch();
    const noted = await ws.agents.designer.patch(`/api/boms/${bom.id}/lines/${line.id}`).send({ version: line.version, note: 'reel from stock' }).expect(200);
    expect(await epoch()).toBe(before);
    await ws.agents.designer.patch(`/api/boms/${bom.id}/lines/${line.id}`).send({ version: noted.body.version, qtyPerUnit: '2' }).expect(200);
    expect(await epoch()).not.toBe(before);
    await expect.poll(async () => (await ws.agents.viewer.get('/api/boms').expect(200)).body.items.find((b: { id: string }) => b.id === bom.id).cost, { timeout: 10_000 })
      .toMatchObject({ landedPerUnit: '0.0240000000', fresh: true });
  });

  it('a fresh stored cost roll goes compressed as stored (brotli, else gzip) and as JSON text to a client that asks for neither', async () => {
    const bom = await newBom({ plannedQty: 1000 });
    await ws.agents.designer.post(`/api/boms/${bom.id}/lines`).send({ refDes: 'R1-R4', partId: partA.id, qtyPerUnit: '4' }).expect(201);
    const computed = await ws.agents.viewer.get(`/api/boms/${bom.id}/cost`).set('Accept-Encoding', 'gzip').expect(200);
    const row = await t.database.db('cost_rollups').where({ bomId: bom.id }).first('resultGzip', 'resultBr');
    expect(gunzipSync(row.resultGzip).toString('utf8')).toBe(JSON.stringify(computed.body));
    expect(brotliDecompressSync(row.resultBr).toString('utf8')).toBe(JSON.stringify(computed.body));
    // A browser offers both: brotli is sent. Offered gzip alone (or brotli refused), gzip.
    for (const [offered, sent] of [['gzip, deflate, br, zstd', 'br'], ['gzip, deflate', 'gzip'], ['br;q=0, gzip', 'gzip'], ['br', 'br']]) {
      const res = await ws.agents.viewer.get(`/api/boms/${bom.id}/cost`).set('Accept-Encoding', offered).expect(200);
      expect(res.headers['content-encoding'], offered).toBe(sent);
      expect(res.headers.vary).toMatch(/Accept-Encoding/);
      expect(res.body).toEqual(computed.body);
    }
    // A row rewritten by a server that does not know the compressed forms (a rolling
    // deploy): its brotli belongs to another computation, so it is not sent; the roll is
    // computed again, and stored whole.
    const db = t.database.db;
    await db('cost_rollups').where({ bomId: bom.id }).update({ computedAt: db.raw(`computed_at + interval '1 second'`) });
    const redone = await ws.agents.viewer.get(`/api/boms/${bom.id}/cost`).set('Accept-Encoding', 'br').expect(200);
    expect(redone.headers['content-encoding']).toBeUndefined();
    expect(redone.body.totals).toEqual(computed.body.totals);
    expect((await ws.agents.viewer.get(`/api/boms/${bom.id}/cost`).set('Accept-Encoding', 'br').expect(200)).headers['content-encoding']).toBe('br');
    // The BOM list never computes such a row while the user waits: it shows it as not
    // fresh, and the refresh queued behind makes it fresh.
    await db('cost_rollups').where({ bomId: bom.id }).update({ answersComputedAt: null });
    const listed = (await ws.agents.viewer.get('/api/boms').expect(200)).body.items.find((b: { id: string }) => b.id === bom.id);
    expect(listed.cost).toMatchObject({ landedPerUnit: computed.body.totals.landedPerUnit, fresh: false });
    await expect.poll(async () => (await ws.agents.viewer.get('/api/boms').expect(200)).body.items.find((b: { id: string }) => b.id === bom.id).cost.fresh, { timeout: 10_000 }).toBe(true);
    // No Accept-Encoding, or one that takes neither: the stored JSON text.
    for (const encoding of [undefined, 'identity', 'br;q=0, gzip;q=0']) {
      const req = ws.agents.viewer.get(`/api/boms/${bom.id}/cost`);
      if (encoding) req.set('Accept-Encoding', encoding);
      else req.unset('Accept-Encoding');
      const plain = await req.expect(200);
      expect(plain.headers['content-encoding'], encoding).toBeUndefined();
      expect(plain.headers.vary, encoding).toMatch(/Accept-Encoding/);
      expect(plain.body).toEqual(computed.body);
    }
  });

  it('snapshots and revisions compare per line and in totals', async () => {
    const bom = await newBom({ plannedQty: 1000 });
    await ws.agents.designer.post(`/api/boms/${bom.id}/lines`).send({ refDes: 'C1', partId: partB.id, qtyPerUnit: '1' }).expect(201);
    const snap = await ws.agents.buyer.post(`/api/boms/${bom.id}/snapshots`).send({ name: 'before cost-down' }).expect(201);
    const line = (await ws.agents.designer.get(`/api/boms/${bom.id}/lines`)).body.items[0];
    await ws.agents.designer.patch(`/api/boms/${bom.id}/lines/${line.id}`).send({ version: line.version, partId: partA.id }).expect(200);
    const cmp = await ws.agents.viewer.get('/api/cost-compare').query({ left: `snapshot:${snap.body.id}`, right: `bom:${bom.id}` }).expect(200);
    expect(cmp.body.lines[0]).toMatchObject({ refDes: 'C1', change: 'part_changed' });
    const perUnit = cmp.body.totals.find((x: { name: string }) => x.name === 'landedPerUnit');
    expect(Number(perUnit.change)).toBeLessThan(0);
  });
});
