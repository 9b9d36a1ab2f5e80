import { describe, expect, it } from 'vitest';
import { CAUTION, CAUTION_TEXT } from './caution';
import { CAREFUL, SHELF_GRADE } from './policies';
import { checkBom, type StressLineInput } from './stress-check';

// Demo data: Tinbell Gadgets' USB arc lighter (invented part choices; ratings as in the
// derating reference's tables where a line names a source).
const ARC_LIGHTER: StressLineInput[] = [
  {
    lineId: 'l-hvcap',
    refDes: 'C5',
    partId: 'p-cap-2n2-6kv',
    category: 'capacitor',
    ratings: { capacitanceF: 2.2e-9, ratedVoltageV: 6000, dielectric: 'hv_ceramic' },
    operatingPoint: { voltageV: 4000 }, // 66.7 % of 6 kV: inside Shelf-grade's 70 %, close to it
  },
  {
    lineId: 'l-bleed',
    refDes: 'R7',
    partId: 'p-res-22m-1206',
    category: 'resistor',
    ratings: { resistanceOhm: 22e6, powerW: 0.25, levV: 200 }, // [CHIP-TF; C]
    operatingPoint: { voltageV: 400 }, // twice the LEV: over rating
  },
  {
    lineId: 'l-osc',
    refDes: 'Q1',
    partId: 'p-bjt-to92',
    category: 'bjt',
    ratings: { icMaxA: 0.2, vceoMaxV: 40, pdMaxW: 0.625, tjMaxC: 150, rthJaCPerW: 200 }, // [BJT-DS; C]
    operatingPoint: { voltageV: 24, currentA: 0.05, powerW: 0.3 }, // §8 #11/#15 at the BOM's 40 °C: all clear
  },
  {
    lineId: 'l-diode',
    refDes: 'D3',
    partId: 'p-gp02-40',
    category: 'diode',
    ratings: { vrrmV: 4000, ifAvA: 0.25, tjMaxC: 175 }, // [GP02; C]
    operatingPoint: { voltageV: 3300, currentA: 0.001 }, // 82.5 %: beyond 80 %
  },
  {
    lineId: 'l-led',
    refDes: 'LED1',
    partId: 'p-led-red',
    category: 'led',
    ratings: { ifMaxA: 0.02, vfV: 2 },
    operatingPoint: {}, // no current entered yet
  },
  { lineId: 'l-xfmr', refDes: 'T1', partId: 'p-xfmr', category: 'transformer', ratings: {}, operatingPoint: { voltageV: 4000 } },
  { lineId: 'l-labour', refDes: null, partId: null, category: null },
];

describe('checkBom', () => {
  const result = checkBom({ lines: ARC_LIGHTER, policy: SHELF_GRADE, bomAmbientC: 40 });

  it('returns the shape of api.md', () => {
    expect(Object.keys(result).sort()).toEqual(['caution', 'lines', 'policyId', 'summary']);
    expect(result.policyId).toBe('shelf-grade');
    expect(Object.keys(result.summary).sort()).toEqual(['beyondPolicy', 'clear', 'close', 'needsData', 'overRating']);
    for (const line of result.lines) {
      expect(line).toEqual(expect.objectContaining({ lineId: expect.any(String), status: expect.any(String), checks: expect.any(Array) }));
      expect('refDes' in line && 'partId' in line).toBe(true);
      for (const c of line.checks) {
        for (const k of ['check', 'applied', 'rated', 'ratio', 'limit', 'status']) expect(c).toHaveProperty(k);
      }
    }
  });

  it('lists only lines whose category has checks, in BOM order', () => {
    expect(result.lines.map((l) => l.refDes)).toEqual(['C5', 'R7', 'Q1', 'D3', 'LED1']);
  });

  it('gives each line its worst check', () => {
    const status = Object.fromEntries(result.lines.map((l) => [l.refDes, l.status]));
    expect(status).toEqual({ C5: 'close', R7: 'over_rating', Q1: 'clear', D3: 'beyond_policy', LED1: 'needs_data' });
    // R7: its power check is clear, its voltage check over rating; the line is over rating.
    const r7 = result.lines.find((l) => l.refDes === 'R7')!;
    expect(r7.checks.map((c) => c.status)).toEqual(['over_rating', 'clear']);
  });

  it('counts lines, not checks, in the summary', () => {
    expect(result.summary).toEqual({ clear: 1, close: 1, beyondPolicy: 1, overRating: 1, needsData: 1 });
  });

  it('uses the BOM ambient where a line has none', () => {
    const q1 = result.lines.find((l) => l.refDes === 'Q1')!;
    expect(q1.checks.find((c) => c.check === 'transistor.junctionTemp')!.applied).toBeCloseTo(100, 9); // §8 #11 [TOSHIBA; C]
  });

  it('follows the policy it is given', () => {
    const careful = checkBom({ lines: ARC_LIGHTER, policy: CAREFUL, bomAmbientC: 40 });
    expect(careful.policyId).toBe('careful');
    // 66.7 % on an HV disc is beyond Careful's 60 %.
    expect(careful.lines[0].status).toBe('beyond_policy');
  });

  it('needs data for ambient-dependent checks when the BOM has no ambient', () => {
    const noAmbient = checkBom({ lines: ARC_LIGHTER.slice(2, 3), policy: SHELF_GRADE, bomAmbientC: null });
    expect(noAmbient.lines[0].status).toBe('needs_data');
    expect(noAmbient.lines[0].checks.filter((c) => c.status === 'needs_data').map((c) => c.check)).toEqual([
      'transistor.power',
      'transistor.junctionTemp',
    ]);
  });

  it('returns an empty tally for a BOM without checked lines', () => {
    const empty = checkBom({ lines: ARC_LIGHTER.slice(5), policy: SHELF_GRADE, bomAmbientC: 25 });
    expect(empty.lines).toEqual([]);
    expect(empty.summary).toEqual({ clear: 0, close: 0, beyondPolicy: 0, overRating: 0, needsData: 0 });
  });

  it('carries the caution shown beside results', () => {
    expect(result.caution).toBe(CAUTION_TEXT);
  });
});

describe('caution text', () => {
  it('says what derating.md requires it to say', () => {
    expect(CAUTION_TEXT).toMatch(/High voltage can injure, even after/);
    expect(CAUTION_TEXT).toMatch(/do not make it safe or certifiable/);
    expect(CAUTION_TEXT).toMatch(/appliance safety standard, local codes, the exact part's datasheet and a qualified engineer or test house decide/);
    expect(CAUTION_TEXT).toMatch(/Tolerances, transients, the temperature inside the enclosure and single faults, such as an open bleeder/);
    expect(CAUTION).toHaveLength(4);
  });
});
