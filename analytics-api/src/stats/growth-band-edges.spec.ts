import { describe, expect, it } from 'vitest';
import { growthBandEdges } from './growth-band-edges';

const repeat = (age: number, n: number) => Array.from({ length: n }, () => age);

describe('growthBandEdges', () => {
  // Worked by hand with fineDays 7, fineUntilDays 14, blockDays 28, minBandSize 3, maxBandDays 56, untilDays 182.
  const options = { fineDays: 7, fineUntilDays: 14, blockDays: 28, minBandSize: 3, maxBandDays: 56, untilDays: 182 };

  it('keeps fine bands while young and joins later blocks until each band holds enough weighings', () => {
    // blocks 14–42: 3 → a band; 42–70: 1 and 70–98: 2 → one band 42–98; 98–126: 1, 126–154: 1 → 2 within 56 days: stop.
    const ages = [1, 9, ...repeat(20, 3), 50, ...repeat(80, 2), 100, 130];
    expect(growthBandEdges(ages, options)).toEqual({ edges: [0, 7, 14, 42, 98], thinsOutFromDays: 98, beyond: 2 });
  });

  it('reaches the last age when every band fills, counting later weighings as beyond', () => {
    const ages = [...repeat(20, 3), ...repeat(50, 3), ...repeat(80, 3), ...repeat(110, 3), ...repeat(140, 3), ...repeat(170, 3), 400];
    expect(growthBandEdges(ages, options)).toEqual({ edges: [0, 7, 14, 42, 70, 98, 126, 154, 182], thinsOutFromDays: null, beyond: 1 });
  });

  it('stops at the fine bands when nothing older is weighed', () => {
    expect(growthBandEdges([3, 10], options)).toEqual({ edges: [0, 7, 14], thinsOutFromDays: 14, beyond: 0 });
    expect(growthBandEdges([]).edges).toHaveLength(27);
  });

  it('rejects options it cannot use and ages that are not numbers', () => {
    expect(() => growthBandEdges([], { fineUntilDays: 20 })).toThrow(/fineUntilDays a multiple of fineDays/);
    expect(() => growthBandEdges([Number.NaN])).toThrow('growthBandEdges requires finite ages');
  });
});
