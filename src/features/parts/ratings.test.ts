import { describe, expect, it } from 'vitest';
import { ratingsByCategory } from '../../shared/schemas/parts';
import { formatRating, previewRating, ratingFields, ratingFieldsFor, ratingsFromTexts, ratingSummary, ratingTexts } from './ratings';

const def = (category: string, key: string) => ratingFieldsFor(category).find((d) => d.key === key)!;

describe('rating fields', () => {
  it('cover exactly the keys the shared schema accepts for each rated category', () => {
    for (const [category, schema] of Object.entries(ratingsByCategory)) {
      expect(ratingFields[category].map((d) => d.key).sort()).toEqual(Object.keys(schema.shape).sort());
    }
    expect(ratingFieldsFor('pcb')).toEqual([]);
  });

  // IEC 60062 letter code: 4K7 = 4.7 kΩ, 2n2 = 2.2 nF, 0R47 = 0.47 Ω (from memory).
  it('show the parsed value live beside the field', () => {
    expect(previewRating(def('resistor', 'resistanceOhm'), '4K7')).toEqual({ ok: true, shown: '4.7 kΩ' });
    expect(previewRating(def('resistor', 'resistanceOhm'), '0R47')).toEqual({ ok: true, shown: '0.47 Ω' });
    expect(previewRating(def('capacitor', 'capacitanceF'), '2n2')).toEqual({ ok: true, shown: '2.2 nF' });
    expect(previewRating(def('capacitor', 'ratedVoltageV'), '2kV')).toEqual({ ok: true, shown: '2 kV' });
    expect(previewRating(def('resistor', 'powerW'), '1/4W')).toEqual({ ok: true, shown: '250 mW' });
    expect(previewRating(def('resistor', 'tolerancePct'), '5')).toEqual({ ok: true, shown: '5 %' });
    expect(previewRating(def('resistor', 'resistanceOhm'), '  ')).toBeNull();
  });

  it('say what is wrong with a value of the wrong kind', () => {
    const result = previewRating(def('resistor', 'resistanceOhm'), '700mA');
    expect(result?.ok).toBe(false);
    expect(previewRating(def('bjt', 'rthJaCPerW'), 'hot')).toEqual({ ok: false, message: 'must be a number' });
  });

  it('send notations to the shared rule and get numbers back, leaving empty fields out', () => {
    const result = ratingsFromTexts('resistor', { resistanceOhm: '4K7', powerW: '1/4W', levV: '', tolerancePct: '1' });
    expect(result).toEqual({ ok: true, value: { resistanceOhm: 4700, powerW: 0.25, tolerancePct: 1 } });
  });

  it('name the field of each problem with the form path', () => {
    const result = ratingsFromTexts('capacitor', { capacitanceF: '2kV', ratedVoltageV: '2kV' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.issues.map((i) => i.path)).toEqual(['ratings.capacitanceF']);
    const plain = ratingsFromTexts('bjt', { rthJaCPerW: 'lots' });
    expect(plain.ok).toBe(false);
    if (!plain.ok) expect(plain.issues).toEqual([{ path: 'ratings.rthJaCPerW', message: 'must be a number' }]);
  });

  it('carry no ratings for an unrated category', () => {
    expect(ratingsFromTexts('enclosure', { resistanceOhm: '10k' })).toEqual({ ok: true, value: {} });
  });

  it('turn stored numbers back into text that reads to the same value', () => {
    const stored = { capacitanceF: 2.2e-9, ratedVoltageV: 2000, dielectric: 'hv_ceramic' };
    const texts = ratingTexts('capacitor', stored);
    expect(texts).toEqual({ capacitanceF: '2.2nF', ratedVoltageV: '2kV', dielectric: 'hv_ceramic' });
    expect(ratingsFromTexts('capacitor', texts)).toEqual({ ok: true, value: stored });
  });

  it('print a stored rating with its unit', () => {
    expect(formatRating(def('resistor', 'resistanceOhm'), 4700)).toBe('4.7 kΩ');
    expect(formatRating(def('capacitor', 'ratedVoltageV'), 2000)).toBe('2 kV');
    expect(formatRating(def('capacitor', 'dielectric'), 'x7r')).toBe('X7R');
    expect(formatRating(def('diode', 'tjMaxC'), 150)).toBe('150 °C');
    expect(formatRating(def('diode', 'tjMaxC'), undefined)).toBe('—');
  });
});

describe('the ratings line of a table row', () => {
  it('lists the headline ratings with units', () => {
    expect(ratingSummary('resistor', { resistanceOhm: 22e6, powerW: 0.25, levV: 3000, tolerancePct: 5 })).toBe('22 MΩ · 250 mW · 3 kV');
    expect(ratingSummary('capacitor', { ratedVoltageV: 2000 })).toBe('2 kV');
    expect(ratingSummary('pcb', {})).toBe('');
  });
});
