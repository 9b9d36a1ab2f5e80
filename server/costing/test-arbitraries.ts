/**
 * fast-check generators of whole cost-roll inputs for the engine's property tests: random
 * parts, quotes (currencies, Incoterms, breaks, MOQ, multiples, validity), lines (pins,
 * DNP, attrition, cost lines) and profiles. Invented data only.
 */
import fc from 'fast-check';
import { INCOTERMS } from './incoterms';
import { scaledText } from './test-factories';
import type { BomLine, CostRollInput, FxRate, Incoterm, LandedCostProfile, Mount, Part, PartCategory, Quote, Supplier } from './types';

const CATEGORIES: PartCategory[] = ['resistor', 'capacitor', 'led', 'switch', 'pcb', 'battery'];
const MOUNTS: Mount[] = ['smt', 'tht', 'hand', 'none'];
const CURRENCIES = ['USD', 'EUR', 'CNY', 'JPY'] as const; // JPY has no rate: tests missing_fx
const HS = ['8533.21', '8532.24', '8541.41', '8536.50', null] as const;

export const FX_ROWS: FxRate[] = [
  { date: '2026-11-27', base: 'EUR', quote: 'USD', rate: '1.0705' },
  { date: '2026-11-27', base: 'EUR', quote: 'CNY', rate: '7.7748' },
  { date: '2026-11-30', base: 'EUR', quote: 'USD', rate: '1.0811' },
];

const decimalText = (min: number, max: number, scale: number) => {
  const dp = Math.round(Math.log10(scale));
  return fc.integer({ min: Math.round(min * scale), max: Math.round(max * scale) }).map((n) => scaledText(n, dp));
};

const priceBreaks = fc
  .array(fc.record({ gap: fc.integer({ min: 1, max: 8000 }), price: fc.integer({ min: 1, max: 500_000 }) }), { minLength: 1, maxLength: 5 })
  .map((rows) => {
    let min = 0;
    return rows.map((r) => {
      min += r.gap;
      return { minQty: min, unitPrice: scaledText(r.price, 6) };
    });
  });

const quoteShape = fc.record({
  currency: fc.constantFrom(...CURRENCIES),
  incoterm: fc.constantFrom<Incoterm>(...INCOTERMS),
  moq: fc.integer({ min: 1, max: 5000 }),
  orderMultiple: fc.constantFrom(1, 1, 10, 100, 3000, 4000),
  leadTimeDays: fc.option(fc.integer({ min: 1, max: 120 }), { nil: null }),
  expired: fc.boolean(),
  priceBreaks,
  supplier: fc.constantFrom('sup-a', 'sup-b', 'sup-idle'),
  createdDay: fc.integer({ min: 1, max: 28 }),
});

const partShape = fc.record({
  category: fc.constantFrom(...CATEGORIES),
  mount: fc.constantFrom(...MOUNTS),
  pins: fc.option(fc.integer({ min: 1, max: 16 }), { nil: null, freq: 5 }),
  hsCode: fc.constantFrom(...HS),
  unitWeightG: fc.option(decimalText(0, 20, 100), { nil: null, freq: 6 }),
  quotes: fc.array(quoteShape, { minLength: 0, maxLength: 4 }),
});

const lineShape = fc.record({
  partIndex: fc.nat(),
  kind: fc.constantFrom<BomLine['kind']>('part', 'part', 'part', 'part', 'labour', 'tooling', 'packaging'),
  qtyPerUnit: decimalText(0.01, 6, 100).filter((s) => Number(s) > 0),
  attritionPct: fc.option(decimalText(0, 10, 10), { nil: null }),
  dnp: fc.integer({ min: 0, max: 9 }).map((n) => n < 2),
  pin: fc.option(fc.nat(), { nil: null, freq: 4 }),
  unitCost: fc.option(decimalText(0, 1, 10000), { nil: null }),
  oneTimeCost: fc.option(decimalText(0, 5000, 100), { nil: null }),
  currency: fc.constantFrom('USD', 'EUR', 'CNY', null),
});

export const profileArb: fc.Arbitrary<LandedCostProfile> = fc.record({
  originPct: decimalText(0, 5, 10),
  freightPct: decimalText(0, 15, 10),
  freightPerShipment: decimalText(0, 900, 100),
  freightCurrency: fc.constantFrom('USD', 'EUR', 'CNY'),
  shipments: fc.integer({ min: 0, max: 3 }),
  freightBasis: fc.constantFrom('value' as const, 'weight' as const),
  insurancePct: decimalText(0, 1, 100),
  dutyBasis: fc.constantFrom('CIF' as const, 'FOB' as const),
  dutyRates: fc.constant([{ hsPrefix: '8541', ratePct: '2.7' }, { hsPrefix: '8532.24', ratePct: '0' }]),
  defaultDutyPct: decimalText(0, 12, 10),
  feesPerShipment: decimalText(0, 300, 100),
  destinationPct: decimalText(0, 5, 10),
  maxLeadTimeDays: fc.option(fc.integer({ min: 20, max: 120 }), { nil: null }),
  attritionPct: fc.constant({ resistor: '2', capacitor: '1.5' }),
  smtRatePerPlacement: decimalText(0, 0.01, 10000),
  thtRatePerJoint: decimalText(0, 0.02, 10000),
  handRatePerOp: decimalText(0, 0.1, 1000),
  currency: fc.constantFrom('USD', 'CNY'),
});

/** A whole cost-roll input: up to 8 parts with 0–4 quotes each, up to 14 lines. */
export const costRollInputArb: fc.Arbitrary<CostRollInput> = fc
  .record({
    parts: fc.array(partShape, { minLength: 1, maxLength: 8 }),
    lines: fc.array(lineShape, { minLength: 1, maxLength: 14 }),
    profile: profileArb,
    qty: fc.integer({ min: 1, max: 200_000 }),
    amortisationQty: fc.option(fc.integer({ min: 1, max: 500_000 }), { nil: null, freq: 4 }),
  })
  .map(({ parts: ps, lines: ls, profile, qty, amortisationQty }) => {
    const suppliers: Supplier[] = [
      { id: 'sup-a', active: true },
      { id: 'sup-b', active: true },
      { id: 'sup-idle', active: false },
    ];
    const parts: Part[] = [];
    const quotes: Quote[] = [];
    ps.forEach((p, i) => {
      const id = `part-${i}`;
      parts.push({ id, category: p.category, mount: p.mount, pins: p.pins, hsCode: p.hsCode, unitWeightG: p.unitWeightG });
      p.quotes.forEach((q, j) => {
        quotes.push({
          id: `quote-${i}-${j}`,
          partId: id,
          supplierId: q.supplier,
          currency: q.currency,
          incoterm: q.incoterm,
          moq: q.moq,
          orderMultiple: q.orderMultiple,
          leadTimeDays: q.leadTimeDays,
          validFrom: '2026-01-01',
          validUntil: q.expired ? '2026-06-30' : null,
          priceBreaks: q.priceBreaks,
          createdAt: `2026-02-${String(q.createdDay).padStart(2, '0')}T08:00:00Z`,
        });
      });
    });
    const lines: BomLine[] = ls.map((l, i) => {
      const part = parts[l.partIndex % parts.length];
      const own = quotes.filter((q) => q.partId === part.id);
      const isPart = l.kind === 'part';
      return {
        id: `line-${String(i).padStart(2, '0')}`,
        refDes: `X${i}`,
        kind: l.kind,
        partId: isPart ? part.id : null,
        qtyPerUnit: l.qtyPerUnit,
        attritionPct: l.attritionPct,
        dnp: l.dnp,
        pinnedQuoteId: isPart && l.pin !== null && own.length > 0 ? own[l.pin % own.length].id : null,
        unitCost: isPart ? null : l.unitCost,
        oneTimeCost: isPart ? null : l.oneTimeCost,
        currency: isPart ? null : l.currency,
      };
    });
    return {
      bom: { qty, date: '2026-12-01', reportingCurrency: 'USD', amortisationQty, targetUnitCost: '0.75' },
      profile,
      lines,
      parts,
      quotes,
      suppliers,
      fxRates: FX_ROWS,
    };
  });
