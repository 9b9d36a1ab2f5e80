import type { Agent } from './app';

/** Test data through the API itself, with overrides; seeds are for the demo only. */
let seq = 0;
export async function makeSupplier(agent: Agent, over: Record<string, unknown> = {}) {
  seq++;
  const res = await agent.post('/api/suppliers').send({ name: `Supplier ${seq}`, country: 'CN', currency: 'CNY', defaultIncoterm: 'FOB', ...over });
  if (res.status !== 201) throw new Error(`supplier: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: string; version: number; currency: string };
}

export async function makePart(agent: Agent, over: Record<string, unknown> = {}) {
  seq++;
  const res = await agent.post('/api/parts').send({
    internalPn: `P-${seq}`, mpn: `MPN-${seq}`, manufacturer: 'Maker', category: 'resistor', package: '0603',
    ratings: { resistanceOhm: '10k', powerW: '1/10W', levV: '75V' }, ...over,
  });
  if (res.status !== 201) throw new Error(`part: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: string; version: number; ratings: Record<string, number> };
}

export async function makeQuote(agent: Agent, partId: string, supplierId: string, over: Record<string, unknown> = {}) {
  const res = await agent.post('/api/quotes').send({
    partId, supplierId, currency: 'USD', incoterm: 'FOB', moq: 1, orderMultiple: 1,
    priceBreaks: [{ minQty: 1, unitPrice: '0.0100' }, { minQty: 1000, unitPrice: '0.0020' }], ...over,
  });
  if (res.status !== 201) throw new Error(`quote: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: string; version: number };
}

export async function makeProfile(agent: Agent, over: Record<string, unknown> = {}) {
  seq++;
  const res = await agent.post('/api/landed-cost-profiles').send({ name: `Profile ${seq}`, currency: 'USD', ...over });
  if (res.status !== 201) throw new Error(`profile: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: string; version: number };
}

/** A minimal, well-formed PDF. */
export const tinyPdf = Buffer.from(
  '%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj 2 0 obj<</Type/Pages/Kids[]/Count 0>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n',
  'latin1',
);
