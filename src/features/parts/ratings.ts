import { formatValue, parseValue, type Quantity } from '../../shared/units';
import { dielectrics, isRated, parseRatings } from '../../shared/schemas/parts';
import type { PartCategory } from '../../shared/schemas/trade';

/**
 * One rating field of a category. `quantity` fields take the trade's notations ("4K7",
 * "2kV", "1/4W") and are stored in base units; `number` fields are plain numbers with
 * the unit in their label; `dielectric` is a choice.
 */
export type RatingDef =
  | { key: string; label: string; kind: 'quantity'; quantity: Quantity; placeholder: string }
  | { key: string; label: string; kind: 'number'; unit: string; placeholder: string }
  | { key: string; label: string; kind: 'dielectric' };

const q = (key: string, label: string, quantity: Quantity, placeholder: string): RatingDef => ({ key, label, kind: 'quantity', quantity, placeholder });
const n = (key: string, label: string, unit: string, placeholder: string): RatingDef => ({ key, label, kind: 'number', unit, placeholder });

const tj = q('tjMaxC', 'Max junction temperature', 'temperature', '150°C');
const rth = n('rthJaCPerW', 'Thermal resistance junction–ambient (°C/W)', '°C/W', '250');

/** The rating fields of each rated category, in the order a datasheet lists them. */
export const ratingFields: Record<string, readonly RatingDef[]> = {
  resistor: [
    q('resistanceOhm', 'Resistance', 'resistance', '4K7'),
    q('powerW', 'Rated power', 'power', '1/4W'),
    q('levV', 'Limiting element voltage', 'voltage', '200V'),
    n('tolerancePct', 'Tolerance (%)', '%', '1'),
    q('derateKneeC', 'Derating knee', 'temperature', '70°C'),
    q('zeroPowerC', 'Zero-power temperature', 'temperature', '155°C'),
  ],
  capacitor: [
    q('capacitanceF', 'Capacitance', 'capacitance', '2n2'),
    q('ratedVoltageV', 'Rated voltage', 'voltage', '2kV'),
    { key: 'dielectric', label: 'Dielectric', kind: 'dielectric' },
  ],
  bjt: [
    q('icMaxA', 'Max collector current', 'current', '500mA'),
    q('vceoMaxV', 'Max collector–emitter voltage', 'voltage', '40V'),
    q('pdMaxW', 'Max power dissipation', 'power', '625mW'),
    tj,
    rth,
  ],
  mosfet: [
    q('idMaxA', 'Max drain current', 'current', '5A'),
    q('vdsMaxV', 'Max drain–source voltage', 'voltage', '30V'),
    q('pdMaxW', 'Max power dissipation', 'power', '1.4W'),
    tj,
    rth,
  ],
  diode: [q('vrrmV', 'Max repetitive reverse voltage', 'voltage', '1kV'), q('ifAvA', 'Average forward current', 'current', '1A'), tj],
  led: [q('ifMaxA', 'Max forward current', 'current', '20mA'), q('vfV', 'Forward voltage', 'voltage', '3.2V')],
};

export function ratingFieldsFor(category: PartCategory | string): readonly RatingDef[] {
  return ratingFields[category] ?? [];
}

export const dielectricLabels: Record<(typeof dielectrics)[number], string> = {
  c0g: 'C0G (NP0)',
  x7r: 'X7R',
  x5r: 'X5R',
  y5v: 'Y5V',
  hv_ceramic: 'High-voltage ceramic',
  film: 'Film',
  al_electrolytic: 'Aluminium electrolytic',
  tantalum: 'Tantalum',
};

/**
 * What a rating field's text reads as, for the live note beside it ("= 4.7 kΩ"):
 * the value in engineering form, an error message, or nothing for an empty field.
 */
export function previewRating(def: RatingDef, text: string): { ok: true; shown: string } | { ok: false; message: string } | null {
  const trimmed = text.trim();
  if (!trimmed || def.kind === 'dielectric') return null;
  if (def.kind === 'number') {
    const value = Number(trimmed);
    return Number.isFinite(value) ? { ok: true, shown: `${formatValue(value, 'plain', { digits: 4 })} ${def.unit}` } : { ok: false, message: 'must be a number' };
  }
  const parsed = parseValue(trimmed, def.quantity);
  return parsed.ok ? { ok: true, shown: formatValue(parsed.value, def.quantity, { digits: 4 }) } : { ok: false, message: parsed.message };
}

/** A stored rating as a datasheet prints it: "4.7 kΩ", "2 kV", "1 %". */
export function formatRating(def: RatingDef, value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  if (def.kind === 'dielectric') return dielectricLabels[value as keyof typeof dielectricLabels] ?? String(value);
  if (typeof value !== 'number') return String(value);
  if (def.kind === 'number') return `${formatValue(value, 'plain', { digits: 4 })} ${def.unit}`;
  return formatValue(value, def.quantity, { digits: 4 });
}

/** The texts of a form's rating fields for a stored part (numbers back to editable text). */
export function ratingTexts(category: PartCategory, ratings: Record<string, unknown>): Record<string, string> {
  const texts: Record<string, string> = {};
  for (const def of ratingFieldsFor(category)) {
    const value = ratings[def.key];
    if (value === undefined || value === null) texts[def.key] = '';
    else if (def.kind === 'quantity' && typeof value === 'number') texts[def.key] = formatValue(value, def.quantity, { digits: 6 }).replace(' ', '');
    else texts[def.key] = String(value);
  }
  return texts;
}

/**
 * The ratings a form sends: empty fields left out, plain-number fields as numbers,
 * notations as typed (the shared schema reads them), then checked by the same rule as
 * the server. Issue paths are `ratings.<key>`, the form's own field names.
 */
export function ratingsFromTexts(
  category: PartCategory,
  texts: Record<string, string | undefined>,
): { ok: true; value: Record<string, unknown> } | { ok: false; issues: { path: string; message: string }[] } {
  if (!isRated(category)) return { ok: true, value: {} };
  const raw: Record<string, unknown> = {};
  const issues: { path: string; message: string }[] = [];
  for (const def of ratingFieldsFor(category)) {
    const text = (texts[def.key] ?? '').trim();
    if (!text) continue;
    if (def.kind === 'number') {
      const value = Number(text);
      if (Number.isFinite(value)) raw[def.key] = value;
      else issues.push({ path: `ratings.${def.key}`, message: 'must be a number' });
    } else {
      raw[def.key] = text;
    }
  }
  if (issues.length) return { ok: false, issues };
  return parseRatings(category, raw);
}

/** The headline ratings of a part in one line ("4.7 kΩ · 250 mW · 200 V"), for tables and pickers. */
export function ratingSummary(category: PartCategory | string, ratings: Record<string, unknown>): string {
  return ratingFieldsFor(category)
    .filter((def) => def.kind === 'quantity' || def.kind === 'dielectric')
    .filter((def) => ratings[def.key] !== undefined && ratings[def.key] !== null)
    .slice(0, 3)
    .map((def) => formatRating(def, ratings[def.key]))
    .join(' · ');
}
