import { describe, expect, it } from 'vitest';
import { dec, roundHalfUp, roundMoney } from './decimal';
import { convert, createFxIndex, type FxLookup } from './fx';
import { ECB_2024_06_28, fxRow } from './test-factories';

const ecb = createFxIndex(ECB_2024_06_28);
const D = '2024-06-28';

function found(r: FxLookup) {
  if (!r.ok) throw new Error(`expected a rate, got missing_fx ${r.from}->${r.to}`);
  return r;
}

describe('ECB cross rates through the euro [ECB-FMT]', () => {
  it('USD→CNY = 7.7748 / 1.0705 = 7.2628 (#26) [ECB-FMT] local', () => {
    const r = found(ecb.lookup('USD', 'CNY', D));
    expect(roundHalfUp(r.rate, 4).toString()).toBe('7.2628');
    expect(r.rate.toFixed(8)).toBe('7.26277440');
    expect(r.route).toBe('pivot');
    expect(r.rows.map((x) => [x.base, x.quote, x.date, x.inverted])).toEqual([
      ['EUR', 'USD', D, true],
      ['EUR', 'CNY', D, false],
    ]);
  });

  it('CNY 1,000 → 137.69 USD (#27) [ECB-FMT] local', () => {
    const r = convert(ecb, dec(1000), 'CNY', 'USD', D);
    expect(r.ok && roundMoney(r.value, 'USD').toFixed(2)).toBe('137.69');
  });

  it('USD 12.3456 → JPY 1,983, whole yen (#28) [ECB-FMT][ISO-DATA] local', () => {
    const r = convert(ecb, dec('12.3456'), 'USD', 'JPY', D);
    expect(r.ok && r.value.toFixed(4)).toBe('1982.9075');
    expect(r.ok && roundMoney(r.value, 'JPY').toString()).toBe('1983');
  });

  it('GBP→USD = 1.0705 / 0.84638 = 1.2648 (#29) [ECB-FMT] local', () => {
    expect(roundHalfUp(found(ecb.lookup('GBP', 'USD', D)).rate, 4).toString()).toBe('1.2648');
  });

  it('takes the inverse of a EUR row when the pivot is one side: USD→EUR = 1 / 1.0705', () => {
    const r = found(ecb.lookup('USD', 'EUR', D));
    expect(r.route).toBe('inverse');
    expect(r.rate.times('1.0705').toFixed(30)).toBe(dec(1).toFixed(30));
  });
});

describe('rate table rules (costing rules, "Currency conversion")', () => {
  const rows = [
    fxRow('2026-11-27', 'EUR', 'USD', '1.10'),
    fxRow('2026-11-27', 'EUR', 'CNY', '8.00'),
    fxRow('2026-11-30', 'EUR', 'USD', '1.20'),
    fxRow('2026-12-02', 'EUR', 'USD', '1.30'),
    fxRow('2026-11-01', 'USD', 'CNY', '7.00'),
    fxRow('2026-11-15', 'GBP', 'USD', '1.25'),
  ];
  const fx = createFxIndex(rows);

  it('uses the latest row dated on or before the costing date, and reports its date', () => {
    const r = found(fx.lookup('EUR', 'USD', '2026-12-01'));
    expect(r.rate.toString()).toBe('1.2');
    expect(r.rows[0].date).toBe('2026-11-30');
    expect(found(fx.lookup('EUR', 'USD', '2026-11-29')).rate.toString()).toBe('1.1');
  });

  it('prefers the direct pair to the inverse and the inverse to the pivot', () => {
    // The rule's order, literally: the direct USD→CNY row of 2026-11-01 wins over the newer
    // EUR rows of 2026-11-27 that a cross rate would use.
    expect(found(fx.lookup('USD', 'CNY', '2026-12-01'))).toMatchObject({ route: 'direct' });
    expect(found(fx.lookup('USD', 'CNY', '2026-12-01')).rate.toString()).toBe('7');
    const back = found(fx.lookup('CNY', 'USD', '2026-12-01'));
    expect(back.route).toBe('inverse');
    expect(back.rate.times(7).toFixed(20)).toBe('1.00000000000000000000');
    expect(found(fx.lookup('USD', 'EUR', '2026-12-01')).route).toBe('inverse');
  });

  it('triangulates through EUR when no pair holds both currencies', () => {
    // GBP→EUR needs EUR→GBP or GBP→EUR: neither exists, so GBP→CNY has no route via EUR.
    expect(fx.lookup('GBP', 'CNY', '2026-12-01').ok).toBe(false);
    const fx2 = createFxIndex([...rows, fxRow('2026-11-27', 'EUR', 'GBP', '0.85')]);
    const r = found(fx2.lookup('GBP', 'CNY', '2026-12-01'));
    expect(r.route).toBe('pivot');
    expect(r.rate.toFixed(10)).toBe(dec('8.00').div('0.85').toFixed(10));
  });

  it('gives 1 for the same currency, with no rows', () => {
    const r = found(fx.lookup('usd', 'USD', '2000-01-01'));
    expect(r.rate.toString()).toBe('1');
    expect(r.rows).toEqual([]);
  });

  it('reports missing_fx, never a rate of 1, when nothing is dated on or before d', () => {
    const r = fx.lookup('EUR', 'USD', '2026-01-01');
    expect(r).toEqual({ ok: false, code: 'missing_fx', from: 'EUR', to: 'USD', date: '2026-01-01' });
    expect(fx.lookup('JPY', 'USD', '2026-12-01').ok).toBe(false);
    expect(convert(fx, dec(100), 'JPY', 'USD', '2026-12-01').ok).toBe(false);
  });

  it('skips unusable rows (rate ≤ 0) and can triangulate through another pivot', () => {
    const fx3 = createFxIndex(
      [fxRow('2026-11-01', 'USD', 'CNY', '0'), fxRow('2026-11-01', 'USD', 'CNY', '-1'), fxRow('2026-11-01', 'USD', 'HKD', '7.8')],
      { pivot: 'USD' },
    );
    expect(fx3.lookup('USD', 'CNY', '2026-12-01').ok).toBe(false);
    expect(found(fx3.lookup('HKD', 'USD', '2026-12-01')).route).toBe('inverse');
  });
});
