import { describe, expect, it } from 'vitest';
import { handReference } from './growth-reference-fixture';
import { normalQuantile } from './normal-quantile';
import { percentileOfWeighing } from './percentile-of-weighing';

// CDC weight-for-age, infant boys, age 0 (L, M, S and the published 97th percentile 4.446488308).
const cdcBirth = { L: 1.815151075, M: 3.530203168, S: 0.152385273 };

describe('percentileOfWeighing', () => {
  const reference = handReference([{ lms: cdcBirth, n: 500 }, { weights: [3, 6, 7, 8, 8, 10, 13, 15, 16, 20] }]);

  it('places the CDC 97th-percentile weight at the 97th percentile (normalCdf precision)', () => {
    const result = percentileOfWeighing(reference, 3.5, 4.446488308)!;
    expect(result.method).toBe('lms');
    expect(result.z).toBeCloseTo(1.880793608, 6);
    expect(result.percentile).toBeCloseTo(97, 4);
    expect(percentileOfWeighing(reference, 3.5, cdcBirth.M)!.percentile).toBeCloseTo(50, 4);
  });

  it('uses the mid-rank share in an empirical band: 8 among the Hyndman & Fan data is (3 + ½·2)/10', () => {
    const result = percentileOfWeighing(reference, 10, 8)!;
    expect(result).toEqual({ z: normalQuantile(0.4), percentile: 40, method: 'empirical', n: 10 });
    expect(percentileOfWeighing(reference, 10, 1)!.percentile).toBe(5); // kept within ½/n
    expect(percentileOfWeighing(reference, 10, 99)!.percentile).toBe(95);
  });

  it('is null where the reference has nothing and rejects a non-positive weight', () => {
    expect(percentileOfWeighing(reference, 30, 100)).toBeNull();
    expect(() => percentileOfWeighing(reference, 3, 0)).toThrow('percentileOfWeighing requires a positive weight (got 0)');
  });
});
