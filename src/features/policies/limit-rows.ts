import type { PolicyLimit, PolicyLimits } from './api';

/** One fraction limit of a policy: where it sits in `limits`, and its name in words. */
export type LimitRow = { id: string; group: keyof PolicyLimits; key: string; groupLabel: string; label: string };

const row = (group: keyof PolicyLimits, key: string, groupLabel: string, label: string): LimitRow => ({ id: `${group}-${key}`, group, key, groupLabel, label });

/** Every fraction limit, in the order the derating rules list them. The junction temperature is set apart (a margin in °C). */
export const LIMIT_ROWS: readonly LimitRow[] = [
  row('capacitor', 'c0g', 'Capacitor voltage', 'C0G ceramic'),
  row('capacitor', 'x7r', 'Capacitor voltage', 'X7R ceramic'),
  row('capacitor', 'x5r', 'Capacitor voltage', 'X5R ceramic'),
  row('capacitor', 'y5v', 'Capacitor voltage', 'Y5V ceramic'),
  row('capacitor', 'hv_ceramic', 'Capacitor voltage', 'HV ceramic disc'),
  row('capacitor', 'film', 'Capacitor voltage', 'Film'),
  row('capacitor', 'al_electrolytic', 'Capacitor voltage', 'Aluminium electrolytic'),
  row('capacitor', 'tantalum', 'Capacitor voltage', 'Tantalum'),
  row('resistor', 'voltage', 'Resistor', 'Voltage, of min(√(P·R), LEV)'),
  row('resistor', 'power', 'Resistor', 'Power, of f(T)·P'),
  row('transistor', 'current', 'Transistor', 'Current'),
  row('transistor', 'voltage', 'Transistor', 'Voltage'),
  row('transistor', 'power', 'Transistor', 'Power'),
  row('diode', 'reverseVoltage', 'Diode', 'Reverse voltage'),
  row('diode', 'current', 'Diode', 'Forward current'),
  row('led', 'current', 'LED', 'Current'),
];

export function limitAt(limits: PolicyLimits, r: LimitRow): PolicyLimit | undefined {
  return (limits[r.group] as unknown as Record<string, PolicyLimit | undefined>)[r.key];
}

/** The confidence marks of the derating reference, in words. */
export const confidenceWords = { C: 'confirmed', M: 'from memory', P: 'common practice' } as const;
