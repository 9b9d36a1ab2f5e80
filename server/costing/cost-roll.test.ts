import { describe, expect, it } from 'vitest';
import { costRoll } from './cost-roll';
import { dec } from './decimal';
import { breaks, costLine, fxRow, makeInput, makePart, makeQuote, makeSupplier, partLine } from './test-factories';
import type { CostRollInput, CostRollLine, Part, Quote } from './types';

const sup = makeSupplier({ id: 'sup-lamplight' });
const sup2 = makeSupplier({ id: 'sup-brightway' });

/** A part bought 1 per unit at a flat price, so G = N × price. */
function bought(id: string, price: string, quote: Partial<Quote> = {}, part: Partial<Part> = {}) {
  const p = makePart({ id: `part-${id}`, ...part });
  const q = makeQuote(p, sup, { id: `quote-${id}`, priceBreaks: breaks([1, price]), ...quote });
  const l = partLine(p, { id: `line-${id}`, refDes: id.toUpperCase() });
  return { part: p, quote: q, line: l };
}

function input(items: ReturnType<typeof bought>[], overrides: Partial<CostRollInput> = {}): CostRollInput {
  return makeInput({
    parts: items.map((i) => i.part),
    quotes: items.map((i) => i.quote),
    lines: items.map((i) => i.line),
    suppliers: [sup, sup2],
    ...overrides,
  });
}

const line = (r: { lines: CostRollLine[] }, id: string) => r.lines.find((l) => l.lineId === `line-${id}`)!;

describe('per-shipment freight and fees are shared over the chosen quotes', () => {
  it('by goods value, among the lines whose Incoterm carries the adder', () => {
    const a = bought('a', '0.30', { incoterm: 'FOB' });
    const b = bought('b', '0.10', { incoterm: 'FOB' });
    const c = bought('c', '0.05', { incoterm: 'DDP' });
    const r = costRoll(
      input([a, b, c], {
        profile: { freightPerShipment: '200', shipments: 2, feesPerShipment: '100', insurancePct: '1', defaultDutyPct: '5', dutyBasis: 'CIF' },
      }),
    );
    // Freight 400 over FOB goods 300 : 100; DDP carries none. Fees 200 over the same two.
    expect([line(r, 'a').freight, line(r, 'b').freight, line(r, 'c').freight]).toEqual(['300.000000', '100.000000', '0.000000']);
    expect(line(r, 'a').freightShare).toBe('300.000000');
    expect([line(r, 'a').fees, line(r, 'b').fees, line(r, 'c').fees]).toEqual(['150.000000', '50.000000', '0.000000']);
    // Final insurance and duty include the share: 1 % × 1.10 × (300 + 300) = 6.60; 5 % × 606.60 = 30.33.
    expect(line(r, 'a').insurance).toBe('6.600000');
    expect(line(r, 'a').customsValue).toBe('606.600000');
    expect(line(r, 'a').duty).toBe('30.330000');
    expect(line(r, 'c').duty).toBe('0.000000');
    expect(r.totals.freight).toBe('400.000000');
    expect(r.totals.fees).toBe('200.000000');
  });

  it('by weight when freightBasis = weight: order quantity × unit weight', () => {
    const a = bought('a', '0.30', { incoterm: 'EXW' }, { unitWeightG: '0.5' });
    const b = bought('b', '0.10', { incoterm: 'FCA' }, { unitWeightG: '1.5' });
    const r = costRoll(input([a, b], { profile: { freightPerShipment: '400', shipments: 1, freightBasis: 'weight' } }));
    expect([line(r, 'a').freight, line(r, 'b').freight]).toEqual(['100.000000', '300.000000']);
    expect([line(r, 'a').freightShare, line(r, 'b').freightShare]).toEqual(['100.000000', '300.000000']);
  });

  it('converts the per-shipment freight from its own currency', () => {
    const a = bought('a', '0.30', { incoterm: 'FOB' });
    const r = costRoll(
      input([a], {
        profile: { freightPerShipment: '100', freightCurrency: 'EUR', shipments: 1 },
        fxRates: [fxRow('2026-11-30', 'EUR', 'USD', '1.0705')],
      }),
    );
    expect(r.totals.freight).toBe('107.050000');
    expect(r.fxRates).toEqual([{ date: '2026-11-30', base: 'EUR', quote: 'USD', rate: '1.0705', inverted: false }]);
  });

  it('warns when the amounts cannot be shared or charged', () => {
    const c = bought('c', '0.05', { incoterm: 'DDP' });
    expect(costRoll(input([c], { profile: { freightPerShipment: '400', shipments: 1 } })).warnings.map((w) => w.code)).toEqual([
      'freight_unallocated',
    ]);
    expect(costRoll(input([c], { profile: { feesPerShipment: '75' } })).warnings.map((w) => w.code)).toEqual(['shipments_zero']);
    const r = costRoll(input([c], { profile: { feesPerShipment: '75', currency: 'CNY', shipments: 1 } }));
    expect(r.warnings).toEqual([{ code: 'missing_fx', detail: 'feesPerShipment CNY->USD 2026-12-01' }]);
  });
});

describe('lines left out of the totals, counted and named', () => {
  it('missing_weight: a weight-basis line without a unit weight, when it would carry freight', () => {
    const a = bought('a', '0.30', { incoterm: 'FOB' }, { unitWeightG: '2' });
    const b = bought('b', '0.10', { incoterm: 'FOB' }, { unitWeightG: null });
    const c = bought('c', '0.05', { incoterm: 'DDP' }, { unitWeightG: null });
    const r = costRoll(input([a, b, c], { profile: { freightPerShipment: '400', shipments: 1, freightBasis: 'weight' } }));
    expect(line(r, 'b')).toMatchObject({ status: 'left_out', goodsValue: '0.000000', landed: '0.000000' });
    expect(line(r, 'b').warnings).toEqual([{ code: 'missing_weight', detail: 'part-b' }]);
    expect(line(r, 'c').status).toBe('costed'); // DDP carries no freight, so its weight is not needed
    expect(line(r, 'a').freight).toBe('400.000000');
    expect(r.leftOut).toEqual({ count: 1, lines: [{ lineId: 'line-b', refDes: 'B', reason: 'missing_weight', detail: 'part-b' }] });
    expect(r.totals.goods).toBe('350.000000');
    expect(r.warnings).toContainEqual({ code: 'lines_left_out', detail: '1' });
  });

  it('missing_fx: a quote in a currency without a rate is never converted at 1', () => {
    const usd = bought('usd', '0.10');
    const jpy = bought('jpy', '15', { currency: 'JPY' });
    const without = costRoll(input([usd, jpy]));
    expect(line(without, 'jpy')).toMatchObject({ status: 'left_out', warnings: [{ code: 'missing_fx', detail: 'JPY->USD 2026-12-01' }] });
    expect(without.totals.goods).toBe('100.000000');
    expect(without.leftOut.count).toBe(1);
    // With a rate the same line costs 15 × 1,000 × 1.0705 / 171.94 = 93.39…, not 15,000.
    const withRate = costRoll(input([usd, jpy], { fxRates: [fxRow('2026-11-30', 'EUR', 'USD', '1.0705'), fxRow('2026-11-30', 'EUR', 'JPY', '171.94')] }));
    expect(line(withRate, 'jpy').goodsValue).toBe(dec(15_000).times('1.0705').div('171.94').toFixed(6));
    expect(line(withRate, 'jpy').unitPriceCurrency).toBe('JPY');
  });

  it('missing_fx on a cost line in a currency without a rate', () => {
    const r = costRoll(makeInput({ lines: [costLine({ id: 'line-label', kind: 'packaging', unitCost: '0.02', currency: 'GBP' })] }));
    expect(r.leftOut.lines).toEqual([{ lineId: 'line-label', refDes: null, reason: 'missing_fx', detail: 'GBP->USD 2026-12-01' }]);
    expect(r.totals.costLinesPerUnit).toBe('0.0000000000');
  });

  it('no_quote: no quote at all, or none eligible; no_part: a part line without a part', () => {
    const none = { ...bought('none', '0.1'), quote: makeQuote(makePart(), sup) };
    const expired = bought('old', '0.1', { validUntil: '2026-01-31' });
    const draft = { ...bought('x', '0.1'), line: partLine(makePart(), { id: 'line-draft', partId: null }) };
    const r = costRoll(input([none, expired, draft]));
    expect(r.leftOut.lines.map((l) => [l.lineId, l.reason])).toEqual([
      ['line-none', 'no_quote'],
      ['line-old', 'no_quote'],
      ['line-draft', 'no_part'],
    ]);
    expect(r.totals.landedTotal).toBe('0.000000');
  });

  it('falls back to an eligible quote when the cheaper one has no FX rate', () => {
    const p = makePart({ id: 'part-f' });
    const cheapJpy = makeQuote(p, sup, { id: 'q-jpy', currency: 'JPY', priceBreaks: breaks([1, '0.5']) });
    const usd = makeQuote(p, sup2, { id: 'q-usd', priceBreaks: breaks([1, '0.02']) });
    const r = costRoll(makeInput({ parts: [p], quotes: [cheapJpy, usd], lines: [partLine(p, { id: 'line-f' })], suppliers: [sup, sup2] }));
    expect(line(r, 'f')).toMatchObject({ status: 'costed', quoteId: 'q-usd', warnings: [] });
  });
});

describe('choosing the quote for a line', () => {
  const p = makePart({ id: 'part-sw', category: 'switch', hsCode: '8536.50' });
  // EXW looks cheaper on price, but origin 10 % + freight 20 % + duty make it dearer landed.
  const exw = makeQuote(p, sup, { id: 'q-exw', incoterm: 'EXW', priceBreaks: breaks([1, '0.0100']), leadTimeDays: 20 });
  const ddp = makeQuote(p, sup2, { id: 'q-ddp', incoterm: 'DDP', priceBreaks: breaks([1, '0.0120']), leadTimeDays: 30 });
  const base = (l: Partial<Parameters<typeof partLine>[1]> = {}) =>
    makeInput({
      profile: { originPct: '10', freightPct: '20', defaultDutyPct: '5' },
      parts: [p],
      quotes: [exw, ddp],
      lines: [partLine(p, { id: 'line-sw', ...l })],
      suppliers: [sup, sup2],
    });

  it('takes the lowest landed line cost, not the lowest price', () => {
    const r = costRoll(base());
    // EXW: 10 × (1 + 0.1 + 0.2) = 13.00, duty 5 % × 13 = 0.65 → 13.65 > DDP 12.00.
    expect(line(r, 'sw')).toMatchObject({ quoteId: 'q-ddp', supplierId: 'sup-brightway', landed: '12.000000', warnings: [] });
  });

  it('uses a pinned quote even when it is not the cheapest, and says so', () => {
    const r = costRoll(base({ pinnedQuoteId: 'q-exw' }));
    expect(line(r, 'sw')).toMatchObject({ quoteId: 'q-exw', status: 'costed', landed: '13.650000' });
    expect(line(r, 'sw').warnings).toEqual([{ code: 'pinned_not_cheapest', detail: 'q-ddp' }]);
  });

  it('uses a pinned quote that is no longer valid, with pinned_expired', () => {
    const input = base({ pinnedQuoteId: 'q-exw' });
    input.quotes = [{ ...exw, validUntil: '2026-11-01' }, ddp];
    const r = costRoll(input);
    expect(line(r, 'sw')).toMatchObject({ quoteId: 'q-exw', status: 'costed' });
    expect(line(r, 'sw').warnings).toEqual([{ code: 'pinned_expired' }]);
  });

  it('says when a pinned quote is gone and takes the cheapest', () => {
    const r = costRoll(base({ pinnedQuoteId: 'q-deleted' }));
    expect(line(r, 'sw')).toMatchObject({ quoteId: 'q-ddp', warnings: [{ code: 'pinned_not_found', detail: 'q-deleted' }] });
  });

  it('respects the maximum lead time', () => {
    const input = base();
    input.profile.maxLeadTimeDays = 25;
    expect(line(costRoll(input), 'sw').quoteId).toBe('q-exw');
  });

  it('takes attrition from the line, else from the profile category, else 0', () => {
    const input = base();
    input.profile.attritionPct = { switch: '5' };
    expect(line(costRoll(input), 'sw').requiredQty).toBe(1050);
    input.lines[0].attritionPct = '0';
    expect(line(costRoll(input), 'sw').requiredQty).toBe(1000);
    input.lines[0].attritionPct = '2.5';
    expect(line(costRoll(input), 'sw').requiredQty).toBe(1025);
    input.profile.attritionPct = {};
    input.lines[0].attritionPct = null;
    expect(line(costRoll(input), 'sw').requiredQty).toBe(1000);
  });
});

describe('DNP, assembly and cost lines', () => {
  it('lists DNP lines but neither buys nor assembles them', () => {
    const a = bought('a', '0.10');
    const d = bought('d', '0.50');
    d.line.dnp = true;
    const withDnp = costRoll(input([a, d], { profile: { smtRatePerPlacement: '0.01' } }));
    const without = costRoll(input([a], { profile: { smtRatePerPlacement: '0.01' } }));
    expect(line(withDnp, 'd')).toMatchObject({ status: 'dnp', orderQty: null, goodsValue: '0.000000', assembly: '0.000000', landed: '0.000000' });
    expect(withDnp.dnp).toEqual({ count: 1, lineIds: ['line-d'] });
    expect(withDnp.totals).toEqual(without.totals);
    expect(withDnp.leftOut.count).toBe(0);
  });

  it('prices assembly per SMT placement, THT joint and hand operation, in the profile currency', () => {
    const smt = bought('smt', '0.01', {}, { mount: 'smt' });
    smt.line.qtyPerUnit = '3';
    const tht = bought('tht', '0.01', {}, { mount: 'tht', pins: 8 });
    const hand = bought('hand', '0.01', {}, { mount: 'hand' });
    const none = bought('none', '0.01', {}, { mount: 'none' });
    const r = costRoll(
      input([smt, tht, hand, none], {
        profile: { currency: 'CNY', smtRatePerPlacement: '0.01', thtRatePerJoint: '0.02', handRatePerOp: '0.5' },
        fxRates: [fxRow('2026-11-30', 'USD', 'CNY', '8')],
      }),
    );
    // Per unit in CNY: 3 × 0.01 + 8 × 0.02 + 0.5 = 0.69 → /8 = 0.08625 USD; × 1,000 units.
    expect(line(r, 'smt').assembly).toBe('3.750000');
    expect(line(r, 'tht').assembly).toBe('20.000000');
    expect(line(r, 'hand').assembly).toBe('62.500000');
    expect(line(r, 'none').assembly).toBe('0.000000');
    expect(r.totals.assemblyPerUnit).toBe('0.0862500000');
    expect(r.totals.assembly).toBe('86.250000');
  });

  it('warns when a THT part has no pin count', () => {
    const tht = bought('tht', '0.01', {}, { mount: 'tht', pins: null });
    const r = costRoll(input([tht], { profile: { thtRatePerJoint: '0.02' } }));
    expect(line(r, 'tht').warnings).toEqual([{ code: 'missing_pins', detail: 'part-tht' }]);
  });

  it('amortises NRE 3,100 over 1,000 / 10,000 / 100,000 units: 3.1000 / 0.3100 / 0.0310 per unit (#42) cp', () => {
    const nre = costLine({ id: 'line-mould', kind: 'tooling', oneTimeCost: '3100' });
    const per = (qty: number, amortisationQty?: number) =>
      costRoll(makeInput({ bom: { qty, date: '2026-12-01', reportingCurrency: 'USD', amortisationQty }, lines: [nre] })).totals;
    expect(per(1000).oneTimePerUnit).toBe('3.1000000000');
    expect(per(10_000).oneTimePerUnit).toBe('0.3100000000');
    expect(per(100_000).oneTimePerUnit).toBe('0.0310000000');
    // Over a lifetime volume instead of this build: the per-unit charge no longer depends on N.
    expect(per(1000, 100_000)).toMatchObject({ oneTimePerUnit: '0.0310000000', landedTotal: '31.000000', oneTimeTotal: '3100.000000' });
  });

  it('charges per-unit cost lines × their quantity per unit, in their own currency', () => {
    const lines = [
      costLine({ id: 'line-labour', kind: 'labour', qtyPerUnit: '1', unitCost: '0.04' }),
      costLine({ id: 'line-screws', kind: 'other', qtyPerUnit: '4', unitCost: '0.25', currency: 'CNY' }),
      costLine({ id: 'line-empty', kind: 'test' }),
    ];
    const r = costRoll(makeInput({ lines, fxRates: [fxRow('2026-11-30', 'USD', 'CNY', '8')] }));
    expect(r.totals.costLinesPerUnit).toBe('0.1650000000'); // 0.04 + 4 × 0.25 / 8
    expect(r.totals.landedTotal).toBe('165.000000');
    expect(r.leftOut.lines).toEqual([{ lineId: 'line-empty', refDes: null, reason: 'no_cost' }]);
    expect(r.byCategory.map((c) => [c.category, c.landed])).toEqual([['labour', '40.000000'], ['other', '125.000000']]);
  });
});

describe('results', () => {
  it('gives the gap to target, breakdowns by category and supplier, and per-unit figures', () => {
    const a = bought('a', '0.10', {}, { category: 'resistor' });
    const b = bought('b', '0.20', { supplierId: sup2.id }, { category: 'led' });
    const c = bought('c', '0.30', {}, { category: 'led' });
    const r = costRoll(input([a, b, c], { bom: { qty: 1000, date: '2026-12-01', reportingCurrency: 'USD', targetUnitCost: '0.55' } }));
    expect(r.totals).toMatchObject({ landedTotal: '600.000000', landedPerUnit: '0.6000000000', targetUnitCost: '0.5500000000', gapToTarget: '0.0500000000' });
    expect(r.byCategory.map((x) => [x.category, x.lineCount, x.goods])).toEqual([['led', 2, '500.000000'], ['resistor', 1, '100.000000']]);
    expect(r.bySupplier.map((x) => [x.supplierId, x.landed, x.landedPerUnit])).toEqual([
      ['sup-brightway', '200.000000', '0.2000000000'],
      ['sup-lamplight', '400.000000', '0.4000000000'],
    ]);
    expect(line(r, 'b')).toMatchObject({ requiredQty: 1000, orderQty: 1000, unitPrice: '0.2000000000', unitPriceConverted: '0.2000000000', landedPerUnit: '0.2000000000' });
  });

  it('reports the excess value beside the goods value, which holds it', () => {
    const reel = bought('reel', '0.01', { moq: 4000, orderMultiple: 4000 });
    const r = costRoll(input([reel]));
    expect(line(r, 'reel')).toMatchObject({ requiredQty: 1000, orderQty: 4000, excessQty: 3000, goodsValue: '40.000000', excessValue: '30.000000' });
    expect(r.totals.landedPerUnit).toBe('0.0400000000');
  });
});
