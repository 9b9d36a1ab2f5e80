/**
 * A resistor's continuous voltage rating: the power-implied voltage √(P·R) (IEC 60115-1
 * rated voltage), never above the limiting element voltage.
 */
export function resistorRatedVoltage(powerW: number, resistanceOhm: number, levV: number): number {
  return Math.min(Math.sqrt(powerW * resistanceOhm), levV);
}

/** LEV²/P: above this resistance the part is voltage-limited, below it power-limited. */
export function criticalResistanceOhm(levV: number, powerW: number): number {
  return (levV * levV) / powerW;
}
