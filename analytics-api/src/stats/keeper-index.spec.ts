import { describe, expect, it } from 'vitest';
import { keeperIndex } from './keeper-index';

// Worked by hand. breedingValue 1, 2, 3: mean 2, SD 1 → z −1, 0, 1.
// inbreeding 0.10, 0.00, 0.20: mean 0.1, SD 0.1, a penalty → z 0, 1, −1.
// weights breedingValue 2, inbreeding 1 → totals A −2, B 1, C 1.
const candidates = [
  { id: 'A', components: { breedingValue: 1, inbreeding: 0.1, ownEvaluation: null } },
  { id: 'B', components: { breedingValue: 2, inbreeding: 0, ownEvaluation: 80 } },
  { id: 'C', components: { breedingValue: 3, inbreeding: 0.2, ownEvaluation: 90 } },
];

describe('keeperIndex', () => {
  it('adds weighted z-scores, inbreeding as a penalty, and shares ranks on equal totals', () => {
    const scores = keeperIndex(candidates, { breedingValue: 2, inbreeding: 1 });
    expect(scores.map((s) => [s.id, s.total, s.rank])).toEqual([
      ['B', expect.closeTo(1, 12), 1],
      ['C', expect.closeTo(1, 12), 1],
      ['A', expect.closeTo(-2, 12), 3],
    ]);
    const c = scores.find((s) => s.id === 'C')!;
    expect(c.contributions.map((x) => [x.component, x.z, x.contribution])).toEqual([
      ['breedingValue', expect.closeTo(1, 12), expect.closeTo(2, 12)],
      ['inbreeding', expect.closeTo(-1, 12), expect.closeTo(-1, 12)],
    ]);
  });

  it("counts a missing component as the candidates' average, its value kept null", () => {
    // ownEvaluation 80, 90: mean 85, SD 7.071 → B −0.7071, C 0.7071, A missing → 0
    const scores = keeperIndex(candidates, { ownEvaluation: 1 });
    const a = scores.find((s) => s.id === 'A')!;
    expect(a.total).toBe(0);
    expect(a.contributions).toEqual([{ component: 'ownEvaluation', value: null, z: 0, weight: 1, contribution: 0 }]);
    expect(scores.find((s) => s.id === 'C')!.total).toBeCloseTo(Math.SQRT1_2, 12);
  });

  it('lets the caller reverse a direction', () => {
    const scores = keeperIndex(candidates, { breedingValue: 1 }, { breedingValue: -1 });
    expect(scores[0].id).toBe('A');
  });

  it('rejects non-finite weights', () => {
    expect(() => keeperIndex(candidates, { breedingValue: Number.NaN })).toThrow('keeperIndex requires a finite weight for breedingValue');
  });
});
