import { describe, expect, it } from 'vitest';
import { dec, ZERO } from './decimal';
import { createDutyTable } from './duty';
import { customsValue } from './incoterms';
import { lineAdders } from './landed';

// Reference §2.2 worked example: FOB 10,000; freight 800; insurance 50; duty 3.7 %.
const FOB_PRICE = dec(10_000);
const FREIGHT = dec(800);
const INSURANCE = dec(50);
const RATE = dec('3.7').div(100);

describe('customs value and duty by basis', () => {
  it('FOB basis (USA): customs value 10,000.00, duty 370.00 (#1) [US-ICP] local', () => {
    const cv = customsValue('FOB', 'FOB', { goods: FOB_PRICE, origin: ZERO, freight: FREIGHT, insurance: INSURANCE })!;
    expect(cv.toFixed(2)).toBe('10000.00');
    expect(cv.times(RATE).toFixed(2)).toBe('370.00');
  });

  it('CIF basis (EU): customs value 10,850.00, duty 401.45 (#2) [EU-UCC71] local', () => {
    const cv = customsValue('FOB', 'CIF', { goods: FOB_PRICE, origin: ZERO, freight: FREIGHT, insurance: INSURANCE })!;
    expect(cv.toFixed(2)).toBe('10850.00');
    expect(cv.times(RATE).toFixed(2)).toBe('401.45');
  });

  it('EXW 9,700 + origin 300, then as #2: customs value 10,850.00, duty 401.45 (#3) [EU-UCC71] local', () => {
    const cv = customsValue('EXW', 'CIF', { goods: dec(9_700), origin: dec(300), freight: FREIGHT, insurance: INSURANCE })!;
    expect(cv.toFixed(2)).toBe('10850.00');
    expect(cv.times(RATE).toFixed(2)).toBe('401.45');
    // Under the FOB basis the origin costs stay dutiable (FOB-equivalent), transport does not [US-ICP].
    expect(customsValue('EXW', 'FOB', { goods: dec(9_700), origin: dec(300), freight: FREIGHT, insurance: INSURANCE })!.toFixed(2)).toBe('10000.00');
  });

  it('a CIF quote into the EU is valued at its price, no freight added (#13) [EU-UCC71]', () => {
    const cv = customsValue('CIF', 'CIF', { goods: dec(10_850), origin: ZERO, freight: FREIGHT, insurance: INSURANCE })!;
    expect(cv.toFixed(2)).toBe('10850.00');
  });

  it('a DDP quote gets no customs value and no duty line (#12) [INCO-DDP]', () => {
    expect(customsValue('DDP', 'CIF', { goods: dec(100), origin: ZERO, freight: ZERO, insurance: ZERO })).toBeNull();
    const a = lineAdders({
      goods: dec(10_000),
      incoterm: 'DDP',
      pct: { origin: ZERO, freight: dec('0.08'), insurance: ZERO, destination: ZERO },
      dutyBasis: 'CIF',
      dutyRate: RATE,
    });
    expect(a.duty.isZero()).toBe(true);
    expect(a.customsValue).toBeNull();
  });

  it('the whole line: FOB 10,000 with 8 % freight into a CIF-basis country pays duty on G + freight + insurance', () => {
    const a = lineAdders({
      goods: FOB_PRICE,
      incoterm: 'FOB',
      pct: { origin: ZERO, freight: dec('0.08'), insurance: dec('0.005'), destination: ZERO },
      dutyBasis: 'CIF',
      dutyRate: RATE,
    });
    // insurance = 0.5 % × 1.10 × 10,800 = 59.40; CV = 10,859.40; duty = 401.7978
    expect(a.freight.toFixed(2)).toBe('800.00');
    expect(a.insurance.toFixed(2)).toBe('59.40');
    expect(a.customsValue!.toFixed(2)).toBe('10859.40');
    expect(a.duty.toFixed(4)).toBe('401.7978');
  });
});

describe('duty rate by HS code: longest prefix wins', () => {
  // HS 2022 subheadings from [HS-DATA]; rates are invented profile data.
  const table = createDutyTable(
    [
      { hsPrefix: '85', ratePct: '5' },
      { hsPrefix: '8541', ratePct: '2.7' },
      { hsPrefix: '8541.41', ratePct: '0' },
      { hsPrefix: '8507.60', ratePct: '3.4' },
    ],
    '6.5',
  );

  it('takes the longest matching prefix, with or without dots', () => {
    expect(table.match('8541.41.00').ratePct.toString()).toBe('0'); // LEDs, HS 2022 [HS-DATA]
    expect(table.match('854110').ratePct.toString()).toBe('2.7'); // diodes
    expect(table.match('8532.24').ratePct.toString()).toBe('5'); // MLCC: only "85" matches
    expect(table.match('8507.60.00').rate.toString()).toBe('0.034');
    expect(table.match('8541.41.00').hsPrefix).toBe('8541.41');
  });

  it('falls back to the default rate when nothing matches or the part has no HS code', () => {
    expect(table.match('3926.90').ratePct.toString()).toBe('6.5');
    expect(table.match(null).ratePct.toString()).toBe('6.5');
    expect(table.match('3926.90').hsPrefix).toBeNull();
    expect(createDutyTable(null, null).match('8533.21').rate.isZero()).toBe(true);
  });
});
