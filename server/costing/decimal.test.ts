import { describe, expect, it } from 'vitest';
import { ceilInt, dec, moneyText, perUnitText, roundHalfUp, roundMoney } from './decimal';
import { CostingInputError } from './errors';
import { ceilToMultipleCount, chooseOrder, prepareOrderTerms } from './order-quantity';
import { breaks } from './test-factories';

describe('half-up rounding', () => {
  it('rounds halves away from zero (#32) [ROUND] local', () => {
    expect(roundHalfUp(dec('2.345'), 2).toFixed(2)).toBe('2.35');
    expect(roundHalfUp(dec('2.355'), 2).toFixed(2)).toBe('2.36');
    expect(roundHalfUp(dec('0.125'), 2).toFixed(2)).toBe('0.13');
    expect(roundHalfUp(dec('-2.345'), 2).toFixed(2)).toBe('-2.35');
  });

  it('rounds euro amounts to the cent, exact half up (#33) [EUR-ROUND]', () => {
    expect(roundMoney(dec('24.784'), 'EUR').toFixed(2)).toBe('24.78');
    expect(roundMoney(dec('24.785'), 'EUR').toFixed(2)).toBe('24.79');
  });

  it('converts 500 SIT at 239.640 SIT/EUR to 2.09 EUR (#34) [EUR-ROUND]', () => {
    expect(roundMoney(dec('500').div('239.640'), 'EUR').toFixed(2)).toBe('2.09');
  });

  it('rounds KWD to its 3 minor digits: 1.23456 → 1.235 (#31) [ISO-DATA] local', () => {
    expect(roundMoney(dec('1.23456'), 'KWD').toString()).toBe('1.235');
  });

  it('rounds JPY to whole yen and refuses a code without a known minor unit', () => {
    expect(roundMoney(dec('1982.5'), 'JPY').toString()).toBe('1983');
    expect(() => roundMoney(dec('1'), 'XAU')).toThrow(CostingInputError);
  });

  it('does what binary floats cannot: 1.005 → 1.01 (#37) local', () => {
    expect((1.005).toFixed(2)).toBe('1.00');
    expect(roundMoney(dec('1.005'), 'USD').toFixed(2)).toBe('1.01');
  });
});

describe('multiply first, round once (common practice)', () => {
  const extended = (qty: number, unitPrice: string) =>
    chooseOrder(prepareOrderTerms(breaks([1, unitPrice]), 1, 1), qty).goodsValue;

  it('10,000 × 0.0008 USD = 8.00; rounding the unit price first would give 0.00 (#35) cp, local', () => {
    expect(roundMoney(extended(10_000, '0.0008'), 'USD').toFixed(2)).toBe('8.00');
    expect(roundMoney(dec('0.0008'), 'USD').times(10_000).toFixed(2)).toBe('0.00');
  });

  it('5,000 × 0.0065 USD = 32.50; rounding the unit price first would give 50.00 (#36) cp, local', () => {
    expect(roundMoney(extended(5_000, '0.0065'), 'USD').toFixed(2)).toBe('32.50');
    expect(roundMoney(dec('0.0065'), 'USD').times(5_000).toFixed(2)).toBe('50.00');
  });

  it('0.00081 × 10,000 = 8.10 exactly, and so is the sum of 10,000 pieces at 0.00081 (local)', () => {
    expect(moneyText(extended(10_000, '0.00081'))).toBe('8.100000');
    let floatSum = 0;
    let decimalSum = dec(0);
    for (let i = 0; i < 10_000; i++) {
      floatSum += 0.00081;
      decimalSum = decimalSum.plus('0.00081');
    }
    expect(floatSum).not.toBe(8.1);
    expect(decimalSum.toString()).toBe('8.1');
  });
});

describe('parsing and helpers', () => {
  it('takes plain decimal strings and integer counts only', () => {
    expect(dec('0.000810').toString()).toBe('0.00081');
    expect(dec(' 12 ').toString()).toBe('12');
    expect(dec(3000).toString()).toBe('3000');
    for (const bad of ['1e3', '0x1F', 'Infinity', 'abc', '', '1,5']) {
      expect(() => dec(bad, 'unitPrice')).toThrow(CostingInputError);
    }
    expect(() => dec(Number.NaN)).toThrow(CostingInputError);
  });

  it('rounds up to a whole number and to a multiple', () => {
    expect(ceilInt(dec('4.2')).toString()).toBe('5');
    expect(ceilInt(dec('4')).toString()).toBe('4');
    expect(ceilToMultipleCount(1000, 300)).toBe(1200);
    expect(ceilToMultipleCount(1200, 300)).toBe(1200);
  });

  it('prints money to 6 decimals and per-unit figures to 10, never "-0"', () => {
    expect(moneyText(dec('8.1'))).toBe('8.100000');
    expect(moneyText(dec('-0.0000001'))).toBe('0.000000');
    expect(perUnitText(dec(1).div(3))).toBe('0.3333333333');
  });
});
