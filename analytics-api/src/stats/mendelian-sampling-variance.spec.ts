import { describe, expect, it } from 'vitest';
import { mendelianSamplingVariance } from './mendelian-sampling-variance';

// Mrode (2014) §2.3: d = ½ − ¼(F_s + F_d), ¾ − ¼F_p, or 1.
describe('mendelianSamplingVariance', () => {
  const F = [0, 0.25, 0.5];
  it('is ½ with both parents known and not inbred, ¾ with one, 1 with none', () => {
    expect(mendelianSamplingVariance(0, 0, F)).toBe(0.5);
    expect(mendelianSamplingVariance(0, -1, F)).toBe(0.75);
    expect(mendelianSamplingVariance(-1, 0, F)).toBe(0.75);
    expect(mendelianSamplingVariance(-1, -1, F)).toBe(1);
  });

  it('shrinks with the parents inbreeding', () => {
    expect(mendelianSamplingVariance(1, 2, F)).toBeCloseTo(0.5 - 0.25 * 0.75, 15);
    expect(mendelianSamplingVariance(-1, 2, F)).toBeCloseTo(0.75 - 0.125, 15);
  });
});
