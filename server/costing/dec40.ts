import type { Dec } from './decimal';

/*
 * decimal.js's arithmetic as the engine sets it up (40 significant digits, half-up), on a
 * BigInt and a count of decimal places (value = units / 10^places): for the figures of each
 * line of a large cost roll, several times cheaper than decimal.js objects. Each sum and
 * product is computed exactly and then rounded to 40 significant digits as decimal.js
 * rounds it, so a chain of operations gives decimal.js's value digit for digit (a property
 * test holds the two together), and printing rounds half-up as `moneyText` does.
 */

const PRECISION = 40;
const POW10: bigint[] = [1n];
function pow10(n: number): bigint {
  while (POW10.length <= n) POW10.push(POW10[POW10.length - 1] * 10n);
  return POW10[n];
}
const LIMIT = pow10(PRECISION);

/** Decimal digits of x ≥ 10^40, by comparing with powers of ten (cheaper than printing x). */
function digitsAbove(x: bigint): number {
  let d = PRECISION + 1;
  while (x >= pow10(d + 8)) d += 8;
  while (x >= pow10(d)) d++;
  return d;
}

const HALVES: bigint[] = [0n];
/** Half of 10^k (k ≥ 1). */
function half(k: number): bigint {
  while (HALVES.length <= k) HALVES.push(5n * pow10(HALVES.length - 1));
  return HALVES[k];
}

/** |x| / 10^k rounded half-up (away from zero) to a whole number; k ≥ 1. */
function shiftHalfUp(abs: bigint, k: number): bigint {
  return (abs + half(k)) / pow10(k);
}

export class Dec40 {
  static readonly ZERO = new Dec40(0n, 0);

  private constructor(
    readonly units: bigint,
    readonly places: number,
  ) {}

  /** A result rounded to 40 significant digits, as decimal.js rounds every result. */
  private static rounded(units: bigint, places: number): Dec40 {
    const negative = units < 0n;
    const abs = negative ? -units : units;
    if (abs < LIMIT) return new Dec40(units, places);
    const drop = digitsAbove(abs) - PRECISION;
    let q = shiftHalfUp(abs, drop);
    let p = places - drop;
    if (p < 0) {
      q *= pow10(-p);
      p = 0;
    }
    return new Dec40(negative ? -q : q, p);
  }

  /** A whole number of millionths (a 6-decimal price, a goods value in micros). */
  static micros(n: number | bigint): Dec40 {
    return Dec40.rounded(BigInt(n), 6);
  }

  /** The value of an engine decimal, digit for digit. */
  static of(d: Dec): Dec40 {
    const text = d.toFixed();
    const point = text.indexOf('.');
    return point < 0 ? new Dec40(BigInt(text), 0) : new Dec40(BigInt(text.slice(0, point) + text.slice(point + 1)), text.length - point - 1);
  }

  isZero(): boolean {
    return this.units === 0n;
  }

  times(b: Dec40): Dec40 {
    if (this.units === 0n || b.units === 0n) return Dec40.ZERO;
    return Dec40.rounded(this.units * b.units, this.places + b.places);
  }

  plus(b: Dec40): Dec40 {
    if (b.units === 0n) return this;
    if (this.units === 0n) return b;
    if (this.places === b.places) return Dec40.rounded(this.units + b.units, this.places);
    return this.places > b.places
      ? Dec40.rounded(this.units + b.units * pow10(this.places - b.places), this.places)
      : Dec40.rounded(this.units * pow10(b.places - this.places) + b.units, b.places);
  }

  /** Printed with `dp` decimals, rounded half-up (away from zero); never "-0.00". */
  toFixed(dp: number): string {
    const negative = this.units < 0n;
    const abs = negative ? -this.units : this.units;
    const q = this.places <= dp ? abs * pow10(dp - this.places) : shiftHalfUp(abs, this.places - dp);
    return fixedText(negative, q, dp);
  }

  /**
   * This ÷ a whole number n ≥ 1 as decimal.js divides (the quotient rounded to 40
   * significant digits), printed with `dp` decimals.
   */
  divToFixed(n: bigint, dp: number): string {
    if (this.units === 0n) return fixedText(false, 0n, dp);
    const negative = this.units < 0n;
    const abs = negative ? -this.units : this.units;
    // Enough places that the whole quotient has more than 40 digits.
    const extra = PRECISION + 2 + n.toString().length;
    const num = abs * pow10(extra);
    let q = num / n;
    const rest = num % n;
    const drop = q.toString().length - PRECISION;
    let places = this.places + extra;
    if (drop > 0) {
      const d = pow10(drop);
      const low = q % d;
      q /= d;
      // Round up when the dropped part (low + rest / n) is at least half of d.
      if (2n * (low * n + rest) >= d * n) q += 1n;
      places -= drop;
    }
    const out = places <= dp ? q * pow10(dp - places) : shiftHalfUp(q, places - dp);
    return fixedText(negative, out, dp);
  }
}

/** A whole number of 10^-dp units as plain text with dp decimals; a zero never has a sign. */
function fixedText(negative: boolean, q: bigint, dp: number): string {
  let digits = q.toString();
  if (dp > 0) {
    if (digits.length <= dp) digits = '0'.repeat(dp - digits.length + 1) + digits;
    digits = `${digits.slice(0, -dp)}.${digits.slice(-dp)}`;
  }
  return negative && q !== 0n ? `-${digits}` : digits;
}
