import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Dec, moneyText, perUnitText } from './decimal';
import { Dec40 } from './dec40';

/**
 * `Dec40` must give decimal.js's answers (npm `decimal.js`, set up as the engine's `Dec`:
 * 40 significant digits, half-up) digit for digit: the same chains of sums and products,
 * the same quotient by a build quantity, the same printed text. Long operands (a 40-digit
 * FX rate, a share of a pool) make every product round.
 */
const decimalText = fc
  .tuple(fc.boolean(), fc.bigInt({ min: 0n, max: 10n ** 42n }), fc.integer({ min: 0, max: 44 }))
  .map(([negative, units, places]) => {
    const digits = units.toString().padStart(places + 1, '0');
    const text = places ? `${digits.slice(0, -places)}.${digits.slice(-places)}` : digits;
    return negative && units !== 0n ? `-${text}` : text;
  });
// Values the engine meets: rounded quotients such as a cross rate or a pool per unit of goods.
const quotient = fc.tuple(fc.integer({ min: 1, max: 10_000_000 }), fc.integer({ min: 1, max: 10_000_000 })).map(([a, b]) => new Dec(a).div(b));
const operand = fc.oneof(decimalText.map((t) => new Dec(t).plus(0)), quotient);

describe('Dec40 is decimal.js at 40 significant digits, on BigInts', () => {
  it('sums and products round as decimal.js rounds them (fast-check)', () => {
    fc.assert(
      fc.property(operand, operand, operand, operand, (a, b, c, d) => {
        const ref = a.times(b).plus(c).times(d).plus(a);
        const got = Dec40.of(a).times(Dec40.of(b)).plus(Dec40.of(c)).times(Dec40.of(d)).plus(Dec40.of(a));
        // decimal.js prints a tiny negative as -0.000…; the engine's result text never does.
        expect(got.toFixed(12)).toBe(ref.toFixed(12).replace(/^-(0\.?0*)$/, '$1'));
        expect(got.toFixed(6)).toBe(moneyText(ref));
        expect(Dec40.of(ref).toFixed(40)).toBe(got.toFixed(40));
      }),
      { numRuns: 3000 },
    );
  });

  it('divides by a build quantity as decimal.js does, then prints per-unit text (fast-check)', () => {
    fc.assert(
      fc.property(operand, fc.integer({ min: 1, max: 10_000_000 }), (a, n) => {
        expect(Dec40.of(a).divToFixed(BigInt(n), 10)).toBe(perUnitText(a.div(n)));
      }),
      { numRuns: 3000 },
    );
  });

  it('rounds halves away from zero and never prints -0 (examples by hand)', () => {
    expect(Dec40.of(new Dec('2.345')).toFixed(2)).toBe('2.35');
    expect(Dec40.of(new Dec('-2.345')).toFixed(2)).toBe('-2.35');
    expect(Dec40.of(new Dec('-0.0004')).toFixed(3)).toBe('0.000');
    expect(Dec40.micros(1).toFixed(6)).toBe('0.000001');
    expect(Dec40.micros(12_345_678).toFixed(2)).toBe('12.35');
    // 2 ÷ 3 = 0.666…
    expect(Dec40.of(new Dec(2)).divToFixed(3n, 2)).toBe('0.67');
    // 41 nines round to 1 followed by 41 zeros at 40 digits, as decimal.js does.
    const nines = '9'.repeat(41);
    expect(Dec40.of(new Dec(nines)).plus(Dec40.ZERO.plus(Dec40.micros(0))).times(Dec40.of(new Dec(1))).toFixed(0)).toBe(new Dec(nines).times(1).toFixed(0));
  });
});
