/** Defaults of the common thick-film / carbon / metal-film power curve (70 °C knee, zero at 155 °C). */
export const DEFAULT_DERATE_KNEE_C = 70;
export const DEFAULT_ZERO_POWER_C = 155;

/**
 * Fraction of rated power a resistor may dissipate at ambient `ambientC`: 1 up to the
 * knee, falling linearly to 0 at the zero-power point, 0 beyond it.
 * Callers must pass zeroPowerC > derateKneeC.
 */
export function resistorPowerFactor(
  ambientC: number,
  derateKneeC: number = DEFAULT_DERATE_KNEE_C,
  zeroPowerC: number = DEFAULT_ZERO_POWER_C,
): number {
  if (!(zeroPowerC > derateKneeC)) {
    throw new RangeError(`zeroPowerC (${zeroPowerC} °C) must be above derateKneeC (${derateKneeC} °C)`);
  }
  if (ambientC <= derateKneeC) return 1;
  if (ambientC >= zeroPowerC) return 0;
  return (zeroPowerC - ambientC) / (zeroPowerC - derateKneeC);
}
