import { jStat } from 'jstat';
import { describe, expect, it } from 'vitest';
import { distributionSummary } from './distribution-summary';

describe('distributionSummary', () => {
  it('gives type-7 quartiles: Hyndman & Fan (1996) data → 7.25, 9, 14.5 (as jStat.percentile)', () => {
    const data = [16, 3, 8, 20, 6, 13, 7, 8, 10, 15];
    const summary = distributionSummary(data);
    expect(summary).toEqual({ n: 10, min: 3, q1: 7.25, median: 9, q3: 14.5, max: 20, mean: 10.6 });
    expect(summary.q1).toBeCloseTo(jStat.percentile(data, 0.25), 12);
    expect(summary.q3).toBeCloseTo(jStat.percentile(data, 0.75), 12);
  });

  it('handles a single value and rejects none', () => {
    expect(distributionSummary([4])).toEqual({ n: 1, min: 4, q1: 4, median: 4, q3: 4, max: 4, mean: 4 });
    expect(() => distributionSummary([])).toThrow('distributionSummary requires at least 1 value');
  });
});
