import currencyCodes from 'currency-codes';
import { describe, expect, it } from 'vitest';
import { MINOR_UNITS, minorUnits } from './minor-units';

describe('ISO 4217 minor units', () => {
  it('gives JPY 0, KRW 0, KWD 3, BHD 3, CLF 4, USD/EUR/GBP/CNY 2 (#30) [ISO-DATA]', () => {
    const expected: Record<string, number> = { JPY: 0, KRW: 0, KWD: 3, BHD: 3, CLF: 4, USD: 2, EUR: 2, GBP: 2, CNY: 2 };
    for (const [code, digits] of Object.entries(expected)) expect(minorUnits(code), code).toBe(digits);
  });

  it('agrees with the npm package currency-codes for every code in our table [ISO-NPM]', () => {
    for (const [code, digits] of Object.entries(MINOR_UNITS)) {
      const record = currencyCodes.code(code);
      expect(record, `${code} is a current ISO 4217 code`).toBeDefined();
      expect(record!.digits, code).toBe(digits);
    }
  });

  it('holds every 0-, 3- and 4-digit code the reference package lists, metals and funds aside [ISO-NPM]', () => {
    // X-codes without a minor unit (metals, SDR, test) are N.A. in ISO; the package maps them to 0.
    const noMinorUnit = new Set(['XAU', 'XAG', 'XPD', 'XPT', 'XDR', 'XTS', 'XXX', 'XBA', 'XBB', 'XBC', 'XBD', 'XSU', 'XUA']);
    const notTwo = currencyCodes.data.filter((c) => c.digits !== 2 && !noMinorUnit.has(c.code)).map((c) => c.code);
    for (const code of notTwo) expect(minorUnits(code), code).toBe(currencyCodes.code(code)!.digits);
  });

  it('takes ISO digits, not Intl/CLDR ones: IDR and HUF 2, IQD 3 [ISO-DATA]', () => {
    expect(minorUnits('IDR')).toBe(2);
    expect(minorUnits('HUF')).toBe(2);
    expect(minorUnits('IQD')).toBe(3);
    expect(minorUnits('usd')).toBe(2);
    expect(minorUnits('HRK')).toBeUndefined();
  });
});
