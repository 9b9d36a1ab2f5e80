import { z } from 'zod';
import { parseValue, type Quantity } from '../../shared/units';

/**
 * The helpers' form fields as typed, read into the numbers the API takes. Electrical
 * values go through the shared value parser (2kV, 1n, 22M, 50kHz, 700mA); percentages,
 * times and thermal resistances take a number with an optional unit.
 */

const text = z.string();
const NUMBER = String.raw`(\d+(?:\.\d*)?|\.\d+)(?:[eE]([-+]?\d+))?`;

/** Reads one value with the shared parser; its message names what is wrong with the text. */
function readValue(q: Quantity) {
  return (input: string, ctx: z.RefinementCtx): number => {
    const result = parseValue(input, q);
    if (!result.ok) {
      ctx.addIssue({ code: 'custom', message: result.message });
      return z.NEVER;
    }
    return result.value;
  };
}

/** A required electrical value in the trade's notation. */
export const quantity = (q: Quantity) => text.trim().min(1, 'is required').transform(readValue(q));

/** The same, optional: an empty box is left out. */
export const optionalQuantity = (q: Quantity) => text.transform((s, ctx) => (s.trim() === '' ? undefined : readValue(q)(s, ctx)));

function numberWithUnit(units: Record<string, number>, message: string) {
  const re = new RegExp(`^${NUMBER}\\s*(${Object.keys(units).map((u) => u.replace(/[/.*+?^${}()|[\]\\]/g, '\\$&')).join('|')})?$`);
  return (input: string, ctx: z.RefinementCtx): number => {
    const m = re.exec(input.trim().normalize('NFKC'));
    if (!m) {
      ctx.addIssue({ code: 'custom', message });
      return z.NEVER;
    }
    const value = Number(`${m[1]}e${m[2] ?? 0}`) * (m[3] ? units[m[3]] : 1);
    if (!Number.isFinite(value)) {
      ctx.addIssue({ code: 'custom', message });
      return z.NEVER;
    }
    return value;
  };
}

/** A percentage as typed ("80", "80 %", "5%"), as a number of percent. */
export const percent = text.trim().min(1, 'is required').transform(numberWithUnit({ '%': 1 }, 'must be a percentage such as 80 or 80 %'));

/** A percentage as typed, as a fraction (80 % → 0.8), for the policy limit fields. */
export const percentAsFraction = percent.transform((p) => Number((p / 100).toFixed(8)));

export const optionalPercentAsFraction = text
  .transform((s) => (s.trim() === '' ? undefined : s))
  .pipe(percentAsFraction.optional());

const seconds = numberWithUnit({ s: 1, ms: 1e-3, min: 60 }, 'must be a time such as 5, 5 s or 500 ms');

/** A time as typed ("5", "5 s", "500 ms", "1 min"), in seconds; optional. */
export const optionalSeconds = text.transform((s, ctx) => (s.trim() === '' ? undefined : seconds(s, ctx)));

/** A thermal resistance as typed ("250", "250 °C/W", "250 K/W"), in °C/W. */
export const thermalResistance = text
  .trim()
  .min(1, 'is required')
  .transform(numberWithUnit({ '°C/W': 1, 'C/W': 1, 'K/W': 1 }, 'must be a thermal resistance such as 250 or 250 °C/W'));

/** A whole count of stages. */
export const stageCount = text
  .trim()
  .min(1, 'is required')
  .transform((s, ctx) => {
    if (!/^\d+$/.test(s)) {
      ctx.addIssue({ code: 'custom', message: 'must be a whole number of stages' });
      return z.NEVER;
    }
    return Number(s);
  });

export const multiplierForm = z.object({
  stages: stageCount,
  vPeakV: quantity('voltage'),
  loadCurrentA: quantity('current'),
  frequencyHz: quantity('frequency'),
  capacitanceF: quantity('capacitance'),
  limit: optionalPercentAsFraction,
});
export type MultiplierFormValues = z.input<typeof multiplierForm>;

export const resistorStringForm = z.object({
  totalV: quantity('voltage'),
  resistanceOhm: quantity('resistance'),
  powerW: quantity('power'),
  levV: quantity('voltage'),
  tolerancePct: percent,
  limit: percentAsFraction,
});
export type ResistorStringFormValues = z.input<typeof resistorStringForm>;

export const dischargeForm = z.object({
  capacitanceF: quantity('capacitance'),
  resistanceOhm: quantity('resistance'),
  v0V: quantity('voltage'),
  safeV: quantity('voltage'),
  deadlineS: optionalSeconds,
});
export type DischargeFormValues = z.input<typeof dischargeForm>;

export const accessiblePartForm = z.object({
  capacitanceF: quantity('capacitance'),
  voltageV: quantity('voltage'),
});
export type AccessiblePartFormValues = z.input<typeof accessiblePartForm>;

export const junctionTempForm = z.object({
  ambientC: quantity('temperature'),
  powerW: quantity('power'),
  rthJaCPerW: thermalResistance,
  tjMaxC: quantity('temperature'),
  tjLimitC: optionalQuantity('temperature'),
});
export type JunctionTempFormValues = z.input<typeof junctionTempForm>;

/** A fraction as the percentage a form shows: 0.7 → "70" (never 70.00000000000001). */
export function fractionToPercentText(fraction: number): string {
  return String(Number((fraction * 100).toFixed(6)));
}
