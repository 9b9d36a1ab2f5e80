/** The derating engine: pure stress checks of parts at their operating points, and circuit helpers. */
export * from './types';
export * from './status';
export * from './format';
export * from './resistor-temperature';
export * from './resistor-voltage';
export * from './policies';
export * from './checks';
export * from './stress-check';
export * from './caution';
export * from './helpers/multiplier';
export * from './helpers/resistor-string';
export * from './helpers/discharge';
export * from './helpers/accessible-part';
export * from './helpers/junction-temp';
