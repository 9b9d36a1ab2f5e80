import { z } from 'zod';
import { CAUTION_TEXT } from '../caution';
import { fmt, num, pct } from '../format';
import { statusOf } from '../status';
import type { StressStatus } from '../types';
import { finiteNumber, nonNegativeNumber, positiveNumber } from './fields';

/**
 * Steady-state junction temperature Tj = Ta + P·Rth(j-a), and the dissipation allowed at
 * an ambient for Tj,max and for an optional lower working limit. Rth(j-a) is the maker's
 * test-board figure; a small board in a sealed case can be much worse.
 */
export const junctionTempInputSchema = z
  .object({
    ambientC: finiteNumber('ambientC', '°C'),
    powerW: nonNegativeNumber('powerW', 'W'),
    rthJaCPerW: positiveNumber('rthJaCPerW', '°C/W'),
    tjMaxC: finiteNumber('tjMaxC', '°C'),
    tjLimitC: finiteNumber('tjLimitC', '°C').optional(),
  })
  .refine((d) => d.tjLimitC === undefined || d.tjLimitC <= d.tjMaxC, {
    error: 'tjLimitC must not be above tjMaxC',
    path: ['tjLimitC'],
  });
export type JunctionTempInput = z.input<typeof junctionTempInputSchema>;

export interface JunctionTempResult {
  tjC: number;
  riseC: number;
  /** (Tj,max − Ta)/Rth, zero when the ambient is at or above Tj,max. */
  allowedPowerW: number;
  /** (Tj,limit − Ta)/Rth when a limit is given. */
  allowedPowerAtLimitW: number | null;
  /** (Tj − Ta)/(Tj,max − Ta); null when Ta ≥ Tj,max. */
  ratio: number | null;
  /** (Tj,limit − Ta)/(Tj,max − Ta), or 1 without a limit. */
  limit: number | null;
  status: StressStatus;
  formula: string;
  caution: string;
}

export function computeJunctionTemp(raw: JunctionTempInput): JunctionTempResult {
  const { ambientC: ta, powerW: p, rthJaCPerW: rth, tjMaxC, tjLimitC } = junctionTempInputSchema.parse(raw);
  const riseC = p * rth;
  const tjC = ta + riseC;
  const allowedPowerW = Math.max(0, (tjMaxC - ta) / rth);
  const allowedPowerAtLimitW = tjLimitC === undefined ? null : Math.max(0, (tjLimitC - ta) / rth);
  const lines = [
    `Tj = Ta + P·Rth(j-a) = ${fmt(ta, '°C')} + ${fmt(p, 'W')} × ${num(rth)} °C/W = ${fmt(tjC, '°C')}`,
    `allowed P at Tj,max = (Tj,max − Ta) ÷ Rth = (${num(tjMaxC)} − ${num(ta)}) ÷ ${num(rth)} = ${fmt(allowedPowerW, 'W')}`,
  ];
  if (tjLimitC !== undefined && allowedPowerAtLimitW !== null) {
    lines.push(`allowed P at Tj,limit = (${num(tjLimitC)} − ${num(ta)}) ÷ ${num(rth)} = ${fmt(allowedPowerAtLimitW, 'W')}`);
  }
  const headroom = tjMaxC - ta;
  if (!(headroom > 0)) {
    lines.push('Ta ≥ Tj,max: no headroom for any dissipation');
    return { tjC, riseC, allowedPowerW, allowedPowerAtLimitW, ratio: null, limit: null, status: 'over_rating', formula: lines.join('\n'), caution: CAUTION_TEXT };
  }
  const ratio = riseC / headroom;
  const limit = tjLimitC === undefined ? 1 : (tjLimitC - ta) / headroom;
  lines.push(`ratio = (Tj − Ta) ÷ (Tj,max − Ta) = ${pct(ratio)}; limit = ${pct(limit)}`);
  return {
    tjC,
    riseC,
    allowedPowerW,
    allowedPowerAtLimitW,
    ratio,
    limit,
    status: statusOf(ratio, limit),
    formula: lines.join('\n'),
    caution: CAUTION_TEXT,
  };
}
