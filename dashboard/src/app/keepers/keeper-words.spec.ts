import { candidate, keepersReport } from './keeper-fixtures';
import { componentWords, explainKeeper, standing } from './keeper-words';

const trait = keepersReport([]).trait;

describe('keeper explanations in words', () => {
  it('says a standardised score as a standing among the juniors', () => {
    expect([1.2, 1, 0.3, 0, -0.24, -0.6, -1.5].map(standing)).toEqual(['strong', 'strong', 'good', 'average', 'average', 'below-average', 'weak']);
  });

  it('explains a rank by the three components that moved it most, in the user’s unit', () => {
    // contributions 1.27, 0, 0.45, −0.45, 0.45 (weights 1): the largest three by size are breeding value, then the 0.45s in order.
    const a = candidate({ id: 1, earId: 'BF177', rank: 1, z: [1.27, 0, 0.45, -0.45, 0.45], values: [-0.34, null, -7.0, 1.21, 0.205] });
    const b = candidate({ id: 2, earId: 'BF179', rank: 2, z: [-0.26, 0, 0.89, -0.45, 0.45] });
    const text = explainKeeper(a, [a, b], trait, 'lb-oz');
    // 1792 g = 63.2 oz → 3 lb 15 oz (1 lb = 453.59237 g, NIST Handbook 44 App. C).
    expect(text).toBe(
      'Ranked 1st of 2: strong breeding value for weight at 12 weeks; projected senior weight 3 lb 15 oz, 7 % under the ideal; '
      + "parents' offspring place above chance (index 1.21); not evaluated yet (counted as average).",
    );
  });

  it('marks ties and disqualification risks, and speaks kilograms to a kg user', () => {
    const risky = candidate({
      id: 3, earId: 'BF175', rank: 2, z: [-1.48, 0.04, 0.8, 1.79, -1.79],
      weightFlags: [{ kind: 'projected', status: 'over-maximum', disqualificationRisk: true, message: 'Projected over the senior maximum: disqualification risk.' }],
      disqualificationRisk: true,
    });
    const other = candidate({ id: 4, earId: 'BF176', rank: 2, z: [0, 0, 0, 0, 0] });
    const text = explainKeeper(risky, [other, risky], trait, 'kg');
    expect(text).toMatch(/^Ranked 2nd \(tied\) of 2: /);
    expect(text).toContain('more than the others');
    expect(text).toMatch(/Projected over the senior maximum: disqualification risk\.$/);
    expect(componentWords(risky.components[2]!, risky, trait, 'kg')).toBe('projected senior weight 1.79 kg, 5 % under the ideal');
  });

  it('says when every weighted component sits at the average', () => {
    const flat = candidate({ id: 5, earId: 'BF180', rank: 1, z: [0, 0, 0, 0, 0] });
    expect(explainKeeper(flat, [flat], trait, 'lb-oz')).toBe('Ranked 1st of 1: every weighted component is at the average of these juniors.');
  });
});
