/**
 * Test data factories for the costing engine's tests: small valid records with overrides.
 * Names and numbers are invented (Tinbell Gadgets demo world), not market data.
 */
import type { BomLine, CostRollInput, FxRate, Part, PriceBreak, Quote, Supplier } from './types';

/** An integer count of 10^-dp units as decimal text, built as a string (no float division). */
export function scaledText(units: number, dp: number): string {
  const digits = String(units).padStart(dp + 1, '0');
  return dp === 0 ? digits : `${digits.slice(0, -dp)}.${digits.slice(-dp)}`;
}

let seq = 0;
const nextId = (prefix: string) => `${prefix}-${(++seq).toString().padStart(4, '0')}`;

export function makeSupplier(overrides: Partial<Supplier> = {}): Supplier {
  return { id: nextId('sup'), active: true, name: 'Lamplight Components (demo)', ...overrides };
}

export function makePart(overrides: Partial<Part> = {}): Part {
  return {
    id: nextId('part'),
    category: 'resistor',
    mount: 'smt',
    pins: 2,
    hsCode: '8533.21',
    unitWeightG: '0.01',
    ...overrides,
  };
}

export function breaks(...pairs: [number, string][]): PriceBreak[] {
  return pairs.map(([minQty, unitPrice]) => ({ minQty, unitPrice }));
}

export function makeQuote(part: Part, supplier: Supplier, overrides: Partial<Quote> = {}): Quote {
  return {
    id: nextId('quote'),
    partId: part.id,
    supplierId: supplier.id,
    currency: 'USD',
    incoterm: 'DDP',
    moq: 1,
    orderMultiple: 1,
    leadTimeDays: 20,
    validFrom: null,
    validUntil: null,
    priceBreaks: breaks([1, '0.0100']),
    createdAt: '2026-01-05T09:00:00Z',
    ...overrides,
  };
}

export function partLine(part: Part, overrides: Partial<BomLine> = {}): BomLine {
  return { id: nextId('line'), kind: 'part', partId: part.id, qtyPerUnit: '1', ...overrides };
}

export function costLine(overrides: Partial<BomLine> & Pick<BomLine, 'kind'>): BomLine {
  return { id: nextId('line'), qtyPerUnit: '1', ...overrides };
}

export function fxRow(date: string, base: string, quote: string, rate: string): FxRate {
  return { date, base, quote, rate };
}

export function makeInput(overrides: Partial<CostRollInput> = {}): CostRollInput {
  return {
    bom: { qty: 1000, date: '2026-12-01', reportingCurrency: 'USD' },
    profile: {},
    lines: [],
    parts: [],
    quotes: [],
    suppliers: [],
    fxRates: [],
    ...overrides,
  };
}

/**
 * ECB euro reference rates of 2024-06-28 (1 EUR = rate CCY), the sample quoted in the
 * costing reference §7.3 [ECB-FMT], confirmed.
 */
export const ECB_2024_06_28: FxRate[] = [
  ['USD', '1.0705'],
  ['JPY', '171.94'],
  ['GBP', '0.84638'],
  ['CNY', '7.7748'],
  ['HKD', '8.3594'],
  ['AUD', '1.6079'],
  ['CAD', '1.4670'],
  ['KRW', '1474.86'],
  ['INR', '89.2495'],
].map(([quote, rate]) => fxRow('2024-06-28', 'EUR', quote, rate));
