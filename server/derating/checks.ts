import { fmt, num, pct } from './format';
import { allowedJunctionC, type PolicyLimit, type StressPolicy, type TjAllowed } from './policies';
import { DEFAULT_DERATE_KNEE_C, DEFAULT_ZERO_POWER_C, resistorPowerFactor } from './resistor-temperature';
import { resistorRatedVoltage } from './resistor-voltage';
import { statusOf } from './status';
import {
  DIELECTRICS,
  type BjtRatings,
  type CapacitorRatings,
  type CheckName,
  type CheckResult,
  type CheckedCategory,
  type DiodeRatings,
  type LedRatings,
  type Maybe,
  type MosfetRatings,
  type OperatingPoint,
  type ResistorRatings,
  type StressUnit,
} from './types';

/**
 * The stress checks of one part at its operating point. Each check either computes
 * applied, rated, ratio and status, or reports `needs_data` naming what is missing:
 * a missing or unusable input is never treated as a pass.
 */

/** Collects the inputs a check needs; anything absent or unusable is listed, never guessed. */
class Needs {
  readonly missing: string[] = [];
  private readonly notes: string[] = [];

  private reject(path: string, why: string): undefined {
    this.missing.push(path);
    this.notes.push(`${path} ${why}`);
    return undefined;
  }

  /** A rating: a finite number above zero. */
  positive(path: string, value: Maybe<number>): number | undefined {
    if (value === null || value === undefined) return this.reject(path, 'is missing');
    if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
      return this.reject(path, 'is not a number above 0');
    }
    return value;
  }

  /** An operating value: a finite number, zero or more. */
  nonNegative(path: string, value: Maybe<number>): number | undefined {
    if (value === null || value === undefined) return this.reject(path, 'is missing');
    if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
      return this.reject(path, 'is not a number of 0 or more');
    }
    return value;
  }

  /** A temperature: any finite number. */
  temperature(path: string, value: Maybe<number>): number | undefined {
    if (value === null || value === undefined) return this.reject(path, 'is missing');
    if (typeof value !== 'number' || !Number.isFinite(value)) return this.reject(path, 'is not a number');
    return value;
  }

  /** Records a problem found by a rule across several inputs. */
  problem(path: string, why: string): undefined {
    return this.reject(path, why);
  }

  get ok(): boolean {
    return this.missing.length === 0;
  }

  text(): string {
    return `needs data: ${this.notes.join('; ')}`;
  }
}

const AMBIENT_PATH = 'operatingPoint.ambientC (or the BOM ambientC)';

/** The operating point's ambient, else the BOM's; an unusable value on the line is not replaced. */
function ambientOf(op: OperatingPoint, bomAmbientC: Maybe<number>, needs: Needs): number | undefined {
  const own = op.ambientC;
  return needs.temperature(AMBIENT_PATH, own === null || own === undefined ? bomAmbientC : own);
}

function limitText(limit: PolicyLimit | TjAllowed): string {
  const tags = [limit.source, limit.confidence].filter(Boolean).join('; ');
  return tags ? ` [${tags}]` : '';
}

function limitSourceOf(limit: PolicyLimit | TjAllowed): CheckResult['limitSource'] {
  return { source: limit.source, confidence: limit.confidence };
}

interface Draft {
  check: CheckName;
  unit: StressUnit;
  limit: PolicyLimit;
}

function needsData(d: Draft, needs: Needs, known: { applied?: number; rated?: number } = {}): CheckResult {
  return {
    check: d.check,
    applied: known.applied ?? null,
    rated: known.rated ?? null,
    ratio: null,
    limit: d.limit.value,
    status: 'needs_data',
    unit: d.unit,
    formula: needs.text(),
    missing: [...needs.missing],
    limitSource: limitSourceOf(d.limit),
  };
}

/**
 * applied against rated with the policy's limit. A rating of zero at this operating point
 * (a resistor past its zero-power temperature, a transistor at or above Tj,max) allows no
 * stress at all: over_rating, with no ratio.
 */
function compare(d: Draft, applied: number, rated: number, steps: string[]): CheckResult {
  const base = { check: d.check, applied, rated, limit: d.limit.value, unit: d.unit, missing: [], limitSource: limitSourceOf(d.limit) };
  const limitLine = `limit = ${pct(d.limit.value)}${limitText(d.limit)}`;
  if (rated === 0) {
    return {
      ...base,
      ratio: null,
      status: 'over_rating',
      formula: [...steps, 'rated is 0 at this operating point: the part allows no stress here', limitLine].join('; '),
    };
  }
  const ratio = applied / rated;
  return {
    ...base,
    ratio,
    status: statusOf(ratio, d.limit.value),
    formula: [...steps, `ratio = ${fmt(applied, d.unit)} ÷ ${fmt(rated, d.unit)} = ${pct(ratio)}`, limitLine].join('; '),
  };
}

/** A plain "applied value against a rating" check (capacitor, transistor and diode V/I, LED). */
function simpleCheck(
  d: Draft,
  applied: { path: string; label: string; value: Maybe<number> },
  rated: { path: string; label: string; value: Maybe<number> },
): CheckResult {
  const needs = new Needs();
  const a = needs.nonNegative(applied.path, applied.value);
  const r = needs.positive(rated.path, rated.value);
  if (a === undefined || r === undefined) return needsData(d, needs, { applied: a, rated: r });
  return compare(d, a, r, [
    `applied = ${applied.label} = ${fmt(a, d.unit)}`,
    `rated = ${rated.label} = ${fmt(r, d.unit)}`,
  ]);
}

export function capacitorVoltage(r: CapacitorRatings, op: OperatingPoint, policy: StressPolicy): CheckResult {
  const dielectric = r.dielectric;
  const known = DIELECTRICS.find((x) => x === dielectric);
  if (!known) {
    // The limit depends on the dielectric, so without one there is nothing to compare to.
    const needs = new Needs();
    const applied = needs.nonNegative('operatingPoint.voltageV', op.voltageV);
    const rated = needs.positive('ratings.ratedVoltageV', r.ratedVoltageV);
    if (dielectric === null || dielectric === undefined) needs.problem('ratings.dielectric', 'is missing');
    else needs.problem('ratings.dielectric', `"${String(dielectric)}" is not one of ${DIELECTRICS.join(', ')}`);
    return {
      check: 'capacitor.voltage',
      applied: applied ?? null,
      rated: rated ?? null,
      ratio: null,
      limit: null,
      status: 'needs_data',
      unit: 'V',
      formula: needs.text(),
      missing: [...needs.missing],
      limitSource: null,
    };
  }
  return simpleCheck(
    { check: 'capacitor.voltage', unit: 'V', limit: policy.limits.capacitor[known] },
    { path: 'operatingPoint.voltageV', label: 'V (DC + AC peak)', value: op.voltageV },
    { path: 'ratings.ratedVoltageV', label: `V_rated (${known})`, value: r.ratedVoltageV },
  );
}

export function resistorVoltage(r: ResistorRatings, op: OperatingPoint, policy: StressPolicy): CheckResult {
  const d: Draft = { check: 'resistor.voltage', unit: 'V', limit: policy.limits.resistor.voltage };
  const needs = new Needs();
  const v = needs.nonNegative('operatingPoint.voltageV', op.voltageV);
  const p = needs.positive('ratings.powerW', r.powerW);
  const ohm = needs.positive('ratings.resistanceOhm', r.resistanceOhm);
  const lev = needs.positive('ratings.levV', r.levV);
  if (v === undefined || p === undefined || ohm === undefined || lev === undefined) {
    return needsData(d, needs, { applied: v });
  }
  const byPower = Math.sqrt(p * ohm);
  const rated = resistorRatedVoltage(p, ohm, lev);
  return compare(d, v, rated, [
    `applied = V = ${fmt(v, 'V')}`,
    `rated = min(√(P·R), LEV) = min(√(${fmt(p, 'W')} × ${fmt(ohm, 'Ω')}), ${fmt(lev, 'V')}) = min(${fmt(byPower, 'V')}, ${fmt(lev, 'V')}) = ${fmt(rated, 'V')}`,
  ]);
}

export function resistorPower(
  r: ResistorRatings,
  op: OperatingPoint,
  bomAmbientC: Maybe<number>,
  policy: StressPolicy,
): CheckResult {
  const d: Draft = { check: 'resistor.power', unit: 'W', limit: policy.limits.resistor.power };
  const needs = new Needs();

  // Applied power: as given, else from the voltage, else from the current (derating.md order).
  let applied: number | undefined;
  let appliedStep = '';
  if (op.powerW !== null && op.powerW !== undefined) {
    applied = needs.nonNegative('operatingPoint.powerW', op.powerW);
    if (applied !== undefined) appliedStep = `applied = P = ${fmt(applied, 'W')}`;
  } else if (op.voltageV !== null && op.voltageV !== undefined) {
    const v = needs.nonNegative('operatingPoint.voltageV', op.voltageV);
    const ohm = needs.positive('ratings.resistanceOhm', r.resistanceOhm);
    if (v !== undefined && ohm !== undefined) {
      applied = (v * v) / ohm;
      appliedStep = `applied = V²/R = (${fmt(v, 'V')})² ÷ ${fmt(ohm, 'Ω')} = ${fmt(applied, 'W')}`;
    }
  } else if (op.currentA !== null && op.currentA !== undefined) {
    const i = needs.nonNegative('operatingPoint.currentA', op.currentA);
    const ohm = needs.positive('ratings.resistanceOhm', r.resistanceOhm);
    if (i !== undefined && ohm !== undefined) {
      applied = i * i * ohm;
      appliedStep = `applied = I²·R = (${fmt(i, 'A')})² × ${fmt(ohm, 'Ω')} = ${fmt(applied, 'W')}`;
    }
  } else {
    needs.problem('operatingPoint.powerW', 'is missing (or give voltageV or currentA to derive it)');
  }

  const p70 = needs.positive('ratings.powerW', r.powerW);
  const ta = ambientOf(op, bomAmbientC, needs);
  const knee = r.derateKneeC ?? DEFAULT_DERATE_KNEE_C;
  const zero = r.zeroPowerC ?? DEFAULT_ZERO_POWER_C;
  const kneeOk = needs.temperature('ratings.derateKneeC', knee) !== undefined;
  const zeroOk = needs.temperature('ratings.zeroPowerC', zero) !== undefined;
  if (kneeOk && zeroOk && !(zero > knee)) {
    needs.problem('ratings.zeroPowerC', `(${fmt(zero, '°C')}) must be above derateKneeC (${fmt(knee, '°C')})`);
  }
  if (!needs.ok || applied === undefined || p70 === undefined || ta === undefined) {
    return needsData(d, needs, { applied });
  }

  const f = resistorPowerFactor(ta, knee, zero);
  const fStep =
    ta <= knee
      ? `f(${fmt(ta, '°C')}) = 1 (at or below the ${fmt(knee, '°C')} knee)`
      : ta >= zero
        ? `f(${fmt(ta, '°C')}) = 0 (at or above the ${fmt(zero, '°C')} zero-power point)`
        : `f(${fmt(ta, '°C')}) = (${num(zero)} − ${num(ta)}) ÷ (${num(zero)} − ${num(knee)}) = ${num(f)}`;
  const rated = p70 * f;
  return compare(d, applied, rated, [appliedStep, fStep, `rated = P·f(T) = ${fmt(p70, 'W')} × ${num(f)} = ${fmt(rated, 'W')}`]);
}

type AllRatings = ResistorRatings & CapacitorRatings & BjtRatings & MosfetRatings & DiodeRatings & LedRatings;
type TransistorKind = 'bjt' | 'mosfet';
type TransistorRatings = BjtRatings & MosfetRatings;

export function transistorCurrent(kind: TransistorKind, r: TransistorRatings, op: OperatingPoint, policy: StressPolicy): CheckResult {
  const rated =
    kind === 'bjt'
      ? { path: 'ratings.icMaxA', label: 'Ic,max', value: r.icMaxA }
      : { path: 'ratings.idMaxA', label: 'Id,max', value: r.idMaxA };
  return simpleCheck(
    { check: 'transistor.current', unit: 'A', limit: policy.limits.transistor.current },
    { path: 'operatingPoint.currentA', label: 'I', value: op.currentA },
    rated,
  );
}

export function transistorVoltage(kind: TransistorKind, r: TransistorRatings, op: OperatingPoint, policy: StressPolicy): CheckResult {
  const rated =
    kind === 'bjt'
      ? { path: 'ratings.vceoMaxV', label: 'Vceo,max', value: r.vceoMaxV }
      : { path: 'ratings.vdsMaxV', label: 'Vds,max', value: r.vdsMaxV };
  return simpleCheck(
    { check: 'transistor.voltage', unit: 'V', limit: policy.limits.transistor.voltage },
    { path: 'operatingPoint.voltageV', label: 'V', value: op.voltageV },
    rated,
  );
}

/** Tj,max must be above 25 °C for the linear power curve (it is zero-based at 25 °C). */
function tjMaxOf(r: TransistorRatings, needs: Needs): number | undefined {
  const tjMax = needs.temperature('ratings.tjMaxC', r.tjMaxC);
  if (tjMax !== undefined && !(tjMax > 25)) return needs.problem('ratings.tjMaxC', 'must be above 25 °C');
  return tjMax;
}

export function transistorPower(
  r: TransistorRatings,
  op: OperatingPoint,
  bomAmbientC: Maybe<number>,
  policy: StressPolicy,
): CheckResult {
  const d: Draft = { check: 'transistor.power', unit: 'W', limit: policy.limits.transistor.power };
  const needs = new Needs();
  const p = needs.nonNegative('operatingPoint.powerW', op.powerW);
  const pdMax = needs.positive('ratings.pdMaxW', r.pdMaxW);
  const tjMax = tjMaxOf(r, needs);
  const ta = ambientOf(op, bomAmbientC, needs);
  if (p === undefined || pdMax === undefined || tjMax === undefined || ta === undefined) {
    return needsData(d, needs, { applied: p });
  }
  const linear = (pdMax * (tjMax - ta)) / (tjMax - 25);
  const rated = Math.min(pdMax, Math.max(0, linear));
  const clampNote = linear > pdMax ? ', capped at Pd,max' : linear < 0 ? ', floored at 0' : '';
  return compare(d, p, rated, [
    `applied = P = ${fmt(p, 'W')}`,
    `rated = Pd,max × (Tj,max − Ta) ÷ (Tj,max − 25 °C) = ${fmt(pdMax, 'W')} × (${num(tjMax)} − ${num(ta)}) ÷ (${num(tjMax)} − 25) = ${fmt(rated, 'W')}${clampNote}`,
  ]);
}

export function transistorJunctionTemp(
  r: TransistorRatings,
  op: OperatingPoint,
  bomAmbientC: Maybe<number>,
  policy: StressPolicy,
): CheckResult {
  const tjPolicy = policy.limits.transistor.junctionTemp;
  const needs = new Needs();
  const p = needs.nonNegative('operatingPoint.powerW', op.powerW);
  const rth = needs.positive('ratings.rthJaCPerW', r.rthJaCPerW);
  const tjMax = needs.temperature('ratings.tjMaxC', r.tjMaxC);
  const ta = ambientOf(op, bomAmbientC, needs);
  const base = { check: 'transistor.junctionTemp' as const, unit: '°C' as const, limitSource: limitSourceOf(tjPolicy) };
  if (p === undefined || rth === undefined || tjMax === undefined || ta === undefined) {
    return {
      ...base,
      applied: null,
      rated: tjMax ?? null,
      ratio: null,
      limit: null,
      status: 'needs_data',
      formula: needs.text(),
      missing: [...needs.missing],
    };
  }
  const rise = p * rth;
  const tj = ta + rise;
  const tjAllowed = allowedJunctionC(tjMax, tjPolicy);
  const byMargin = `Tj,max − ${num(tjPolicy.marginC)} °C`;
  const allowedRule =
    tjPolicy.capC === null || tjPolicy.capC === undefined ? byMargin : `min(${byMargin}, ${fmt(tjPolicy.capC, '°C')})`;
  const steps = [
    `Tj = Ta + P·Rth(j-a) = ${fmt(ta, '°C')} + ${fmt(p, 'W')} × ${num(rth)} °C/W = ${fmt(tj, '°C')}`,
    `Tj,allowed = ${allowedRule} = ${fmt(tjAllowed, '°C')}${limitText(tjPolicy)}`,
  ];
  const headroom = tjMax - ta;
  if (!(headroom > 0)) {
    // Ambient at or above Tj,max: the part has no thermal headroom at all.
    return {
      ...base,
      applied: tj,
      rated: tjMax,
      ratio: null,
      limit: null,
      status: 'over_rating',
      formula: [...steps, `Ta ≥ Tj,max (${fmt(tjMax, '°C')}): no headroom for any dissipation`].join('; '),
      missing: [],
    };
  }
  // The rise is computed as P·Rth, not Tj − Ta, so no rounding creeps in through Ta.
  const ratio = rise / headroom;
  const limit = (tjAllowed - ta) / headroom;
  return {
    ...base,
    applied: tj,
    rated: tjMax,
    ratio,
    limit,
    status: statusOf(ratio, limit),
    formula: [
      ...steps,
      `ratio = (Tj − Ta) ÷ (Tj,max − Ta) = ${num(rise)} ÷ ${num(headroom)} = ${pct(ratio)}`,
      `limit = (Tj,allowed − Ta) ÷ (Tj,max − Ta) = ${num(tjAllowed - ta)} ÷ ${num(headroom)} = ${pct(limit)}`,
    ].join('; '),
    missing: [],
  };
}

export function diodeReverseVoltage(r: DiodeRatings, op: OperatingPoint, policy: StressPolicy): CheckResult {
  return simpleCheck(
    { check: 'diode.reverseVoltage', unit: 'V', limit: policy.limits.diode.reverseVoltage },
    { path: 'operatingPoint.voltageV', label: 'V_R', value: op.voltageV },
    { path: 'ratings.vrrmV', label: 'V_RRM', value: r.vrrmV },
  );
}

export function diodeCurrent(r: DiodeRatings, op: OperatingPoint, policy: StressPolicy): CheckResult {
  return simpleCheck(
    { check: 'diode.current', unit: 'A', limit: policy.limits.diode.current },
    { path: 'operatingPoint.currentA', label: 'I_F', value: op.currentA },
    { path: 'ratings.ifAvA', label: 'I_F(AV)', value: r.ifAvA },
  );
}

export function ledCurrent(r: LedRatings, op: OperatingPoint, policy: StressPolicy): CheckResult {
  return simpleCheck(
    { check: 'led.current', unit: 'A', limit: policy.limits.led.current },
    { path: 'operatingPoint.currentA', label: 'I_F', value: op.currentA },
    { path: 'ratings.ifMaxA', label: 'I_F,max', value: r.ifMaxA },
  );
}

/** Every check of one part's category, in a fixed order. */
export function checksFor(
  category: CheckedCategory,
  ratings: Maybe<object>,
  operatingPoint: Maybe<OperatingPoint>,
  bomAmbientC: Maybe<number>,
  policy: StressPolicy,
): CheckResult[] {
  // Ratings arrive as stored for the part; each check reads only its category's fields
  // and treats anything absent or of the wrong type as missing.
  const r = (ratings ?? {}) as AllRatings;
  const op = operatingPoint ?? {};
  switch (category) {
    case 'capacitor':
      return [capacitorVoltage(r, op, policy)];
    case 'resistor':
      return [resistorVoltage(r, op, policy), resistorPower(r, op, bomAmbientC, policy)];
    case 'bjt':
    case 'mosfet':
      return [
        transistorCurrent(category, r, op, policy),
        transistorVoltage(category, r, op, policy),
        transistorPower(r, op, bomAmbientC, policy),
        transistorJunctionTemp(r, op, bomAmbientC, policy),
      ];
    case 'diode':
      return [diodeReverseVoltage(r, op, policy), diodeCurrent(r, op, policy)];
    case 'led':
      return [ledCurrent(r, op, policy)];
  }
}
