import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { dischargeForm, fractionToPercentText, junctionTempForm, multiplierForm, percentAsFraction, resistorStringForm } from './inputs';

describe('circuit helper forms', () => {
  it('read the trade notations into base units (IEC 60062 letter codes and SI prefixes)', () => {
    const m = multiplierForm.parse({ stages: '3', vPeakV: '1.2kV', loadCurrentA: '100uA', frequencyHz: '50kHz', capacitanceF: '1n', limit: '70 %' });
    expect(m).toEqual({ stages: 3, vPeakV: 1200, loadCurrentA: 100e-6, frequencyHz: 50_000, capacitanceF: 1e-9, limit: 0.7 });
    const r = resistorStringForm.parse({ totalV: '760V', resistanceOhm: '22M', powerW: '1/4W', levV: '200', tolerancePct: '5%', limit: '80' });
    expect(r).toEqual({ totalV: 760, resistanceOhm: 22e6, powerW: 0.25, levV: 200, tolerancePct: 5, limit: 0.8 });
  });

  it('leave an empty optional box out and read times and thermal resistances with their units', () => {
    expect(multiplierForm.parse({ stages: '1', vPeakV: '2kV', loadCurrentA: '0', frequencyHz: '50Hz', capacitanceF: '10n', limit: '' }).limit).toBeUndefined();
    expect(dischargeForm.parse({ capacitanceF: '2n2', resistanceOhm: '44M', v0V: '2.4kV', safeV: '60V', deadlineS: '500 ms' }).deadlineS).toBe(0.5);
    expect(dischargeForm.parse({ capacitanceF: '2n2', resistanceOhm: '44M', v0V: '2.4kV', safeV: '60V', deadlineS: '' }).deadlineS).toBeUndefined();
    const j = junctionTempForm.parse({ ambientC: '40°C', powerW: '250mW', rthJaCPerW: '250 °C/W', tjMaxC: '150', tjLimitC: '' });
    expect(j).toEqual({ ambientC: 40, powerW: 0.25, rthJaCPerW: 250, tjMaxC: 150, tjLimitC: undefined });
  });

  it('name the field that is wrong', () => {
    const bad = multiplierForm.safeParse({ stages: '2.5', vPeakV: '700mA', loadCurrentA: '', frequencyHz: '50kHz', capacitanceF: '1n', limit: 'lots' });
    expect(bad.success).toBe(false);
    const paths = bad.error!.issues.map((i) => i.path.join('.')).sort();
    expect(paths).toEqual(['limit', 'loadCurrentA', 'stages', 'vPeakV']);
  });

  it('a limit typed as a percentage comes back as the same percentage', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10000 }), (hundredths) => {
        const typed = String(hundredths / 100);
        const fraction = percentAsFraction.parse(typed);
        expect(fractionToPercentText(fraction)).toBe(typed);
      }),
    );
  });
});
