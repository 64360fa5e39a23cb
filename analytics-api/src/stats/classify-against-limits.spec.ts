import { describe, expect, it } from 'vitest';
import { classifyAgainstLimits } from './classify-against-limits';

// Invented limits: minimum 3000 g, ideal 3400 g, maximum 3800 g; ±2.5% of ideal = ±85 g.
const limits = { min: 3000, ideal: 3400, max: 3800 };

describe('classifyAgainstLimits', () => {
  it('places weights in the five classes, the limits themselves inside', () => {
    expect(classifyAgainstLimits(2999, limits)).toBe('under-minimum');
    expect(classifyAgainstLimits(3000, limits)).toBe('below-ideal');
    expect(classifyAgainstLimits(3315, limits)).toBe('on-ideal');
    expect(classifyAgainstLimits(3485, limits)).toBe('on-ideal');
    expect(classifyAgainstLimits(3486, limits)).toBe('above-ideal');
    expect(classifyAgainstLimits(3800, limits)).toBe('above-ideal');
    expect(classifyAgainstLimits(3801, limits)).toBe('over-maximum');
  });

  it('works without a minimum or maximum and with another tolerance', () => {
    expect(classifyAgainstLimits(1000, { ideal: 3400 })).toBe('below-ideal');
    expect(classifyAgainstLimits(3480, { ideal: 3400 }, 0.01)).toBe('above-ideal');
  });

  it('rejects limits out of order', () => {
    expect(() => classifyAgainstLimits(3000, { min: 3500, ideal: 3400 })).toThrow('classifyAgainstLimits requires min ≤ ideal ≤ max (got 3500 ≤ 3400 ≤ null)');
  });
});
