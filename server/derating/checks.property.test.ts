import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checksFor } from './checks';
import { SEEDED_POLICIES, type StressPolicy } from './policies';
import { severityRank } from './status';
import { DIELECTRICS, type CheckName, type CheckedCategory, type OperatingPoint } from './types';

// Property tests: whatever the part and the policy, more stress never reads better and a
// larger rating never reads worse. These are what a designer relies on when comparing parts.

type Scenario = { category: CheckedCategory; ratings: Record<string, unknown>; op: OperatingPoint; ambientC: number };

const value = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const ordered = (min: number, max: number) =>
  fc.tuple(value(min, max), value(min, max)).map(([a, b]) => (a <= b ? [a, b] : [b, a]) as [number, number]);
const policy = fc.constantFrom(...SEEDED_POLICIES);

function rank(s: Scenario, check: CheckName, p: StressPolicy): number {
  const result = checksFor(s.category, s.ratings, s.op, s.ambientC, p).find((c) => c.check === check);
  if (!result) throw new Error(`no ${check}`);
  return severityRank(result.status);
}

/** A base scenario per check, with every input present and realistic. */
const bases: Record<CheckName, fc.Arbitrary<Scenario>> = {
  'capacitor.voltage': fc.record({
    category: fc.constant('capacitor' as const),
    ratings: fc.record({ ratedVoltageV: value(1, 20_000), dielectric: fc.constantFrom(...DIELECTRICS) }),
    op: fc.record({ voltageV: value(0, 30_000) }),
    ambientC: value(-40, 125),
  }),
  'resistor.voltage': fc.record({
    category: fc.constant('resistor' as const),
    ratings: fc.record({ resistanceOhm: value(0.1, 1e9), powerW: value(0.01, 5), levV: value(10, 10_000) }),
    op: fc.record({ voltageV: value(0, 20_000) }),
    ambientC: value(-40, 125),
  }),
  'resistor.power': fc.record({
    category: fc.constant('resistor' as const),
    ratings: fc.record({ resistanceOhm: value(0.1, 1e9), powerW: value(0.01, 5), derateKneeC: value(40, 100), zeroPowerC: value(101, 200) }),
    op: fc.record({ powerW: value(0, 10), ambientC: value(-40, 220) }),
    ambientC: value(-40, 125),
  }),
  'transistor.current': fc.record({
    category: fc.constantFrom('bjt' as const, 'mosfet' as const),
    ratings: fc.record({ icMaxA: value(0.01, 50), idMaxA: value(0.01, 50) }),
    op: fc.record({ currentA: value(0, 100) }),
    ambientC: value(-40, 125),
  }),
  'transistor.voltage': fc.record({
    category: fc.constantFrom('bjt' as const, 'mosfet' as const),
    ratings: fc.record({ vceoMaxV: value(5, 2000), vdsMaxV: value(5, 2000) }),
    op: fc.record({ voltageV: value(0, 4000) }),
    ambientC: value(-40, 125),
  }),
  'transistor.power': fc.record({
    category: fc.constantFrom('bjt' as const, 'mosfet' as const),
    ratings: fc.record({ pdMaxW: value(0.05, 100), tjMaxC: value(26, 200) }),
    op: fc.record({ powerW: value(0, 200), ambientC: value(-40, 220) }),
    ambientC: value(-40, 125),
  }),
  'transistor.junctionTemp': fc.record({
    category: fc.constantFrom('bjt' as const, 'mosfet' as const),
    ratings: fc.record({ rthJaCPerW: value(0.5, 1000), tjMaxC: value(26, 200) }),
    op: fc.record({ powerW: value(0, 5), ambientC: value(-40, 220) }),
    ambientC: value(-40, 125),
  }),
  'diode.reverseVoltage': fc.record({
    category: fc.constant('diode' as const),
    ratings: fc.record({ vrrmV: value(1, 20_000) }),
    op: fc.record({ voltageV: value(0, 40_000) }),
    ambientC: value(-40, 125),
  }),
  'diode.current': fc.record({
    category: fc.constant('diode' as const),
    ratings: fc.record({ ifAvA: value(0.001, 50) }),
    op: fc.record({ currentA: value(0, 100) }),
    ambientC: value(-40, 125),
  }),
  'led.current': fc.record({
    category: fc.constant('led' as const),
    ratings: fc.record({ ifMaxA: value(0.001, 3) }),
    op: fc.record({ currentA: value(0, 6) }),
    ambientC: value(-40, 125),
  }),
};

/**
 * One input to vary. `range` is absolute, or in multiples of `per(s)` when given, so the
 * pairs land around the rating where the status bands are (random values over decades
 * would almost never fall between 0.9 × limit and the rating).
 */
type Knob = {
  check: CheckName;
  where: 'ratings' | 'op';
  key: string;
  range: [number, number];
  per?: (s: Scenario) => number;
  drop?: string[];
};

const r = (key: string) => (s: Scenario) => s.ratings[key] as number;
const o = (key: string) => (s: Scenario) => s.op[key as keyof OperatingPoint] as number;
const AROUND: [number, number] = [0, 1.3];
const FROM_APPLIED: [number, number] = [0.5, 2.5];

/** Inputs where a higher value is more stress. */
const STRESS: Knob[] = [
  { check: 'capacitor.voltage', where: 'op', key: 'voltageV', range: AROUND, per: r('ratedVoltageV') },
  { check: 'resistor.voltage', where: 'op', key: 'voltageV', range: AROUND, per: r('levV') },
  { check: 'resistor.power', where: 'op', key: 'powerW', range: AROUND, per: r('powerW') },
  {
    check: 'resistor.power',
    where: 'op',
    key: 'voltageV',
    range: AROUND,
    per: (s) => Math.sqrt((s.ratings.powerW as number) * (s.ratings.resistanceOhm as number)),
    drop: ['powerW'],
  },
  {
    check: 'resistor.power',
    where: 'op',
    key: 'currentA',
    range: AROUND,
    per: (s) => Math.sqrt((s.ratings.powerW as number) / (s.ratings.resistanceOhm as number)),
    drop: ['powerW'],
  },
  { check: 'resistor.power', where: 'op', key: 'ambientC', range: [-40, 220] },
  { check: 'transistor.current', where: 'op', key: 'currentA', range: AROUND, per: (s) => (s.category === 'bjt' ? r('icMaxA')(s) : r('idMaxA')(s)) },
  { check: 'transistor.voltage', where: 'op', key: 'voltageV', range: AROUND, per: (s) => (s.category === 'bjt' ? r('vceoMaxV')(s) : r('vdsMaxV')(s)) },
  { check: 'transistor.power', where: 'op', key: 'powerW', range: AROUND, per: r('pdMaxW') },
  { check: 'transistor.power', where: 'op', key: 'ambientC', range: [-40, 220] },
  {
    check: 'transistor.junctionTemp',
    where: 'op',
    key: 'powerW',
    range: AROUND,
    per: (s) => Math.max(1e-3, ((s.ratings.tjMaxC as number) - (s.op.ambientC as number)) / (s.ratings.rthJaCPerW as number)),
  },
  { check: 'transistor.junctionTemp', where: 'op', key: 'ambientC', range: [-40, 220] },
  { check: 'transistor.junctionTemp', where: 'ratings', key: 'rthJaCPerW', range: [0.5, 1000] },
  { check: 'diode.reverseVoltage', where: 'op', key: 'voltageV', range: AROUND, per: r('vrrmV') },
  { check: 'diode.current', where: 'op', key: 'currentA', range: AROUND, per: r('ifAvA') },
  { check: 'led.current', where: 'op', key: 'currentA', range: AROUND, per: r('ifMaxA') },
];

/** Ratings where a higher value is a stronger part. */
const RATING: Knob[] = [
  { check: 'capacitor.voltage', where: 'ratings', key: 'ratedVoltageV', range: FROM_APPLIED, per: o('voltageV') },
  { check: 'resistor.voltage', where: 'ratings', key: 'levV', range: FROM_APPLIED, per: o('voltageV') },
  { check: 'resistor.voltage', where: 'ratings', key: 'powerW', range: [0.01, 5] },
  { check: 'resistor.power', where: 'ratings', key: 'powerW', range: FROM_APPLIED, per: o('powerW') },
  { check: 'resistor.power', where: 'ratings', key: 'derateKneeC', range: [40, 100] },
  { check: 'resistor.power', where: 'ratings', key: 'zeroPowerC', range: [101, 200] },
  { check: 'transistor.current', where: 'ratings', key: 'icMaxA', range: FROM_APPLIED, per: o('currentA') },
  { check: 'transistor.current', where: 'ratings', key: 'idMaxA', range: FROM_APPLIED, per: o('currentA') },
  { check: 'transistor.voltage', where: 'ratings', key: 'vceoMaxV', range: FROM_APPLIED, per: o('voltageV') },
  { check: 'transistor.voltage', where: 'ratings', key: 'vdsMaxV', range: FROM_APPLIED, per: o('voltageV') },
  { check: 'transistor.power', where: 'ratings', key: 'pdMaxW', range: FROM_APPLIED, per: o('powerW') },
  { check: 'transistor.power', where: 'ratings', key: 'tjMaxC', range: [26, 200] },
  { check: 'transistor.junctionTemp', where: 'ratings', key: 'tjMaxC', range: [26, 200] },
  { check: 'diode.reverseVoltage', where: 'ratings', key: 'vrrmV', range: FROM_APPLIED, per: o('voltageV') },
  { check: 'diode.current', where: 'ratings', key: 'ifAvA', range: FROM_APPLIED, per: o('currentA') },
  { check: 'led.current', where: 'ratings', key: 'ifMaxA', range: FROM_APPLIED, per: o('currentA') },
];

function withValue(s: Scenario, knob: Knob, factor: number): Scenario {
  const x = knob.per ? factor * knob.per(s) : factor;
  const op: Record<string, unknown> = { ...s.op };
  for (const k of knob.drop ?? []) delete op[k];
  if (knob.where === 'op') op[knob.key] = x;
  const ratings = knob.where === 'ratings' ? { ...s.ratings, [knob.key]: x } : s.ratings;
  return { ...s, ratings, op: op as OperatingPoint };
}

/** A scenario where the varied input has something to scale from. */
function usable(s: Scenario, knob: Knob): boolean {
  if (!knob.per) return true;
  const base = knob.per(s);
  // Tiny bases would scale to subnormal or zero ratings, which are not ratings at all.
  return Number.isFinite(base) && base >= 1e-9;
}

describe('a higher applied stress never gives a better status', () => {
  it.each(STRESS.map((k) => [`${k.check} by ${k.where}.${k.key}`, k] as const))('%s', (_name, knob) => {
    fc.assert(
      fc.property(bases[knob.check], ordered(...knob.range), policy, (s, [lo, hi], p) => {
        fc.pre(usable(s, knob));
        expect(rank(withValue(s, knob, hi), knob.check, p)).toBeGreaterThanOrEqual(rank(withValue(s, knob, lo), knob.check, p));
      }),
      { numRuns: 300 },
    );
  });
});

describe('a larger rating never gives a worse status', () => {
  it.each(RATING.map((k) => [`${k.check} by ${k.where}.${k.key}`, k] as const))('%s', (_name, knob) => {
    fc.assert(
      fc.property(bases[knob.check], ordered(...knob.range), policy, (s, [lo, hi], p) => {
        fc.pre(usable(s, knob));
        expect(rank(withValue(s, knob, hi), knob.check, p)).toBeLessThanOrEqual(rank(withValue(s, knob, lo), knob.check, p));
      }),
      { numRuns: 300 },
    );
  });
});

describe('a more lenient policy never gives a worse status', () => {
  it('capacitor.voltage with a larger limit', () => {
    fc.assert(
      fc.property(bases['capacitor.voltage'], ordered(0.01, 1), (s, [lo, hi]) => {
        const at = (limit: number): StressPolicy => {
          const p = structuredClone(SEEDED_POLICIES[0]);
          for (const d of DIELECTRICS) p.limits.capacitor[d] = { value: limit };
          return p;
        };
        expect(rank(s, 'capacitor.voltage', at(hi))).toBeLessThanOrEqual(rank(s, 'capacitor.voltage', at(lo)));
      }),
      { numRuns: 300 },
    );
  });
});

describe('every computed check is consistent with its own numbers', () => {
  it('ratio = applied / rated, and the status follows from ratio and limit', () => {
    const all = fc.oneof(...Object.values(bases));
    fc.assert(
      fc.property(all, policy, (s, p) => {
        for (const c of checksFor(s.category, s.ratings, s.op, s.ambientC, p)) {
          if (c.status === 'needs_data') continue;
          if (c.ratio === null) {
            expect(c.status).toBe('over_rating');
            continue;
          }
          if (c.check !== 'transistor.junctionTemp') expect(c.ratio).toBeCloseTo(c.applied! / c.rated!, 12);
          if (c.ratio > 1 + 1e-9) expect(c.status).toBe('over_rating');
          if (c.ratio <= c.limit!) expect(['clear', 'close']).toContain(c.status);
        }
      }),
      { numRuns: 500 },
    );
  });
});
