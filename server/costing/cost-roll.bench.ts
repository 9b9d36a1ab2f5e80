import { bench, describe } from 'vitest';
import { costRoll, prepareCostRoll, rollPrepared } from './cost-roll';
import { volumeCurve } from './curve';
import { bigBomInput } from './test-big-bom';

// Run with `npx vitest bench server/costing --run`. The target: a 10,000-line BOM with
// 4 quotes × 5 breaks per part rolls well under a second in Node.
const input = bigBomInput(10_000);
const prepared = prepareCostRoll(input);
rollPrepared(prepared, 5000); // fill the lazily parsed prices and buy-up candidates

describe('cost roll, 10,000 lines × 4 quotes × 5 breaks', () => {
  bench('costRoll: prepare + roll + line output (one API request)', () => {
    costRoll(input);
  }, { iterations: 5, warmupIterations: 1 });

  bench('rollPrepared: roll again on prepared data, totals only', () => {
    rollPrepared(prepared, 5000, { lines: false });
  }, { iterations: 5, warmupIterations: 1 });

  bench('volumeCurve: 4 quantities', () => {
    volumeCurve(input, [1000, 5000, 10_000, 50_000]);
  }, { iterations: 3, warmupIterations: 1 });
});
