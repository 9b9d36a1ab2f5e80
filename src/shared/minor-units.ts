/**
 * ISO 4217 minor units (digits after the decimal point) for the currencies a gadget importer
 * meets: every current code with 0, 3 or 4 digits, and the common 2-digit codes.
 * Taken from the ISO 4217 list, not from Intl/CLDR, which differs for IDR, HUF, IQD and
 * others. Metals, SDR and test codes (XAU, XDR, XTS…) have no minor unit and are left out:
 * no one rounds an invoice in them. The list changes (HRK left in 2023), so it is a table,
 * not logic; the test compares every entry with the `currency-codes` package.
 */
export const MINOR_UNITS: Readonly<Record<string, number>> = {
  // 0 digits
  BIF: 0, CLP: 0, DJF: 0, GNF: 0, ISK: 0, JPY: 0, KMF: 0, KRW: 0, PYG: 0,
  RWF: 0, UGX: 0, UYI: 0, VND: 0, VUV: 0, XAF: 0, XOF: 0, XPF: 0,
  // 3 digits
  BHD: 3, IQD: 3, JOD: 3, KWD: 3, LYD: 3, OMR: 3, TND: 3,
  // 4 digits (units of account)
  CLF: 4, UYW: 4,
  // 2 digits: the major trading and sourcing currencies
  AED: 2, ARS: 2, AUD: 2, BDT: 2, BGN: 2, BRL: 2, CAD: 2, CHF: 2, CNY: 2, COP: 2,
  CZK: 2, DKK: 2, EGP: 2, EUR: 2, GBP: 2, HKD: 2, HUF: 2, IDR: 2, ILS: 2, INR: 2,
  KES: 2, KZT: 2, LKR: 2, MAD: 2, MXN: 2, MYR: 2, NGN: 2, NOK: 2, NZD: 2, PEN: 2,
  PHP: 2, PKR: 2, PLN: 2, QAR: 2, RON: 2, RSD: 2, RUB: 2, SAR: 2, SEK: 2, SGD: 2,
  THB: 2, TRY: 2, TWD: 2, UAH: 2, USD: 2, UZS: 2, ZAR: 2,
};

/** The currency's minor unit, or undefined when the code is not in our table. */
export function minorUnits(currency: string): number | undefined {
  return MINOR_UNITS[currency.toUpperCase()];
}
