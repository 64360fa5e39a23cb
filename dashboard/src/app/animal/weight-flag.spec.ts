import type { AnimalProfile } from '@shared/contracts/animals';
import { weightFlag } from './weight-flag';

type Check = NonNullable<AnimalProfile['weightCheck']>;
// Limits of a small breed's senior doe in grams (invented for the test): 1474 / 1928 / 2041.
const check = (over: Partial<Check>): Check => ({
  grams: 2100, weighedOn: '2026-11-20', ageClass: 'senior', limits: { minGrams: 1474, idealGrams: 1928, maxGrams: 2041 },
  status: 'over-maximum', disqualificationRisk: true, gramsFromIdeal: 172, caution: 'c', ...over,
});

describe('weightFlag', () => {
  // Grams shown in lb-oz by the exact ounce 28.349523125 g (NIST Handbook 44): 2100 g = 74.07 oz → 4 lb 10 oz; 2041 g → 4 lb 8 oz.
  it('flags a weight over the maximum as a disqualification risk', () => {
    expect(weightFlag(check({}), 'lb-oz')).toEqual({
      tone: 'risk',
      text: 'Latest weight 4 lb 10 oz on 2026-11-20 (senior) is over the maximum of 4 lb 8 oz: disqualification risk.',
    });
  });

  it('flags a weight under the minimum too', () => {
    expect(weightFlag(check({ grams: 1400, status: 'under-minimum', gramsFromIdeal: -528 }), 'kg').text).toBe(
      'Latest weight 1.40 kg on 2026-11-20 (senior) is under the minimum of 1.47 kg: disqualification risk.',
    );
  });

  it('says how far a weight within the limits is from the ideal', () => {
    const flag = weightFlag(check({ grams: 1800, status: 'within-limits', disqualificationRisk: false, gramsFromIdeal: -128 }), 'kg');
    expect(flag).toEqual({ tone: 'ok', text: 'Latest weight 1.80 kg on 2026-11-20 (senior) is within the limits (1.47 kg to 2.04 kg), 0.13 kg under the ideal.' });
  });

  it('says so when the catalogue has no limits for the class', () => {
    expect(weightFlag(check({ status: 'no-limits', limits: null, disqualificationRisk: false, gramsFromIdeal: null, ageClass: 'junior' }), 'kg'))
      .toEqual({ tone: 'info', text: 'Latest weight 2.10 kg on 2026-11-20 (junior): the breed catalogue gives no limits for this class.' });
  });
});
