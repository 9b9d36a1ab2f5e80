import { Dec } from './decimal';
import { CostingInputError } from './errors';
import type { AdderName, DutyBasis, Incoterm } from './types';

/** The eleven Incoterms 2020 rules (ICC): seven for any mode, then four for sea and inland water. */
export const INCOTERMS: readonly Incoterm[] = [
  'EXW', 'FCA', 'CPT', 'CIP', 'DAP', 'DPU', 'DDP',
  'FAS', 'FOB', 'CFR', 'CIF',
];

export const ADDER_NAMES: readonly AdderName[] = ['origin', 'freight', 'insurance', 'duty', 'fees', 'destination'];

type AdderSet = Readonly<Record<AdderName, boolean>>;

const set = (...names: AdderName[]): AdderSet =>
  Object.fromEntries(ADDER_NAMES.map((n) => [n, names.includes(n)])) as Record<AdderName, boolean>;

/**
 * Which adders the buyer must put on top of a price quoted under each rule: what the
 * seller's price does not already hold. Exactly the product's table.
 */
export const INCOTERM_ADDERS: Readonly<Record<Incoterm, AdderSet>> = {
  EXW: set('origin', 'freight', 'insurance', 'duty', 'fees', 'destination'),
  FCA: set('freight', 'insurance', 'duty', 'fees', 'destination'),
  FAS: set('freight', 'insurance', 'duty', 'fees', 'destination'),
  FOB: set('freight', 'insurance', 'duty', 'fees', 'destination'),
  CFR: set('insurance', 'duty', 'fees', 'destination'),
  CPT: set('insurance', 'duty', 'fees', 'destination'),
  CIF: set('duty', 'fees', 'destination'),
  CIP: set('duty', 'fees', 'destination'),
  DAP: set('duty', 'fees'),
  DPU: set('duty', 'fees'),
  DDP: set(),
};

export function isIncoterm(value: unknown): value is Incoterm {
  return typeof value === 'string' && (INCOTERMS as readonly string[]).includes(value);
}

export function assertIncoterm(value: unknown, field = 'incoterm'): Incoterm {
  if (!isIncoterm(value)) throw new CostingInputError(`not an Incoterms 2020 rule (${String(value)})`, field);
  return value;
}

export function needsAdder(incoterm: Incoterm, adder: AdderName): boolean {
  return INCOTERM_ADDERS[incoterm][adder];
}

export interface CustomsValueParts<T = Dec> {
  goods: T;
  origin: T;
  freight: T;
  insurance: T;
}

/**
 * Customs value for duty. Under the CIF basis (EU, UK, most countries) the transport and
 * insurance to the border are dutiable; under the FOB basis (USA, Canada, Australia) they
 * are not. A C- or D-term price already holds its carriage, so it is taken as it stands.
 * DDP: the seller pays the duty, so there is no customs value for the buyer (null).
 */
export function customsValue<T extends { plus(b: T): T; isZero(): boolean } = Dec>(incoterm: Incoterm, basis: DutyBasis, p: CustomsValueParts<T>): T | null {
  const plus = (a: T, b: T) => (b.isZero() ? a : a.plus(b));
  switch (incoterm) {
    case 'EXW':
      return basis === 'CIF' ? plus(plus(plus(p.goods, p.origin), p.freight), p.insurance) : plus(p.goods, p.origin);
    case 'FCA':
    case 'FAS':
    case 'FOB':
      return basis === 'CIF' ? plus(plus(p.goods, p.freight), p.insurance) : p.goods;
    case 'CFR':
    case 'CPT':
      return basis === 'CIF' ? plus(p.goods, p.insurance) : p.goods;
    case 'CIF':
    case 'CIP':
    case 'DAP':
    case 'DPU':
      return p.goods;
    case 'DDP':
      return null;
  }
}
