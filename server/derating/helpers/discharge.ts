import { z } from 'zod';
import { CAUTION_TEXT } from '../caution';
import { fmt, num } from '../format';
import { statusOf } from '../status';
import type { Confidence, StressStatus } from '../types';
import { nonNegativeNumber, positiveNumber } from './fields';

/**
 * Bleeder discharge of a capacitor through a resistor: V(t) = V0·e^(−t/RC). Ideal parts;
 * dielectric absorption (voltage coming back after a discharge) is not modelled.
 */

export interface SafeVoltagePreset {
  id: string;
  label: string;
  safeV: number;
  /** The time the standard allows to get there, where it sets one. */
  deadlineS: number | null;
  sources: { tag: string; clause: string; confidence: Confidence; says: string }[];
}

/** The user picks the one that applies to the product; none is a universal "safe". */
export const SAFE_VOLTAGE_PRESETS: readonly SafeVoltagePreset[] = [
  {
    id: 'dc-60v-5s',
    label: '60 V DC within 5 s',
    safeV: 60,
    deadlineS: 5,
    sources: [
      { tag: '60204-1', clause: '6.2.4', confidence: 'C', says: 'live parts above 60 V fall to 60 V or less within 5 s of disconnection' },
      { tag: '62368-1', clause: 'Table 4 (ES1)', confidence: 'M', says: 'ES1 up to 60 V DC' },
    ],
  },
  {
    id: 'selv-42v4-peak',
    label: '42.4 V peak (SELV)',
    safeV: 42.4,
    deadlineS: null,
    sources: [
      { tag: '60335-1', clause: '8.1.4', confidence: 'C', says: 'an accessible part at SELV (≤ 42.4 V peak) is not live' },
    ],
  },
  {
    id: 'plug-34v-1s',
    label: '34 V at plug pins after 1 s',
    safeV: 34,
    deadlineS: 1,
    sources: [
      { tag: '60335-1', clause: '22.5', confidence: 'C', says: '1 s after unplugging at the peak, at most 34 V between the plug pins' },
    ],
  },
];

export const dischargeInputSchema = z
  .object({
    capacitanceF: positiveNumber('capacitanceF', 'F'),
    resistanceOhm: positiveNumber('resistanceOhm', 'Ω'),
    v0V: positiveNumber('v0V', 'V'),
    safeV: positiveNumber('safeV', 'V'),
    /** Optional: the time allowed to reach safeV. */
    deadlineS: positiveNumber('deadlineS', 's').optional(),
    /** Optional: a time at which to report the voltage. */
    atTimeS: nonNegativeNumber('atTimeS', 's').optional(),
  })
  .refine((d) => d.safeV < d.v0V, {
    error: 'safeV must be below v0V: a capacitor already at or below the safe voltage needs no discharge time',
    path: ['safeV'],
  });
export type DischargeInput = z.input<typeof dischargeInputSchema>;

export interface DischargeResult {
  tauS: number;
  timeToSafeS: number;
  /** Continuous dissipation of the bleeder at V0: V0²/R. */
  bleederPowerW: number;
  /** Stored charge C·V0 and energy ½·C·V0². */
  chargeC: number;
  energyJ: number;
  /** With a deadline: the largest R that meets it, the voltage at the deadline and the status of t/deadline. */
  deadline: {
    deadlineS: number;
    maxResistanceOhm: number;
    voltageAtDeadlineV: number;
    ratio: number;
    status: StressStatus;
  } | null;
  voltageAtTimeV: number | null;
  formula: string;
  caution: string;
}

export function voltageAfter(v0V: number, tauS: number, timeS: number): number {
  return v0V * Math.exp(-timeS / tauS);
}

export function computeDischarge(raw: DischargeInput): DischargeResult {
  const { capacitanceF: c, resistanceOhm: r, v0V, safeV, deadlineS, atTimeS } = dischargeInputSchema.parse(raw);
  const tauS = r * c;
  const lnRatio = Math.log(v0V / safeV);
  const timeToSafeS = tauS * lnRatio;
  const lines = [
    `τ = R·C = ${fmt(r, 'Ω')} × ${fmt(c, 'F')} = ${fmt(tauS, 's')}`,
    `t = R·C·ln(V0/Vsafe) = ${fmt(tauS, 's')} × ln(${fmt(v0V, 'V')} ÷ ${fmt(safeV, 'V')}) = ${fmt(timeToSafeS, 's')}`,
    `bleeder power at V0 = V0²/R = ${fmt((v0V * v0V) / r, 'W')}`,
  ];

  let deadline: DischargeResult['deadline'] = null;
  if (deadlineS !== undefined) {
    const maxResistanceOhm = deadlineS / (c * lnRatio);
    const voltageAtDeadlineV = voltageAfter(v0V, tauS, deadlineS);
    // A deadline is a hard line, not a rating with a margin policy: the limit is the whole of it.
    const ratio = timeToSafeS / deadlineS;
    deadline = { deadlineS, maxResistanceOhm, voltageAtDeadlineV, ratio, status: statusOf(ratio, 1) };
    lines.push(
      `largest R for ${fmt(deadlineS, 's')} = t ÷ (C·ln(V0/Vsafe)) = ${fmt(deadlineS, 's')} ÷ (${fmt(c, 'F')} × ${num(lnRatio)}) = ${fmt(maxResistanceOhm, 'Ω')}`,
      `V(${fmt(deadlineS, 's')}) = V0·e^(−t/τ) = ${fmt(voltageAtDeadlineV, 'V')}`,
    );
  }
  let voltageAtTimeV: number | null = null;
  if (atTimeS !== undefined) {
    voltageAtTimeV = voltageAfter(v0V, tauS, atTimeS);
    lines.push(`V(${fmt(atTimeS, 's')}) = V0·e^(−t/τ) = ${fmt(voltageAtTimeV, 'V')}`);
  }

  return {
    tauS,
    timeToSafeS,
    bleederPowerW: (v0V * v0V) / r,
    chargeC: c * v0V,
    energyJ: 0.5 * c * v0V * v0V,
    deadline,
    voltageAtTimeV,
    formula: lines.join('\n'),
    caution: CAUTION_TEXT,
  };
}
