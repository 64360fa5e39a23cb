import { describe, expect, it } from 'vitest';
import { parseWeight } from '../units/weight';
import { checkWeightAgainstLimits } from './weight-check';

function g(text: string): number {
  const r = parseWeight(text, 'lb-oz');
  if (!r.ok) throw new Error(r.message);
  return r.grams;
}

// Check values (common practice, no source): a compact breed with a senior maximum of
// 6.5 lb (2948 g) and an ideal of 6 lb (2722 g); a minimum of 5 lb (2268 g) added for the test.
const compactSenior = { minGrams: g('5 lb'), idealGrams: g('6 lb'), maxGrams: g('6.5 lb') };

describe('checkWeightAgainstLimits', () => {
  it('6 lb 9 oz is over the 6.5 lb maximum: disqualification risk', () => {
    expect(checkWeightAgainstLimits(g('6 lb 9 oz'), compactSenior)).toEqual({
      status: 'over-maximum',
      disqualificationRisk: true,
      gramsFromIdeal: 2977 - 2722,
    });
  });

  it('6 lb 8 oz is exactly at the maximum and allowed', () => {
    const r = checkWeightAgainstLimits(g('6 lb 8 oz'), compactSenior);
    expect(r.status).toBe('within-limits');
    expect(r.disqualificationRisk).toBe(false);
  });

  it('6 lb 0 oz is on the ideal; the tolerance is 2 oz either side', () => {
    expect(checkWeightAgainstLimits(g('6 lb 0 oz'), compactSenior).status).toBe('on-ideal');
    expect(checkWeightAgainstLimits(g('6 lb 2 oz'), compactSenior).status).toBe('on-ideal');
    expect(checkWeightAgainstLimits(g('5 lb 14 oz'), compactSenior).status).toBe('on-ideal');
    expect(checkWeightAgainstLimits(g('6 lb 3 oz'), compactSenior).status).toBe('within-limits');
  });

  it('below the minimum is flagged; at the minimum is allowed', () => {
    expect(checkWeightAgainstLimits(g('4 lb 15 oz'), compactSenior).status).toBe('under-minimum');
    expect(checkWeightAgainstLimits(g('5 lb'), compactSenior).status).toBe('within-limits');
  });

  it('works with partial limits and none', () => {
    expect(checkWeightAgainstLimits(3000, { minGrams: null, idealGrams: null, maxGrams: 2948 }).status).toBe('over-maximum');
    expect(checkWeightAgainstLimits(3000, { minGrams: null, idealGrams: null, maxGrams: null }).status).toBe('no-limits');
    expect(checkWeightAgainstLimits(3000, null)).toEqual({ status: 'no-limits', disqualificationRisk: false, gramsFromIdeal: null });
    expect(() => checkWeightAgainstLimits(0, compactSenior)).toThrow(
      'checkWeightAgainstLimits requires a positive whole number of grams',
    );
  });
});
