import { scaledText } from './test-factories';
import type { BomLine, CostRollInput, Part, Quote } from './types';

/**
 * 10,000 part lines, each part with 4 quotes of 5 breaks in 3 currencies: the size the
 * engine must roll well under a second (timing lives in cost-roll.bench.ts).
 */
export function bigBom(lineCount: number) {
  const parts: Part[] = [];
  const quotes: Quote[] = [];
  const lines: BomLine[] = [];
  const currencies = ['USD', 'CNY', 'EUR', 'USD'];
  const incoterms = ['FOB', 'EXW', 'DDP', 'CIF'] as const;
  for (let i = 0; i < lineCount; i++) {
    const partId = `part-${i}`;
    parts.push({ id: partId, category: 'resistor', mount: i % 3 === 0 ? 'tht' : 'smt', pins: 2, hsCode: `8533.${21 + (i % 9)}`, unitWeightG: '0.02' });
    for (let j = 0; j < 4; j++) {
      const base = 1000 + ((i * 7 + j * 13) % 900);
      quotes.push({
        id: `quote-${i}-${j}`,
        partId,
        supplierId: `sup-${j}`,
        currency: currencies[j],
        incoterm: incoterms[j],
        moq: 100 * (j + 1),
        orderMultiple: [1, 100, 1000, 5000][j],
        leadTimeDays: 10 + j * 5,
        validUntil: j === 3 && i % 10 === 0 ? '2026-01-01' : null,
        // Prices in millionths, falling with quantity: 0.00xxxx.
        priceBreaks: [1, 100, 1000, 10_000, 100_000].map((minQty, k) => ({ minQty, unitPrice: scaledText(base * (5 - k), 6) })),
        createdAt: '2026-02-01T00:00:00Z',
      });
    }
    lines.push({ id: `line-${i}`, kind: 'part', partId, qtyPerUnit: String(1 + (i % 4)), attritionPct: i % 2 ? '1.5' : null });
  }
  return { parts, quotes, lines };
}

/** The whole cost-roll input around `bigBom`, with a profile that uses every adder. */
export function bigBomInput(lineCount: number): CostRollInput {
  const { parts, quotes, lines } = bigBom(lineCount);
  return {
    bom: { qty: 5000, date: '2026-12-01', reportingCurrency: 'USD' },
    profile: {
      freightPct: '4',
      insurancePct: '0.3',
      defaultDutyPct: '3.7',
      dutyRates: [{ hsPrefix: '8533.2', ratePct: '0' }],
      freightPerShipment: '900',
      shipments: 2,
      feesPerShipment: '150',
      destinationPct: '1',
      smtRatePerPlacement: '0.001',
      thtRatePerJoint: '0.002',
      attritionPct: { resistor: '2' },
    },
    lines,
    parts,
    quotes,
    suppliers: [0, 1, 2, 3].map((j) => ({ id: `sup-${j}`, active: true })),
    fxRates: [
      { date: '2026-11-30', base: 'EUR', quote: 'USD', rate: '1.0811' },
      { date: '2026-11-30', base: 'EUR', quote: 'CNY', rate: '7.7748' },
    ],
  };
}
