/**
 * Shapes the derating engine reads and returns. Field names follow the public API
 * (part ratings by category, a BOM line's operating point, the stress check response).
 * Every rating and operating value may be missing: the engine reports `needs_data`
 * for the checks that need it instead of guessing.
 */

export type Maybe<T> = T | null | undefined;

export const DIELECTRICS = [
  'c0g',
  'x7r',
  'x5r',
  'y5v',
  'hv_ceramic',
  'film',
  'al_electrolytic',
  'tantalum',
] as const;
export type Dielectric = (typeof DIELECTRICS)[number];

export interface ResistorRatings {
  resistanceOhm?: Maybe<number>;
  /** Rated dissipation at the knee temperature (P70 for most parts). */
  powerW?: Maybe<number>;
  /** Limiting element voltage (the maker's maximum working voltage). */
  levV?: Maybe<number>;
  tolerancePct?: Maybe<number>;
  /** Ambient up to which full power is allowed; 70 °C when missing. */
  derateKneeC?: Maybe<number>;
  /** Ambient at which allowed power reaches zero; 155 °C when missing. */
  zeroPowerC?: Maybe<number>;
}

export interface CapacitorRatings {
  capacitanceF?: Maybe<number>;
  ratedVoltageV?: Maybe<number>;
  dielectric?: Maybe<Dielectric>;
}

export interface BjtRatings {
  icMaxA?: Maybe<number>;
  vceoMaxV?: Maybe<number>;
  pdMaxW?: Maybe<number>;
  tjMaxC?: Maybe<number>;
  rthJaCPerW?: Maybe<number>;
}

export interface MosfetRatings {
  idMaxA?: Maybe<number>;
  vdsMaxV?: Maybe<number>;
  pdMaxW?: Maybe<number>;
  tjMaxC?: Maybe<number>;
  rthJaCPerW?: Maybe<number>;
}

export interface DiodeRatings {
  vrrmV?: Maybe<number>;
  ifAvA?: Maybe<number>;
  tjMaxC?: Maybe<number>;
}

export interface LedRatings {
  ifMaxA?: Maybe<number>;
  vfV?: Maybe<number>;
}

export interface RatingsByCategory {
  resistor: ResistorRatings;
  capacitor: CapacitorRatings;
  bjt: BjtRatings;
  mosfet: MosfetRatings;
  diode: DiodeRatings;
  led: LedRatings;
}

/** The part categories that have stress checks; lines of other categories are not listed. */
export const CHECKED_CATEGORIES = ['resistor', 'capacitor', 'bjt', 'mosfet', 'diode', 'led'] as const;
export type CheckedCategory = (typeof CHECKED_CATEGORIES)[number];

export type AnyRatings =
  | ResistorRatings
  | CapacitorRatings
  | BjtRatings
  | MosfetRatings
  | DiodeRatings
  | LedRatings;

/**
 * A BOM line's operating point. `voltageV` is the worst-case highest voltage across the
 * part (DC plus AC peak, start-up overshoot), `currentA` the highest continuous current,
 * `powerW` its dissipation, `ambientC` the air around it (the BOM's ambient when missing).
 */
export interface OperatingPoint {
  voltageV?: Maybe<number>;
  currentA?: Maybe<number>;
  powerW?: Maybe<number>;
  ambientC?: Maybe<number>;
}

export const STRESS_STATUSES = ['clear', 'close', 'beyond_policy', 'over_rating', 'needs_data'] as const;
export type StressStatus = (typeof STRESS_STATUSES)[number];

export const CHECK_NAMES = [
  'capacitor.voltage',
  'resistor.voltage',
  'resistor.power',
  'transistor.current',
  'transistor.voltage',
  'transistor.power',
  'transistor.junctionTemp',
  'diode.reverseVoltage',
  'diode.current',
  'led.current',
] as const;
export type CheckName = (typeof CHECK_NAMES)[number];

export type StressUnit = 'V' | 'A' | 'W' | '°C';

/** Where a number came from, as marked in the derating reference: confirmed, from memory, common practice. */
export type Confidence = 'C' | 'M' | 'P';

export interface CheckResult {
  check: CheckName;
  /** The stress applied, in `unit`; null when it cannot be worked out. */
  applied: number | null;
  /** The part's rating at this operating point, in `unit`. */
  rated: number | null;
  /**
   * applied / rated (for the junction temperature: rise over headroom). Null when an
   * input is missing, or when the rating at this ambient is zero (status over_rating).
   */
  ratio: number | null;
  /** The policy's allowed fraction of the rating. */
  limit: number | null;
  status: StressStatus;
  unit: StressUnit;
  /** How the numbers were got, in words and figures (shown to users on hover). */
  formula: string;
  /** Inputs that were missing or unusable (e.g. `ratings.levV`, `operatingPoint.voltageV`). */
  missing: string[];
  /** Where the policy's limit comes from. */
  limitSource: { source?: string; confidence?: Confidence } | null;
}
