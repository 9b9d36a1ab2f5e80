import { describe, expect, it } from 'vitest';
import { ADDER_NAMES, INCOTERM_ADDERS, INCOTERMS, isIncoterm } from './incoterms';
import type { AdderName, Incoterm } from './types';

describe('the Incoterms 2020 rules [INCO-LIST]', () => {
  it('has the eleven rules: seven for any mode, four for sea and inland water (confirmed)', () => {
    expect(INCOTERMS).toHaveLength(11);
    expect([...INCOTERMS.slice(0, 7)].sort()).toEqual(['CIP', 'CPT', 'DAP', 'DDP', 'DPU', 'EXW', 'FCA']);
    expect([...INCOTERMS.slice(7)].sort()).toEqual(['CFR', 'CIF', 'FAS', 'FOB']);
    expect(isIncoterm('DAT')).toBe(false); // renamed DPU in 2020 [INCO-2020CH]
  });
});

/*
 * The ICC cost allocation of the reference §1.2 ("B" = the buyer pays, so a landed cost adds
 * it; "S" = in the seller's price). Blocks: O1 loading at the seller, O2 export clearance,
 * O3 origin terminal handling, M main carriage, I insurance, D1 unloading / destination
 * terminal, C import clearance + duty, D2 on-carriage to our warehouse.
 * Sources as the reference marks them: codes and the DDP column confirmed [INCO-LIST]
 * [INCO-DDP][INCO-ICCPA]; the per-block cells are the ICC A4/A9 articles from memory.
 */
type Payer = 'B' | 'S';
const ICC: Record<Incoterm, Record<'O1' | 'O2' | 'O3' | 'M' | 'I' | 'D1' | 'C' | 'D2', Payer>> = {
  EXW: { O1: 'B', O2: 'B', O3: 'B', M: 'B', I: 'B', D1: 'B', C: 'B', D2: 'B' },
  FCA: { O1: 'S', O2: 'S', O3: 'B', M: 'B', I: 'B', D1: 'B', C: 'B', D2: 'B' },
  FAS: { O1: 'S', O2: 'S', O3: 'B', M: 'B', I: 'B', D1: 'B', C: 'B', D2: 'B' },
  FOB: { O1: 'S', O2: 'S', O3: 'S', M: 'B', I: 'B', D1: 'B', C: 'B', D2: 'B' },
  CFR: { O1: 'S', O2: 'S', O3: 'S', M: 'S', I: 'B', D1: 'B', C: 'B', D2: 'B' },
  CPT: { O1: 'S', O2: 'S', O3: 'S', M: 'S', I: 'B', D1: 'B', C: 'B', D2: 'B' },
  CIF: { O1: 'S', O2: 'S', O3: 'S', M: 'S', I: 'S', D1: 'B', C: 'B', D2: 'B' },
  CIP: { O1: 'S', O2: 'S', O3: 'S', M: 'S', I: 'S', D1: 'B', C: 'B', D2: 'B' },
  DAP: { O1: 'S', O2: 'S', O3: 'S', M: 'S', I: 'S', D1: 'B', C: 'B', D2: 'B' },
  DPU: { O1: 'S', O2: 'S', O3: 'S', M: 'S', I: 'S', D1: 'S', C: 'B', D2: 'B' },
  DDP: { O1: 'S', O2: 'S', O3: 'S', M: 'S', I: 'S', D1: 'B', C: 'S', D2: 'B' },
};

const D_RULES: Incoterm[] = ['DAP', 'DPU', 'DDP'];

/*
 * How the blocks fold into the profile's adders: origin = export handling at origin (O1, O2);
 * freight = main carriage including origin terminal handling (O3, M), as LCL freight is
 * quoted; insurance = I; duty and fees = C; destination = port handling and delivery to the
 * warehouse (D1, D2). Assumption: a D-rule's named place is our warehouse, so what is left
 * for the buyer there (unloading at our own door, "D2 beyond the named place") is our own
 * work, not a bought service, and adds nothing.
 */
function expectedAdders(rule: Incoterm): Record<AdderName, boolean> {
  const b = ICC[rule];
  const buyer = (...blocks: (keyof typeof b)[]) => blocks.some((k) => b[k] === 'B');
  return {
    origin: buyer('O1', 'O2'),
    freight: buyer('O3', 'M'),
    insurance: buyer('I'),
    duty: buyer('C'),
    fees: buyer('C'),
    destination: !D_RULES.includes(rule) && buyer('D1', 'D2'),
  };
}

describe('adders a quote needs, by Incoterm (ICC cost allocation, reference §1.2)', () => {
  for (const rule of INCOTERMS) {
    it(`${rule}: the seller's price leaves exactly these adders to the buyer`, () => {
      const ours = Object.fromEntries(ADDER_NAMES.map((n) => [n, INCOTERM_ADDERS[rule][n]]));
      expect(ours).toEqual(expectedAdders(rule));
    });
  }

  it('FOB needs main freight, insurance, destination handling, clearance fees and duty (#11) [INCO-LIST] from memory', () => {
    expect(INCOTERM_ADDERS.FOB).toEqual({
      origin: false, freight: true, insurance: true, duty: true, fees: true, destination: true,
    });
  });

  it('DDP needs no adder and no duty line: the seller clears import and pays duty (#12) [INCO-DDP]', () => {
    expect(Object.values(INCOTERM_ADDERS.DDP).some(Boolean)).toBe(false);
  });

  it('CIF and CIP already hold insurance at the seller\'s cost [INCO-INS]', () => {
    expect(INCOTERM_ADDERS.CIF.insurance).toBe(false);
    expect(INCOTERM_ADDERS.CIP.insurance).toBe(false);
    expect(INCOTERM_ADDERS.CFR.insurance).toBe(true);
  });
});
