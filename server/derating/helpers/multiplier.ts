import { z } from 'zod';
import { CAUTION_TEXT } from '../caution';
import { fmt, num, pct } from '../format';
import { finiteNumber, fractionLimit, nonNegativeNumber, positiveNumber } from './fields';

/**
 * Half-wave Cockcroft-Walton / Greinacher multiplier with n stages of equal capacitors.
 * Conventions: vPeakV is the zero-to-peak input (√2·Vrms for a sine), f the drive
 * frequency, formulas with f·C (not 2π·f·C). Ideal diodes: no forward-drop term.
 */
export const multiplierInputSchema = z.object({
  stages: finiteNumber('stages', 'count')
    .int({ error: 'stages must be a whole number' })
    .min(1, { error: 'stages must be at least 1' })
    .max(200, { error: 'stages must be at most 200' }),
  vPeakV: positiveNumber('vPeakV', 'V'),
  loadCurrentA: nonNegativeNumber('loadCurrentA', 'A'),
  frequencyHz: positiveNumber('frequencyHz', 'Hz'),
  capacitanceF: positiveNumber('capacitanceF', 'F'),
  /** Optional allowed fraction of rating: each position then gets the smallest rating that meets it. */
  limit: fractionLimit('limit').optional(),
});
export type MultiplierInput = z.input<typeof multiplierInputSchema>;

export interface MultiplierPosition {
  /** C1…C2n, D1…D2n; C(2k−1) and D(2k−1) belong to stage k's input (oscillating) column. */
  position: string;
  kind: 'capacitor' | 'diode';
  stage: number;
  column?: 'oscillating' | 'smoothing';
  /** Written into the line's operating point: no-load voltage (and, for diodes, average current). */
  operatingPoint: { voltageV: number; currentA?: number };
  /** The smallest rating that keeps this position within `limit`; present when a limit is given. */
  minRatedV?: number;
}

export interface MultiplierResult {
  noLoadV: number;
  /** I/(f·C), the unit every load term scales with. */
  loadUnitV: number;
  ripplePeakToPeakV: number;
  dropV: number;
  /** No-load output minus the drop, never below zero. */
  loadedV: number;
  /** √(Vpk·f·C/I), the usual estimate; null with no load (more stages always give more). */
  optimumStages: number | null;
  /** The whole stage count giving the highest loaded output; null with no load. */
  bestWholeStages: number | null;
  positions: MultiplierPosition[];
  formula: string;
  warnings: string[];
  caution: string;
}

function dropFor(n: number, loadUnitV: number): number {
  return (loadUnitV / 6) * (4 * n ** 3 + 3 * n ** 2 - n);
}

export function computeMultiplier(raw: MultiplierInput): MultiplierResult {
  const { stages: n, vPeakV: vpk, loadCurrentA: i, frequencyHz: f, capacitanceF: c, limit } =
    multiplierInputSchema.parse(raw);
  const noLoadV = 2 * n * vpk;
  const loadUnitV = i / (f * c);
  const ripplePeakToPeakV = (loadUnitV * n * (n + 1)) / 2;
  const dropV = dropFor(n, loadUnitV);
  const warnings: string[] = [];
  if (dropV >= noLoadV) {
    warnings.push('The load drop reaches the no-load output: this multiplier cannot supply this current.');
  }
  const loadedV = Math.max(0, noLoadV - dropV);

  let optimumStages: number | null = null;
  let bestWholeStages: number | null = null;
  if (i > 0) {
    const k = (vpk * f * c) / i;
    optimumStages = Math.sqrt(k);
    // Loaded output is concave in n; its exact maximum solves 12n² + 6n − (1 + 12k) = 0.
    const exact = (-6 + Math.sqrt(36 + 48 * (1 + 12 * k))) / 24;
    const candidates = [Math.max(1, Math.floor(exact)), Math.max(1, Math.ceil(exact))];
    const loaded = (m: number) => 2 * m * vpk - dropFor(m, loadUnitV);
    bestWholeStages = loaded(candidates[1]) > loaded(candidates[0]) ? candidates[1] : candidates[0];
  }

  const positions: MultiplierPosition[] = [];
  const withLimit = (v: number) => (limit === undefined ? {} : { minRatedV: v / limit });
  for (let stage = 1; stage <= n; stage += 1) {
    const oscV = stage === 1 ? vpk : 2 * vpk;
    positions.push({ position: `C${2 * stage - 1}`, kind: 'capacitor', stage, column: 'oscillating', operatingPoint: { voltageV: oscV }, ...withLimit(oscV) });
    positions.push({ position: `C${2 * stage}`, kind: 'capacitor', stage, column: 'smoothing', operatingPoint: { voltageV: 2 * vpk }, ...withLimit(2 * vpk) });
  }
  for (let stage = 1; stage <= n; stage += 1) {
    for (const d of [2 * stage - 1, 2 * stage]) {
      // Charge balance: in steady state every diode passes the load's charge each cycle.
      positions.push({ position: `D${d}`, kind: 'diode', stage, operatingPoint: { voltageV: 2 * vpk, currentA: i }, ...withLimit(2 * vpk) });
    }
  }

  const formula = [
    `no-load output = 2·n·Vpk = 2 × ${n} × ${fmt(vpk, 'V')} = ${fmt(noLoadV, 'V')}`,
    `capacitor C1 sees Vpk = ${fmt(vpk, 'V')}; C2…C${2 * n} see 2·Vpk = ${fmt(2 * vpk, 'V')}; each diode 2·Vpk = ${fmt(2 * vpk, 'V')} reverse, average current I = ${fmt(i, 'A')}`,
    `I/(f·C) = ${fmt(i, 'A')} ÷ (${fmt(f, 'Hz')} × ${fmt(c, 'F')}) = ${fmt(loadUnitV, 'V')}`,
    `ripple (p-p) = I/(f·C) · n(n+1)/2 = ${fmt(loadUnitV, 'V')} × ${num((n * (n + 1)) / 2)} = ${fmt(ripplePeakToPeakV, 'V')}`,
    `drop = I/(6·f·C) · (4n³ + 3n² − n) = ${fmt(loadUnitV, 'V')} ÷ 6 × ${num(4 * n ** 3 + 3 * n ** 2 - n)} = ${fmt(dropV, 'V')}`,
    `loaded output = ${fmt(noLoadV, 'V')} − ${fmt(dropV, 'V')} = ${fmt(loadedV, 'V')}`,
    optimumStages === null
      ? 'optimum stages: none with no load'
      : `optimum n ≈ √(Vpk·f·C/I) = ${num(optimumStages)} (best whole number: ${bestWholeStages})`,
    ...(limit === undefined ? [] : [`minimum rating per position = stress ÷ ${pct(limit)}`]),
  ].join('\n');

  return {
    noLoadV,
    loadUnitV,
    ripplePeakToPeakV,
    dropV,
    loadedV,
    optimumStages,
    bestWholeStages,
    positions,
    formula,
    warnings,
    caution: CAUTION_TEXT,
  };
}
