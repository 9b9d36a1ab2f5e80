import { z } from 'zod';
import { CAUTION_TEXT } from '../caution';
import { fmt, num, pct } from '../format';
import { criticalResistanceOhm, resistorRatedVoltage } from '../resistor-voltage';
import { exceeds, statusOf } from '../status';
import type { StressStatus } from '../types';
import { finiteNumber, fractionLimit, positiveNumber } from './fields';

/**
 * The fewest equal resistors in series across totalV so that each stays within the
 * policy's voltage limit of its rated voltage min(√(P·R), LEV), in the worst tolerance
 * case: one resistor at +t, the rest at −t.
 */
export const resistorStringInputSchema = z.object({
  totalV: positiveNumber('totalV', 'V'),
  resistanceOhm: positiveNumber('resistanceOhm', 'Ω'),
  powerW: positiveNumber('powerW', 'W'),
  levV: positiveNumber('levV', 'V'),
  tolerancePct: finiteNumber('tolerancePct', '%')
    .min(0, { error: 'tolerancePct must be 0 % or more' })
    .lt(100, { error: 'tolerancePct must be below 100 %' }),
  limit: fractionLimit('limit'),
});
export type ResistorStringInput = z.input<typeof resistorStringInputSchema>;

export interface ResistorStringResult {
  count: number;
  /** min(√(P·R), LEV) of each resistor. */
  ratedEachV: number;
  /** LEV²/P: above it the part is voltage-limited, below it power-limited. */
  criticalResistanceOhm: number;
  nominalEachV: number;
  /** The voltage on the resistor at +t while the rest sit at −t. */
  worstEachV: number;
  ratio: number;
  limit: number;
  status: StressStatus;
  /** Nominal string current V/(n·R). */
  stringCurrentA: number;
  nominalPowerEachW: number;
  /** Dissipation of the resistor at +t in the worst case. */
  worstPowerW: number;
  /** worstPowerW as a fraction of the rated power (before any temperature derating). */
  worstPowerRatio: number;
  /** Worst-case figures to write into each resistor line's operating point. */
  operatingPoint: { voltageV: number; currentA: number; powerW: number };
  formula: string;
  caution: string;
}

/** Worst-case share of `totalV` across one of n resistors with fractional tolerance t. */
export function worstShareV(totalV: number, n: number, t: number): number {
  return (totalV * (1 + t)) / (1 + t + (n - 1) * (1 - t));
}

export function computeResistorString(raw: ResistorStringInput): ResistorStringResult {
  const { totalV, resistanceOhm: r, powerW: p, levV, tolerancePct, limit } = resistorStringInputSchema.parse(raw);
  const t = tolerancePct / 100;
  const byPower = Math.sqrt(p * r);
  const ratedEachV = resistorRatedVoltage(p, r, levV);
  const allowedV = limit * ratedEachV;
  const passes = (n: number) => !exceeds(worstShareV(totalV, n, t) / ratedEachV, limit);

  // Closed-form estimate from V(1+t)/((1+t)+(n−1)(1−t)) ≤ limit·rated, then settle it
  // with the same comparison the status uses so rounding cannot pick a wrong neighbour.
  let n = Math.max(1, Math.ceil(1 + ((totalV * (1 + t)) / allowedV - (1 + t)) / (1 - t)));
  while (n > 1 && passes(n - 1)) n -= 1;
  while (!passes(n)) n += 1;

  const worstEachV = worstShareV(totalV, n, t);
  const ratio = worstEachV / ratedEachV;
  const nominalEachV = totalV / n;
  const stringCurrentA = totalV / (n * r);
  const worstPowerW = (worstEachV * worstEachV) / (r * (1 + t));
  const worstCurrentA = totalV / (r * (1 + t + (n - 1) * (1 - t)));

  const formula = [
    `rated per resistor = min(√(P·R), LEV) = min(√(${fmt(p, 'W')} × ${fmt(r, 'Ω')}), ${fmt(levV, 'V')}) = min(${fmt(byPower, 'V')}, ${fmt(levV, 'V')}) = ${fmt(ratedEachV, 'V')}`,
    `allowed per resistor = ${pct(limit)} × ${fmt(ratedEachV, 'V')} = ${fmt(allowedV, 'V')}`,
    `worst case (one at +${num(tolerancePct)} %, the rest at −${num(tolerancePct)} %): V·(1+t) ÷ ((1+t) + (n−1)(1−t)) = ${fmt(totalV, 'V')} × ${num(1 + t)} ÷ (${num(1 + t)} + ${n - 1} × ${num(1 - t)}) = ${fmt(worstEachV, 'V')}`,
    `fewest resistors n = ${n} (ratio ${pct(ratio)}${n > 1 ? `; n = ${n - 1} gives ${pct(worstShareV(totalV, n - 1, t) / ratedEachV)}` : ''})`,
    `string current = V ÷ (n·R) = ${fmt(totalV, 'V')} ÷ (${n} × ${fmt(r, 'Ω')}) = ${fmt(stringCurrentA, 'A')}`,
    `power each = (V/n)² ÷ R = ${fmt((nominalEachV * nominalEachV) / r, 'W')}; worst = V_worst² ÷ (R·(1+t)) = ${fmt(worstPowerW, 'W')} (${pct(worstPowerW / p)} of ${fmt(p, 'W')})`,
  ].join('\n');

  return {
    count: n,
    ratedEachV,
    criticalResistanceOhm: criticalResistanceOhm(levV, p),
    nominalEachV,
    worstEachV,
    ratio,
    limit,
    status: statusOf(ratio, limit),
    stringCurrentA,
    nominalPowerEachW: (nominalEachV * nominalEachV) / r,
    worstPowerW,
    worstPowerRatio: worstPowerW / p,
    operatingPoint: { voltageV: worstEachV, currentA: worstCurrentA, powerW: worstPowerW },
    formula,
    caution: CAUTION_TEXT,
  };
}
