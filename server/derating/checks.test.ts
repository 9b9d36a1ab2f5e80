import { describe, expect, it } from 'vitest';
import {
  capacitorVoltage,
  checksFor,
  diodeCurrent,
  diodeReverseVoltage,
  ledCurrent,
  resistorPower,
  resistorVoltage,
  transistorCurrent,
  transistorJunctionTemp,
  transistorPower,
  transistorVoltage,
} from './checks';
import { CAREFUL, HI_REL, SEEDED_POLICIES, SHELF_GRADE, type StressPolicy } from './policies';
import { resistorPowerFactor } from './resistor-temperature';
import type { CheckResult, CheckedCategory, OperatingPoint } from './types';

const one = (results: CheckResult[], name: string): CheckResult => {
  const found = results.find((r) => r.check === name);
  if (!found) throw new Error(`no ${name} check`);
  return found;
};

// Ratings seen in the derating reference's tables.
const CHIP_1206_22M = { resistanceOhm: 22e6, powerW: 0.25, levV: 200 }; // [CHIP-TF; C]
const TO92_2N3904 = { icMaxA: 0.2, vceoMaxV: 40, pdMaxW: 0.625, tjMaxC: 150, rthJaCPerW: 200 }; // [BJT-DS; C] (Ic,max from memory)
const SOT23_MMBT3904 = { icMaxA: 0.2, vceoMaxV: 40, pdMaxW: 0.3, tjMaxC: 150, rthJaCPerW: 417 }; // [BJT-DS; C] (Ic,max from memory)

describe('§8 check values: resistors', () => {
  it('#1 rated 200 V for a 22 MΩ 1206; 160 V at the 80 % tier passes [MIL-39005 C, WELWYN C, CHIP-TF C; tier P]', () => {
    const at160 = resistorVoltage(CHIP_1206_22M, { voltageV: 160 }, SHELF_GRADE);
    expect(at160.rated).toBe(200);
    expect(at160.ratio).toBeCloseTo(0.8, 12);
    expect(at160.status).toBe('close'); // exactly at the 80 % limit: passes
    expect(at160.formula).toContain('min(√(0.25 W × 22 MΩ), 200 V)');
    expect(at160.formula).toContain('min(2.345 kV, 200 V) = 200 V');
    expect(resistorVoltage(CHIP_1206_22M, { voltageV: 161 }, SHELF_GRADE).status).toBe('beyond_policy');
    expect(resistorVoltage(CHIP_1206_22M, { voltageV: 201 }, SHELF_GRADE).status).toBe('over_rating');
  });

  it('#1 power at 200 V is 1.82 mW, 0.73 % of P70 [MIL-39005 C, CHIP-TF C]', () => {
    const p = resistorPower(CHIP_1206_22M, { voltageV: 200 }, 25, SHELF_GRADE);
    expect(p.applied! * 1e3).toBeCloseTo(1.82, 2);
    expect(p.ratio! * 100).toBeCloseTo(0.73, 2);
    expect(p.status).toBe('clear');
  });

  it('#2 at R_crit = 160 kΩ the power-implied voltage equals the 200 V LEV [STACKPOLE; C]', () => {
    const atCrit = resistorVoltage({ ...CHIP_1206_22M, resistanceOhm: 160e3 }, { voltageV: 100 }, SHELF_GRADE);
    expect(atCrit.rated).toBeCloseTo(200, 9);
    const below = resistorVoltage({ ...CHIP_1206_22M, resistanceOhm: 100e3 }, { voltageV: 100 }, SHELF_GRADE);
    expect(below.rated).toBeCloseTo(Math.sqrt(0.25 * 100e3), 9); // power-limited below R_crit
  });

  it('#7 a 20 MΩ 0402 implies 1122 V by power but is held to its 50 V LEV [STACKPOLE C, CHIP-TF C]', () => {
    const r = resistorVoltage({ resistanceOhm: 2e7, powerW: 0.063, levV: 50 }, { voltageV: 40 }, SHELF_GRADE);
    expect(Math.sqrt(0.063 * 2e7)).toBeCloseTo(1122, 0);
    expect(r.rated).toBe(50);
    expect(r.formula).toContain('1.122 kV');
  });

  it('#8 1/2 W at 50 %, 1 MΩ gives 500 V; a 350 V carbon film caps it at 350 V, 280 V at 80 % [R-DERATE C, CFR C]', () => {
    const derated = resistorVoltage({ resistanceOhm: 1e6, powerW: 0.25, levV: 350 }, { voltageV: 280 }, SHELF_GRADE);
    expect(Math.sqrt(0.25 * 1e6)).toBe(500);
    expect(derated.rated).toBe(350);
    expect(derated.ratio).toBeCloseTo(0.8, 12);
    expect(derated.status).toBe('close');
    expect(resistorVoltage({ resistanceOhm: 1e6, powerW: 0.5, levV: 350 }, { voltageV: 280 }, SHELF_GRADE).rated).toBe(350);
  });

  it('#9 rated power follows f(T): 0.647 at 100 °C, 0.353 at 125 °C, 0 at 155 °C [CHIP-TF, RCM; C]', () => {
    const part = { resistanceOhm: 1e4, powerW: 1, levV: 500 };
    expect(resistorPower(part, { powerW: 0.1, ambientC: 100 }, 25, SHELF_GRADE).rated).toBeCloseTo(0.647, 3);
    const at125 = resistorPower(part, { powerW: 0.1, ambientC: 125 }, 25, SHELF_GRADE);
    expect(at125.rated).toBeCloseTo(0.353, 3);
    expect(at125.formula).toContain('f(125 °C) = (155 − 125) ÷ (155 − 70) = 0.3529');
    // About 59.4 V across 10 kΩ is the whole of the rating at 125 °C [RCM; C]: ratio 1,
    // inside the rating but beyond any policy; a little more is over the rating.
    const fullV = Math.sqrt(resistorPowerFactor(125) * 1 * 1e4);
    expect(fullV).toBeCloseTo(59.4, 1);
    const full = resistorPower(part, { voltageV: fullV, ambientC: 125 }, 25, SHELF_GRADE);
    expect(full.ratio).toBeCloseTo(1, 12);
    expect(full.status).toBe('beyond_policy');
    expect(resistorPower(part, { voltageV: 59.5, ambientC: 125 }, 25, SHELF_GRADE).status).toBe('over_rating');
    const at155 = resistorPower(part, { powerW: 0.001, ambientC: 155 }, 25, SHELF_GRADE);
    expect(at155.rated).toBe(0);
    expect(at155.status).toBe('over_rating');
    expect(at155.ratio).toBeNull();
  });

  it('#10 rated continuous working voltage 158.1 V at 100 kΩ and 250 V at 1 MΩ [IEC 60115-1 cl. 4.13 via CFR; C]', () => {
    const cf = { powerW: 0.25, levV: 250 };
    expect(resistorVoltage({ ...cf, resistanceOhm: 1e5 }, { voltageV: 100 }, SHELF_GRADE).rated).toBeCloseTo(158.1, 1);
    expect(resistorVoltage({ ...cf, resistanceOhm: 1e6 }, { voltageV: 100 }, SHELF_GRADE).rated).toBe(250);
  });

  it('#30 a 1.6 MΩ sharing resistor at 800 V dissipates 0.40 W [DIODE-SER; C, trade-level]', () => {
    const r = resistorPower({ resistanceOhm: 1.6e6, powerW: 1, levV: 1000 }, { voltageV: 800 }, 25, SHELF_GRADE);
    expect(r.applied).toBeCloseTo(0.4, 12);
  });
});

describe('§8 check values: transistors', () => {
  it('#11 TO-92 at 0.30 W, 40 °C: Tj = 100 °C [TOSHIBA C, BJT-DS C]', () => {
    const jt = transistorJunctionTemp(TO92_2N3904, { powerW: 0.3 }, 40, SHELF_GRADE);
    expect(jt.applied).toBeCloseTo(100, 9);
    expect(jt.rated).toBe(150);
    expect(jt.ratio).toBeCloseTo(60 / 110, 12);
    expect(jt.limit).toBeCloseTo(85 / 110, 12); // Tj,allowed 125 °C under Shelf-grade [P]
    expect(jt.status).toBe('clear');
  });

  it('#11 the same in SOT-23 at 417 K/W: Tj = 165.1 °C, above Tj,max 150 °C: over rating [TOSHIBA C, BJT-DS C]', () => {
    const jt = transistorJunctionTemp(SOT23_MMBT3904, { powerW: 0.3 }, 40, SHELF_GRADE);
    expect(jt.applied).toBeCloseTo(165.1, 1);
    expect(jt.status).toBe('over_rating');
    expect(jt.formula).toContain('= 165.1 °C');
  });

  it('#12 TO-92 625 mW at 25 °C, Tj,max 150 °C: 450 mW allowed at 60 °C, derating 5.0 mW/°C [BJT-DS; C]', () => {
    const at60 = transistorPower(TO92_2N3904, { powerW: 0.3, ambientC: 60 }, 25, SHELF_GRADE);
    expect(at60.rated).toBeCloseTo(0.45, 12);
    expect(at60.formula).toContain('0.625 W × (150 − 60) ÷ (150 − 25) = 0.45 W');
    const at61 = transistorPower(TO92_2N3904, { powerW: 0.3, ambientC: 61 }, 25, SHELF_GRADE);
    expect((at60.rated! - at61.rated!) * 1e3).toBeCloseTo(5.0, 9);
  });

  it('#12 rated power is capped at Pd,max below 25 °C and zero at Tj,max [BJT-DS; C]', () => {
    expect(transistorPower(TO92_2N3904, { powerW: 0.1, ambientC: 0 }, 25, SHELF_GRADE).rated).toBe(0.625);
    const hot = transistorPower(TO92_2N3904, { powerW: 0.1, ambientC: 150 }, 25, SHELF_GRADE);
    expect(hot.rated).toBe(0);
    expect(hot.status).toBe('over_rating');
  });

  it('#13 with Tj limited to 125 °C at 60 °C the part may dissipate 0.325 W [formula; tier P/M]', () => {
    // Careful allows min(150 − 30, 125) = 120 °C, so 0.325 W (Tj 125 °C) is beyond it;
    // Shelf-grade allows 125 °C, so 0.325 W sits exactly on the limit and passes.
    const onLimit = transistorJunctionTemp(TO92_2N3904, { powerW: 0.325, ambientC: 60 }, 25, SHELF_GRADE);
    expect(onLimit.applied).toBeCloseTo(125, 9);
    expect(onLimit.status).toBe('close');
    expect(transistorJunctionTemp(TO92_2N3904, { powerW: 0.326, ambientC: 60 }, 25, SHELF_GRADE).status).toBe('beyond_policy');
    expect(transistorJunctionTemp(TO92_2N3904, { powerW: 0.325, ambientC: 60 }, 25, CAREFUL).status).toBe('beyond_policy');
  });

  it('#15 2N3904 VCEO 40 V at 24 V is 60 %: passes 75 % and 80 %; at 36 V, 90 %, fails both [BJT-DS C; EEE-INST-002 M; P]', () => {
    for (const policy of [SHELF_GRADE, CAREFUL]) {
      const at24 = transistorVoltage('bjt', TO92_2N3904, { voltageV: 24 }, policy);
      expect(at24.ratio).toBeCloseTo(0.6, 12);
      expect(at24.status).toBe('clear');
      const at36 = transistorVoltage('bjt', TO92_2N3904, { voltageV: 36 }, policy);
      expect(at36.ratio).toBeCloseTo(0.9, 12);
      expect(at36.status).toBe('beyond_policy');
    }
  });

  it('reads a MOSFET\'s idMaxA and vdsMaxV; VDS at 80 % passes Shelf-grade [RENESAS; C]', () => {
    const fet = { idMaxA: 0.22, vdsMaxV: 50, pdMaxW: 0.36, tjMaxC: 150, rthJaCPerW: 350 };
    expect(transistorVoltage('mosfet', fet, { voltageV: 40 }, SHELF_GRADE)).toMatchObject({ rated: 50, status: 'close' });
    expect(transistorCurrent('mosfet', fet, { currentA: 0.1 }, SHELF_GRADE).rated).toBe(0.22);
  });
});

describe('§8 check values: capacitors', () => {
  const v = 12 + 2 * Math.SQRT2; // 12 V DC + 2 V rms sine, peak stress [EEE-INST-002 note C, MURATA C]

  it('#16 12 V DC + 2 V rms on 16 V: 14.83 V, 92.7 %: fails 80 %, inside the rating [EEE-INST-002 note, MURATA; C]', () => {
    const c = capacitorVoltage({ ratedVoltageV: 16, dielectric: 'x7r' }, { voltageV: v }, SHELF_GRADE);
    expect(c.applied).toBeCloseTo(14.83, 2);
    expect(c.ratio! * 100).toBeCloseTo(92.7, 1);
    expect(c.status).toBe('beyond_policy');
  });

  it('#16 the same on 25 V: 59.3 % [EEE-INST-002 note, MURATA; C]', () => {
    const c = capacitorVoltage({ ratedVoltageV: 25, dielectric: 'x7r' }, { voltageV: v }, SHELF_GRADE);
    expect(c.ratio! * 100).toBeCloseTo(59.3, 1);
    expect(c.status).toBe('clear');
  });

  it('#18 MnO2 tantalum 10 V on a 5 V rail is 50 %, at the limit: pass; on 6.3 V, 63 %: fail [KEMET-TA; C]', () => {
    for (const policy of SEEDED_POLICIES) {
      expect(capacitorVoltage({ ratedVoltageV: 10, dielectric: 'tantalum' }, { voltageV: 5 }, policy).status).toBe('close');
      expect(capacitorVoltage({ ratedVoltageV: 10, dielectric: 'tantalum' }, { voltageV: 6.3 }, policy).status).toBe('beyond_policy');
    }
  });

  it('#18 polymer tantalum under a workspace policy: 10 V part at most 9.0 V, 16 V part at most 12.8 V [KEMET-TA; C]', () => {
    const withTa = (value: number): StressPolicy => {
      const p = structuredClone(SHELF_GRADE);
      p.limits.capacitor.tantalum = { value, source: 'KEMET-TA (polymer)', confidence: 'C' };
      return p;
    };
    const small = withTa(0.9);
    expect(capacitorVoltage({ ratedVoltageV: 10, dielectric: 'tantalum' }, { voltageV: 9.0 }, small).status).toBe('close');
    expect(capacitorVoltage({ ratedVoltageV: 10, dielectric: 'tantalum' }, { voltageV: 9.01 }, small).status).toBe('beyond_policy');
    const large = withTa(0.8);
    expect(capacitorVoltage({ ratedVoltageV: 16, dielectric: 'tantalum' }, { voltageV: 12.8 }, large).status).toBe('close');
    expect(capacitorVoltage({ ratedVoltageV: 16, dielectric: 'tantalum' }, { voltageV: 12.81 }, large).status).toBe('beyond_policy');
  });

  it('#19 50 V X7R at 36 V is 72 %: fails RAC Benign 70 % and Severe 60 %, passes the consumer 80 % [RAC C; P]', () => {
    const at36 = (policy: StressPolicy) => capacitorVoltage({ ratedVoltageV: 50, dielectric: 'x7r' }, { voltageV: 36 }, policy);
    expect(at36(CAREFUL).status).toBe('beyond_policy');
    expect(at36(HI_REL).status).toBe('beyond_policy');
    // 72 % is exactly 0.9 × 80 %: the edge of "close", so it is still clear.
    expect(at36(SHELF_GRADE).status).toBe('clear');
  });

  it('#19 at 35 V, 70 %: passes RAC Benign [RAC; C]', () => {
    expect(capacitorVoltage({ ratedVoltageV: 50, dielectric: 'x7r' }, { voltageV: 35 }, CAREFUL).status).toBe('close');
  });

  it('#27 a multiplier\'s 4 kV capacitor needs 5 kV at 80 %: 4 kV on 5 kV film passes, on 4.5 kV fails [CW M; P]', () => {
    expect(capacitorVoltage({ ratedVoltageV: 5000, dielectric: 'film' }, { voltageV: 4000 }, SHELF_GRADE).status).toBe('close');
    expect(capacitorVoltage({ ratedVoltageV: 4500, dielectric: 'film' }, { voltageV: 4000 }, SHELF_GRADE).status).toBe('beyond_policy');
  });

  it('uses the dielectric\'s own limit: hv_ceramic is stricter than x7r under Shelf-grade [P]', () => {
    const at75 = (dielectric: 'x7r' | 'hv_ceramic') =>
      capacitorVoltage({ ratedVoltageV: 2000, dielectric }, { voltageV: 1500 }, SHELF_GRADE);
    expect(at75('x7r')).toMatchObject({ limit: 0.8, status: 'close' });
    expect(at75('hv_ceramic')).toMatchObject({ limit: 0.7, status: 'beyond_policy' });
  });
});

describe('§8 check values: diodes', () => {
  const GP02_40 = { vrrmV: 4000, ifAvA: 0.25, tjMaxC: 175 }; // [GP02; C]

  it('#30 one GP02-40 (4000 V) at 4 kV is at 100 %: fails at any tier [DIODE-SER, GP02; C]', () => {
    for (const policy of SEEDED_POLICIES) {
      const d = diodeReverseVoltage(GP02_40, { voltageV: 4000 }, policy);
      expect(d.ratio).toBe(1);
      expect(d.status).toBe('beyond_policy');
    }
  });

  it('#30 five 1000 V diodes share 4 kV at 800 V each: 80 % passes Shelf-grade [DIODE-SER; C]', () => {
    expect(diodeReverseVoltage({ vrrmV: 1000 }, { voltageV: 4000 / 5 }, SHELF_GRADE).status).toBe('close');
    expect(diodeReverseVoltage({ vrrmV: 1000 }, { voltageV: 4000 / 4 }, SHELF_GRADE).status).toBe('beyond_policy');
  });

  it('GP02 forward current: 0.2 A of 0.25 A is 80 %, inside RAC\'s 90 % but beyond Hi-rel\'s 50 % [RAC C; EEE-INST-002 M]', () => {
    expect(diodeCurrent(GP02_40, { currentA: 0.2 }, SHELF_GRADE).status).toBe('clear');
    expect(diodeCurrent(GP02_40, { currentA: 0.2 }, HI_REL).status).toBe('beyond_policy');
  });
});

describe('float edges', () => {
  it('passes a ratio equal to the limit reached through division (2.73 V on 3.9 V at 70 %)', () => {
    expect(2.73 / 3.9).toBeGreaterThan(0.7);
    expect(capacitorVoltage({ ratedVoltageV: 3.9, dielectric: 'x7r' }, { voltageV: 2.73 }, CAREFUL).status).toBe('close');
  });

  it('passes an LED at 0.8 × its rating computed in floating point', () => {
    const applied = 0.8 * 0.1;
    expect(applied / 0.1).toBeGreaterThan(0.8);
    expect(ledCurrent({ ifMaxA: 0.1 }, { currentA: applied }, SHELF_GRADE).status).toBe('close');
  });

  it('passes a junction exactly at Tj,allowed even when the ratio rounds above the limit', () => {
    const part = { ...SOT23_MMBT3904, rthJaCPerW: 625 };
    const p = (125 - 33.3) / 625;
    const jt = transistorJunctionTemp(part, { powerW: p, ambientC: 33.3 }, 25, SHELF_GRADE);
    expect(jt.ratio!).toBeGreaterThan(jt.limit!);
    expect(jt.status).toBe('close');
  });
});

describe('ambient and junction edges', () => {
  it('uses the BOM ambient when the line has none, and the line\'s own when it has one', () => {
    expect(transistorPower(TO92_2N3904, { powerW: 0.3 }, 60, SHELF_GRADE).rated).toBeCloseTo(0.45, 12);
    expect(transistorPower(TO92_2N3904, { powerW: 0.3, ambientC: 25 }, 60, SHELF_GRADE).rated).toBe(0.625);
  });

  it('is over rating when the ambient is at or above Tj,max', () => {
    const jt = transistorJunctionTemp(TO92_2N3904, { powerW: 0 }, 150, SHELF_GRADE);
    expect(jt).toMatchObject({ status: 'over_rating', ratio: null });
  });

  it('is beyond policy when the ambient already exceeds Tj,allowed', () => {
    // Hi-rel allows 110 °C on a 150 °C part; at 120 °C ambient no dissipation is within policy.
    const jt = transistorJunctionTemp(TO92_2N3904, { powerW: 0.01 }, 120, HI_REL);
    expect(jt.limit!).toBeLessThan(0);
    expect(jt.status).toBe('beyond_policy');
  });

  it('applies the 125 °C cap of Careful and Hi-rel to a 175 °C part', () => {
    const part = { ...TO92_2N3904, tjMaxC: 175 };
    // 25 °C + 0.5 W × 200 °C/W = 125 °C: on the cap for Careful/Hi-rel, so it passes.
    expect(transistorJunctionTemp(part, { powerW: 0.5 }, 25, CAREFUL).status).toBe('close');
    expect(transistorJunctionTemp(part, { powerW: 0.51 }, 25, HI_REL).status).toBe('beyond_policy');
    expect(transistorJunctionTemp(part, { powerW: 0.51 }, 25, SHELF_GRADE).status).toBe('clear');
  });
});

describe('resistor power: applied power', () => {
  const part = { resistanceOhm: 1000, powerW: 0.25, levV: 200 };

  it('takes powerW first, then V²/R, then I²·R', () => {
    expect(resistorPower(part, { powerW: 0.05, voltageV: 10, currentA: 0.1 }, 25, SHELF_GRADE).applied).toBe(0.05);
    expect(resistorPower(part, { voltageV: 10, currentA: 0.1 }, 25, SHELF_GRADE).applied).toBeCloseTo(0.1, 12);
    const byCurrent = resistorPower(part, { currentA: 0.01 }, 25, SHELF_GRADE);
    expect(byCurrent.applied).toBeCloseTo(0.1, 12);
    expect(byCurrent.formula).toContain('I²·R');
  });

  it('uses the part\'s own knee and zero-power point when given', () => {
    const hot = resistorPower({ ...part, derateKneeC: 70, zeroPowerC: 125 }, { powerW: 0.05, ambientC: 97.5 }, 25, SHELF_GRADE);
    expect(hot.rated).toBeCloseTo(0.125, 12);
  });
});

// Every needed input of every check, removed one at a time (as null and as undefined) → needs_data.
type Case = {
  category: CheckedCategory;
  check: string;
  ratings: Record<string, unknown>;
  op: OperatingPoint;
  bomAmbientC?: number;
  /** The name reported as missing when an input is removed, where it is not the input itself. */
  reportedAs?: Record<string, string>;
};
const FULL: Case[] = [
  { category: 'capacitor', check: 'capacitor.voltage', ratings: { ratedVoltageV: 50, dielectric: 'x7r' }, op: { voltageV: 10 } },
  { category: 'resistor', check: 'resistor.voltage', ratings: { resistanceOhm: 1e6, powerW: 0.25, levV: 200 }, op: { voltageV: 100 } },
  { category: 'resistor', check: 'resistor.power', ratings: { powerW: 0.25 }, op: { powerW: 0.01, ambientC: 40 } },
  {
    category: 'resistor',
    check: 'resistor.power',
    ratings: { resistanceOhm: 1e6, powerW: 0.25 },
    op: { voltageV: 100, ambientC: 40 },
    reportedAs: { voltageV: 'operatingPoint.powerW' }, // nothing left to derive the power from
  },
  {
    category: 'resistor',
    check: 'resistor.power',
    ratings: { resistanceOhm: 1e3, powerW: 0.25 },
    op: { currentA: 0.001 },
    bomAmbientC: 40,
    reportedAs: { currentA: 'operatingPoint.powerW' },
  },
  { category: 'bjt', check: 'transistor.current', ratings: { icMaxA: 0.2 }, op: { currentA: 0.05 } },
  { category: 'bjt', check: 'transistor.voltage', ratings: { vceoMaxV: 40 }, op: { voltageV: 12 } },
  { category: 'bjt', check: 'transistor.power', ratings: { pdMaxW: 0.625, tjMaxC: 150 }, op: { powerW: 0.1, ambientC: 40 } },
  { category: 'bjt', check: 'transistor.junctionTemp', ratings: { rthJaCPerW: 200, tjMaxC: 150 }, op: { powerW: 0.1, ambientC: 40 } },
  { category: 'mosfet', check: 'transistor.current', ratings: { idMaxA: 0.2 }, op: { currentA: 0.05 } },
  { category: 'mosfet', check: 'transistor.voltage', ratings: { vdsMaxV: 50 }, op: { voltageV: 12 } },
  { category: 'mosfet', check: 'transistor.power', ratings: { pdMaxW: 0.36, tjMaxC: 150 }, op: { powerW: 0.1, ambientC: 40 } },
  { category: 'mosfet', check: 'transistor.junctionTemp', ratings: { rthJaCPerW: 350, tjMaxC: 150 }, op: { powerW: 0.1, ambientC: 40 } },
  { category: 'diode', check: 'diode.reverseVoltage', ratings: { vrrmV: 1000 }, op: { voltageV: 300 } },
  { category: 'diode', check: 'diode.current', ratings: { ifAvA: 1 }, op: { currentA: 0.2 } },
  { category: 'led', check: 'led.current', ratings: { ifMaxA: 0.03 }, op: { currentA: 0.01 } },
];

describe('needs_data for every missing input of every check', () => {
  const run = (c: Case, ratings: Record<string, unknown>, op: OperatingPoint) =>
    one(checksFor(c.category, ratings, op, c.bomAmbientC ?? null, SHELF_GRADE), c.check);

  it.each(FULL.map((c) => [`${c.category} ${c.check}`, c] as const))('%s computes with all inputs', (_name, c) => {
    const r = run(c, c.ratings, c.op);
    expect(r.status).not.toBe('needs_data');
    expect(r.ratio).not.toBeNull();
    expect(r.missing).toEqual([]);
  });

  const removals = FULL.flatMap((c) => [
    ...Object.keys(c.ratings).map((key) => ({ c, where: 'ratings' as const, key })),
    ...Object.keys(c.op).map((key) => ({ c, where: 'operatingPoint' as const, key })),
  ]);

  it.each(removals.map((r) => [`${r.c.category} ${r.c.check} without ${r.where}.${r.key}`, r] as const))(
    '%s → needs_data',
    (_name, { c, where, key }) => {
      for (const gone of [undefined, null]) {
        const ratings = where === 'ratings' ? { ...c.ratings, [key]: gone } : c.ratings;
        const op = where === 'operatingPoint' ? { ...c.op, [key]: gone } : c.op;
        const r = run(c, ratings, op);
        expect(r.status).toBe('needs_data');
        expect(r.ratio).toBeNull();
        const reported = c.reportedAs?.[key] ?? (key === 'ambientC' ? 'ambientC' : `${where}.${key}`);
        expect(r.missing.join(' ')).toContain(reported);
        expect(r.formula).toMatch(/^needs data: /);
      }
    },
  );

  it('never falls back to a pass on unusable values: NaN, Infinity, negative or zero ratings, strings', () => {
    const bad: unknown[] = [Number.NaN, Number.POSITIVE_INFINITY, -1, 0, '50'];
    for (const value of bad) {
      const r = capacitorVoltage({ ratedVoltageV: value as number, dielectric: 'x7r' }, { voltageV: 10 }, SHELF_GRADE);
      expect(r.status, String(value)).toBe('needs_data');
      expect(r.missing).toEqual(['ratings.ratedVoltageV']);
    }
    expect(ledCurrent({ ifMaxA: 0.02 }, { currentA: -0.01 }, SHELF_GRADE).status).toBe('needs_data');
  });

  it('needs the ambient for resistor power when neither the line nor the BOM gives one', () => {
    const r = resistorPower({ resistanceOhm: 1e3, powerW: 0.25 }, { powerW: 0.01 }, null, SHELF_GRADE);
    expect(r.status).toBe('needs_data');
    expect(r.missing).toEqual(['operatingPoint.ambientC (or the BOM ambientC)']);
  });

  it('needs R to derive resistor power from a voltage or a current', () => {
    for (const op of [{ voltageV: 10 }, { currentA: 0.01 }]) {
      const r = resistorPower({ powerW: 0.25 }, { ...op, ambientC: 25 }, null, SHELF_GRADE);
      expect(r.status).toBe('needs_data');
      expect(r.missing).toContain('ratings.resistanceOhm');
    }
  });

  it('needs some operating value for resistor power', () => {
    const r = resistorPower({ resistanceOhm: 1e3, powerW: 0.25 }, { ambientC: 25 }, null, SHELF_GRADE);
    expect(r.status).toBe('needs_data');
    expect(r.formula).toContain('operatingPoint.powerW is missing (or give voltageV or currentA to derive it)');
  });

  it('needs a known dielectric for a capacitor: the limit depends on it', () => {
    const r = capacitorVoltage({ ratedVoltageV: 50, dielectric: 'paper' as never }, { voltageV: 10 }, SHELF_GRADE);
    expect(r).toMatchObject({ status: 'needs_data', limit: null, missing: ['ratings.dielectric'] });
    expect(r.formula).toContain('"paper" is not one of');
  });

  it('needs a zero-power point above the knee and Tj,max above 25 °C', () => {
    const r = resistorPower({ resistanceOhm: 1e3, powerW: 0.25, derateKneeC: 100, zeroPowerC: 90 }, { powerW: 0.01, ambientC: 25 }, null, SHELF_GRADE);
    expect(r.status).toBe('needs_data');
    expect(r.missing).toEqual(['ratings.zeroPowerC']);
    const t = transistorPower({ pdMaxW: 0.5, tjMaxC: 25 }, { powerW: 0.1, ambientC: 20 }, null, SHELF_GRADE);
    expect(t).toMatchObject({ status: 'needs_data', missing: ['ratings.tjMaxC'] });
  });

  it('shows what it does know beside a needs_data status', () => {
    const r = resistorVoltage({ resistanceOhm: 1e6, powerW: 0.25 }, { voltageV: 150 }, SHELF_GRADE);
    expect(r).toMatchObject({ status: 'needs_data', applied: 150, rated: null, missing: ['ratings.levV'] });
  });
});

describe('checksFor: which checks each category has', () => {
  it('lists the check names of api.md per category', () => {
    const names = (c: CheckedCategory) => checksFor(c, {}, {}, 25, SHELF_GRADE).map((r) => r.check);
    expect(names('capacitor')).toEqual(['capacitor.voltage']);
    expect(names('resistor')).toEqual(['resistor.voltage', 'resistor.power']);
    const transistor = ['transistor.current', 'transistor.voltage', 'transistor.power', 'transistor.junctionTemp'];
    expect(names('bjt')).toEqual(transistor);
    expect(names('mosfet')).toEqual(transistor);
    expect(names('diode')).toEqual(['diode.reverseVoltage', 'diode.current']);
    expect(names('led')).toEqual(['led.current']);
  });

  it('gives each check its unit and the policy limit\'s source', () => {
    const [jt] = checksFor('bjt', TO92_2N3904, { powerW: 0.1 }, 25, HI_REL).slice(3);
    expect(jt.unit).toBe('°C');
    expect(jt.limitSource).toEqual({ source: expect.stringContaining('EEE-INST-002'), confidence: 'M' });
    const [cap] = checksFor('capacitor', { ratedVoltageV: 50, dielectric: 'al_electrolytic' }, { voltageV: 10 }, 25, CAREFUL);
    expect(cap).toMatchObject({ unit: 'V', limit: 0.8, limitSource: { source: 'RAC Benign', confidence: 'C' } });
  });

  it('treats missing ratings and operating point as empty', () => {
    expect(checksFor('led', null, undefined, 25, SHELF_GRADE)[0].status).toBe('needs_data');
  });
});

it('resistorPowerFactor and resistor.power agree on the curve', () => {
  const r = resistorPower({ powerW: 0.25, resistanceOhm: 1 }, { powerW: 0, ambientC: 110 }, 25, SHELF_GRADE);
  expect(r.rated).toBeCloseTo(0.25 * resistorPowerFactor(110), 15);
});
