import { describe, expect, it } from 'vitest';
import { costRoll } from './cost-roll';
import { volumeCurve } from './curve';
import { dec, roundHalfUp } from './decimal';
import { torchMaterialInput } from './worked-example.fixture';

describe('volume curve', () => {
  it('gives at each quantity the same totals as a cost roll at that quantity', () => {
    const input = torchMaterialInput(1);
    input.lines.push({ id: 'line-nre', kind: 'tooling', qtyPerUnit: '1', oneTimeCost: '3100' });
    const quantities = [1000, 5000, 10_000, 50_000];
    const curve = volumeCurve(input, quantities);
    expect(curve.points.map((p) => p.qty)).toEqual(quantities);
    for (const point of curve.points) {
      const single = costRoll({ ...input, bom: { ...input.bom, qty: point.qty } });
      const { lines: _ignored, ...rest } = single;
      expect(_ignored.length).toBe(input.lines.length);
      expect(point).toEqual(rest);
    }
  });

  it('shows the §5.2 material cost per unit falling from 0.3575 to 0.2080 between 1,000 and 10,000 (cp, local)', () => {
    const curve = volumeCurve(torchMaterialInput(1), [1000, 10_000]);
    expect(curve.points.map((p) => roundHalfUp(dec(p.totals.landedPerUnit), 4).toFixed(4))).toEqual(['0.3575', '0.2080']);
  });
});
