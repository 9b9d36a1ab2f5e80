import { z } from 'zod';
import { CAUTION_TEXT } from '../caution';
import { fmt, pct } from '../format';
import { statusOf } from '../status';
import type { Confidence, StressStatus } from '../types';
import { nonNegativeNumber, positiveNumber } from './fields';

/**
 * A capacitance reachable by touch, screened against the household-appliance limits of
 * IEC 60335-1 cl. 8.1.4 as the reference quotes them. Q = C·V and E = ½·C·V² are upper
 * bounds for what the standard's 2 kΩ discharge measurement would see.
 */

export type AccessibleBandId = 'not_live' | 'capacitance' | 'charge' | 'energy';

export interface AccessibleBand {
  id: AccessibleBandId;
  /** The band covers peak voltages above `aboveV` up to and including `upToV`. */
  aboveV: number;
  upToV: number;
  quantity: 'voltage' | 'capacitance' | 'charge' | 'energy';
  unit: 'V' | 'F' | 'C' | 'J';
  limit: number;
  text: string;
}

export const ACCESSIBLE_PART_SOURCE = { tag: '60335-1', clause: '8.1.4', confidence: 'C' as Confidence };

export const ACCESSIBLE_PART_BANDS: readonly AccessibleBand[] = [
  { id: 'not_live', aboveV: -Infinity, upToV: 42.4, quantity: 'voltage', unit: 'V', limit: 42.4, text: 'up to 42.4 V peak (SELV): not live' },
  { id: 'capacitance', aboveV: 42.4, upToV: 450, quantity: 'capacitance', unit: 'F', limit: 0.1e-6, text: 'above 42.4 V up to 450 V peak: capacitance at most 0.1 µF' },
  { id: 'charge', aboveV: 450, upToV: 15_000, quantity: 'charge', unit: 'C', limit: 45e-6, text: 'above 450 V up to 15 kV peak: discharge at most 45 µC' },
  { id: 'energy', aboveV: 15_000, upToV: Infinity, quantity: 'energy', unit: 'J', limit: 0.35, text: 'above 15 kV peak: discharge energy at most 350 mJ' },
];

export const accessiblePartInputSchema = z.object({
  capacitanceF: positiveNumber('capacitanceF', 'F'),
  /** Peak voltage on the part (a magnitude). */
  voltageV: nonNegativeNumber('voltageV', 'V (peak)'),
});
export type AccessiblePartInput = z.input<typeof accessiblePartInputSchema>;

export interface AccessiblePartResult {
  band: AccessibleBand;
  chargeC: number;
  energyJ: number;
  /** The quantity the band limits, in the band's unit. */
  applied: number;
  ratio: number;
  status: StressStatus;
  source: typeof ACCESSIBLE_PART_SOURCE;
  formula: string;
  caution: string;
}

export function accessibleBandFor(peakV: number): AccessibleBand {
  const band = ACCESSIBLE_PART_BANDS.find((b) => peakV > b.aboveV && peakV <= b.upToV);
  if (!band) throw new RangeError(`no band for ${peakV} V`);
  return band;
}

export function computeAccessiblePart(raw: AccessiblePartInput): AccessiblePartResult {
  const { capacitanceF: c, voltageV: v } = accessiblePartInputSchema.parse(raw);
  const chargeC = c * v;
  const energyJ = 0.5 * c * v * v;
  const band = accessibleBandFor(v);
  const applied = { voltage: v, capacitance: c, charge: chargeC, energy: energyJ }[band.quantity];
  // The standard's figure is the whole allowance: ratio above 1 fails, within 10 % of it is close.
  const ratio = applied / band.limit;
  const formula = [
    `band (IEC 60335-1 cl. 8.1.4): ${band.text}`,
    `Q = C·V = ${fmt(c, 'F')} × ${fmt(v, 'V')} = ${fmt(chargeC, 'C')}`,
    `E = ½·C·V² = ½ × ${fmt(c, 'F')} × (${fmt(v, 'V')})² = ${fmt(energyJ, 'J')}`,
    `ratio = ${band.quantity} ÷ limit = ${fmt(applied, band.unit)} ÷ ${fmt(band.limit, band.unit)} = ${pct(ratio)}`,
  ].join('\n');
  return {
    band,
    chargeC,
    energyJ,
    applied,
    ratio,
    status: statusOf(ratio, 1),
    source: ACCESSIBLE_PART_SOURCE,
    formula,
    caution: CAUTION_TEXT,
  };
}
