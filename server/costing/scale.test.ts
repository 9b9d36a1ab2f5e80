import { describe, expect, it } from 'vitest';
import { costRoll } from './cost-roll';
import { dec } from './decimal';
import { bigBomInput } from './test-big-bom';

describe('a 10,000-line BOM with 4 quotes × 5 breaks per part', () => {
  it('rolls every line and the totals add up', () => {
    const r = costRoll(bigBomInput(10_000));
    expect(r.lines).toHaveLength(10_000);
    expect(r.leftOut.count).toBe(0);
    expect(r.lines.every((l) => l.status === 'costed' && l.quoteId !== null)).toBe(true);
    const sum = r.lines.reduce((s, l) => s.plus(l.landed), dec(0));
    expect(sum.minus(r.totals.landedTotal).abs().lte('0.01')).toBe(true);
    expect(r.totals.freight).not.toBe('0.000000');
  });
});
