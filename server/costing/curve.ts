import type { FxIndex } from './fx';
import { prepareCostRoll, rollPrepared } from './cost-roll';
import type { CostRollInput, CostRollResult, CurvePoint, VolumeCurveResult } from './types';

function withoutLines(result: CostRollResult): CurvePoint {
  const point: Partial<CostRollResult> = { ...result };
  delete point.lines;
  return point as CurvePoint;
}

/**
 * The volume curve: the cost roll at each build quantity. Parts, quotes, FX index, duty
 * rates and converted profile amounts are prepared once and reused for every quantity;
 * each point carries the totals, breakdowns, warnings and left-out lines, not the lines.
 * `input.bom.qty` is ignored in favour of `quantities`.
 */
export function volumeCurve(input: CostRollInput, quantities: number[], fxIndex?: FxIndex): VolumeCurveResult {
  const prepared = prepareCostRoll(input, fxIndex);
  const points = quantities.map((qty) => withoutLines(rollPrepared(prepared, qty, { lines: false })));
  return { date: prepared.date, currency: prepared.currency, points };
}
