import type { CheckName, Confidence, StressStatus } from './api';

/** The checks in words, as the stress check shows them. */
export const checkLabels: Record<CheckName, string> = {
  'capacitor.voltage': 'Capacitor voltage',
  'resistor.voltage': 'Resistor voltage',
  'resistor.power': 'Resistor power',
  'transistor.current': 'Transistor current',
  'transistor.voltage': 'Transistor voltage',
  'transistor.power': 'Transistor power',
  'transistor.junctionTemp': 'Junction temperature',
  'diode.reverseVoltage': 'Diode reverse voltage',
  'diode.current': 'Diode current',
  'led.current': 'LED current',
};

export function checkLabel(check: string): string {
  return (checkLabels as Record<string, string>)[check] ?? check;
}

/** Confidence marks of the derating reference in words. */
export const confidenceWords: Record<Confidence, string> = { C: 'confirmed', M: 'from memory', P: 'common practice' };

const operatingWords: Record<string, string> = {
  voltageV: 'working voltage',
  currentA: 'current',
  powerW: 'power',
  ambientC: 'ambient temperature',
};

const ratingWords: Record<string, string> = {
  ratedVoltageV: 'rated voltage',
  dielectric: 'dielectric',
  resistanceOhm: 'resistance',
  powerW: 'rated power',
  levV: 'limiting element voltage (LEV)',
  derateKneeC: 'derating knee temperature',
  zeroPowerC: 'zero-power temperature',
  icMaxA: 'Ic max',
  idMaxA: 'Id max',
  vceoMaxV: 'Vceo max',
  vdsMaxV: 'Vds max',
  pdMaxW: 'Pd max',
  tjMaxC: 'Tj max',
  rthJaCPerW: 'Rth(j-a)',
  vrrmV: 'Vrrm',
  ifAvA: 'If(av)',
  ifMaxA: 'If max',
};

export type MissingItem = { where: 'operating' | 'rating' | 'other'; text: string };

/**
 * What a check's `missing` paths mean to a designer: an operating value of the line,
 * or a rating of the part ("operatingPoint.voltageV" → working voltage of the line,
 * "ratings.levV" → the part's LEV). Unknown paths are shown as they are.
 */
export function describeMissing(path: string): MissingItem {
  const [head, rest = ''] = path.split('.', 2);
  const field = rest.split(' ')[0];
  if (head === 'operatingPoint') return { where: 'operating', text: operatingWords[field] ?? field };
  if (head === 'ratings') return { where: 'rating', text: ratingWords[field] ?? field };
  return { where: 'other', text: path };
}

/** The lines of a check's formula text, one step a line (the engine joins them with "; "). */
export function formulaSteps(formula: string): string[] {
  return formula
    .split(/\n|;\s+(?![^[]*\])/)
    .map((s) => s.trim().replace(/;\s*([CMP])\]$/, (_, mark: Confidence) => `; ${confidenceWords[mark]}]`))
    .filter(Boolean);
}

/** Statuses that pass the policy: the alternatives then look for cheaper parts. */
export function isPassing(status: StressStatus): boolean {
  return status === 'clear' || status === 'close';
}
