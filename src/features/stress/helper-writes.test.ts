import { describe, expect, it } from 'vitest';
import { computeMultiplier, computeResistorString } from '../../../server/derating';
import { multiplierWrites, resistorStringWrite } from './helper-writes';
import type { LineRef } from './line-ref';

const line = (id: string, refDes: string, version = 3): LineRef => ({
  id,
  version,
  refDes,
  qtyPerUnit: '1',
  partId: '9',
  operatingPoint: { voltageV: null, currentA: null, powerW: null, ambientC: null },
});
const lines = new Map([line('c', 'C1-C6'), line('d', 'D1-D6', 7), line('c1', 'C1'), line('c2', 'C2')].map((l) => [l.id, l]));

// Three stages at 1.2 kV peak: C1 sees Vpk, the other capacitors and every diode 2·Vpk [CW; confirmed].
const cw = computeMultiplier({ stages: 3, vPeakV: 1200, loadCurrentA: 100e-6, frequencyHz: 50_000, capacitanceF: 1e-9 });

describe('writing a multiplier into lines', () => {
  it('gives every chosen capacitor line the highest capacitor stress and every diode line the diode stress and current', () => {
    const writes = multiplierWrites(cw, { mode: 'highest', capacitorLines: ['c'], diodeLines: ['d'] }, lines);
    expect(writes).toEqual([
      { id: 'c', version: 3, operatingPoint: { voltageV: 2400 } },
      { id: 'd', version: 7, operatingPoint: { voltageV: 2400, currentA: 100e-6 } },
    ]);
  });

  it('by position, a line takes the highest of the positions it holds', () => {
    const onlyC1 = multiplierWrites(cw, { mode: 'positions', byPosition: { C1: 'c1', C2: 'c2' } }, lines);
    expect(onlyC1).toEqual([
      { id: 'c1', version: 3, operatingPoint: { voltageV: 1200 } },
      { id: 'c2', version: 3, operatingPoint: { voltageV: 2400 } },
    ]);
    const shared = multiplierWrites(cw, { mode: 'positions', byPosition: { C1: 'c1', C3: 'c1', D1: null } }, lines);
    expect(shared).toEqual([{ id: 'c1', version: 3, operatingPoint: { voltageV: 2400 } }]);
  });

  it('leaves out a line that is no longer in the BOM', () => {
    expect(multiplierWrites(cw, { mode: 'highest', capacitorLines: ['gone'], diodeLines: [] }, lines)).toEqual([]);
  });
});

describe('writing a resistor string into a line', () => {
  it('writes the worst-case voltage of one resistor, V(1+t)/((1+t)+(n−1)(1−t)), at the line version', () => {
    // 760 V over 22 MΩ 1206 chips with a 200 V LEV, 5 %, limit 80 % of rating (common practice): six resistors.
    const r = computeResistorString({ totalV: 760, resistanceOhm: 22e6, powerW: 0.25, levV: 200, tolerancePct: 5, limit: 0.8 });
    expect(r.count).toBe(6);
    const write = resistorStringWrite(r, line('r', 'R10-R15', 4));
    expect(write.version).toBe(4);
    expect(write.operatingPoint.voltageV).toBeCloseTo((760 * 1.05) / (1.05 + 5 * 0.95), 9);
  });
});
