import { describe, expect, it } from 'vitest';
import type { KeepersReport } from '../contracts/analytics';
import { componentWords, explainKeeper, type KeeperCandidate, standing } from './keeper-explanation';
import { ordinal } from './ordinal';

const trait: KeepersReport['trait'] = { key: 'weight_12w', label: 'Weight at 12 weeks', kind: 'weight', unit: 'grams', standardAgeDays: 84, toleranceDays: 10 };
const COMPONENTS = ['breedingValue', 'ownEvaluation', 'weightOnTarget', 'parentsPlacementIndex', 'inbreeding'] as const;

/** An invented junior: each component's z (weight 1, so contribution = z) and raw value. */
function candidate(rank: number, z: number[], values: (number | null)[] = [0.4, 80, -7, 1.21, 0.0625], more: Partial<KeeperCandidate> = {}): KeeperCandidate {
  return {
    animal: { id: rank, rabbitryId: 7, earId: `BF${rank}`, name: null, sex: 'doe', breedId: 1, breed: 'Mini Rex', variety: 'Blue', line: null, birthDate: '2026-07-18', status: 'active', isStub: false },
    ageDays: 136, rank, total: z.reduce((s, v) => s + v, 0),
    components: COMPONENTS.map((component, i) => ({ component, label: component, value: values[i] ?? null, z: z[i]!, weight: 1, contribution: z[i]! })),
    latestWeight: null,
    projectedSeniorWeight: {
      ageDays: 365, grams: 1792, lower: 1594, upper: 1871, percentile: 27, z: -0.61, weighingsUsed: 3,
      check: { status: 'within-limits', disqualificationRisk: false, gramsFromIdeal: -136 }, upperOverMaximum: false,
    },
    weightFlags: [], disqualificationRisk: false, keeperDecision: null, explanation: [], ...more,
  };
}

describe('keeper explanations in words', () => {
  it('says a standardised score as a standing among the juniors', () => {
    expect([1.2, 1, 0.3, 0, -0.24, -0.6, -1.5].map(standing)).toEqual(['strong', 'strong', 'good', 'average', 'average', 'below-average', 'weak']);
    expect([1, 2, 3, 4, 11, 12, 13, 21, 22, 23, 101, 111].map(ordinal)).toEqual(['1st', '2nd', '3rd', '4th', '11th', '12th', '13th', '21st', '22nd', '23rd', '101st', '111th']);
  });

  it('explains a rank by the three components that moved it most, in the reader’s unit', () => {
    // contributions 1.27, 0, 0.45, −0.45, 0.45: the largest three by size are breeding value, then the 0.45s in order.
    const a = candidate(1, [1.27, 0, 0.45, -0.45, 0.45], [-0.34, null, -7.0, 1.21, 0.205]);
    const b = candidate(2, [-0.26, 0, 0.89, -0.45, 0.45]);
    // 1792 g = 63.2 oz → 3 lb 15 oz (1 lb = 453.59237 g, NIST Handbook 44 App. C).
    expect(explainKeeper(a, [a, b], trait, 'lb-oz')).toEqual([
      'Ranked 1st of 2: strong breeding value for weight at 12 weeks; projected senior weight 3 lb 15 oz, 7 % under the ideal; '
      + "parents' offspring place above chance (index 1.21); not evaluated yet (counted as average).",
    ]);
  });

  it('marks ties and disqualification risks, and speaks kilograms to a kg reader', () => {
    const risky = candidate(2, [-1.48, 0.04, 0.8, 1.79, -1.79], undefined, {
      weightFlags: [{ kind: 'projected', status: 'over-maximum', disqualificationRisk: true, message: 'Projected over the senior maximum: disqualification risk.' }],
      disqualificationRisk: true,
    });
    const other = candidate(2, [0, 0, 0, 0, 0]);
    const [text, risk] = explainKeeper(risky, [other, risky], trait, 'kg');
    expect(text).toMatch(/^Ranked 2nd \(tied\) of 2: /);
    expect(text).toContain('more than the others');
    expect(risk).toBe('Projected over the senior maximum: disqualification risk.');
    expect(componentWords(risky.components[2]!, risky, trait, 'kg')).toBe('projected senior weight 1.79 kg, 7 % under the ideal');
  });

  it('says when every weighted component sits at the average', () => {
    const flat = candidate(1, [0, 0, 0, 0, 0]);
    expect(explainKeeper(flat, [flat], trait, 'lb-oz')).toEqual(['Ranked 1st of 1: every weighted component is at the average of these juniors.']);
  });
});
