import { describe, expect, it } from 'vitest';
import { commonAncestorContributions } from './common-ancestor-contributions';
import { expectedMatingInbreeding } from './expected-mating-inbreeding';
import { inbreedingCoefficients } from './inbreeding-coefficients';
import type { Pedigree } from './pedigree';
import { mulberry32 } from './random';

/**
 * Wright's path formula by brute force: every pair of upward paths sire → A and dam → A that
 * share no animal but A adds (½)^(n₁+n₂+1)(1 + F_A), n₁ and n₂ the generations on each side.
 */
function wrightByPaths(pedigree: Pedigree, F: ArrayLike<number>, sire: number, dam: number): Map<number, number> {
  const paths = (start: number): number[][] => {
    const all: number[][] = [];
    const walk = (path: number[]): void => {
      all.push(path);
      const last = path[path.length - 1];
      for (const p of [pedigree.sire[last], pedigree.dam[last]]) if (p >= 0) walk([...path, p]);
    };
    walk([start]);
    return all;
  };
  const contributions = new Map<number, number>();
  for (const a of paths(sire)) {
    for (const b of paths(dam)) {
      const A = a[a.length - 1];
      if (b[b.length - 1] !== A) continue;
      const shared = a.filter((x) => b.includes(x));
      if (shared.length !== 1) continue;
      const value = 0.5 ** (a.length - 1 + b.length - 1 + 1) * (1 + F[A]);
      contributions.set(A, (contributions.get(A) ?? 0) + value);
    }
  }
  return contributions;
}

describe('commonAncestorContributions', () => {
  it('splits a first-cousin mating between the two shared grandparents, (½)⁵ each (Falconer & Mackay 1996)', () => {
    const pedigree = { sire: [-1, -1, 0, 0, -1, -1, 2, 5], dam: [-1, -1, 1, 1, -1, -1, 4, 3] };
    const result = commonAncestorContributions(pedigree, inbreedingCoefficients(pedigree), 6, 7);
    expect(result.expectedInbreeding).toBe(0.0625);
    expect(result.ancestors).toEqual([
      { animal: 0, contribution: 0.03125, share: 0.5 },
      { animal: 1, contribution: 0.03125, share: 0.5 },
    ]);
    expect(result.others).toBe(0);
  });

  it("credits only the youngest shared ancestor, as Wright's rule requires", () => {
    // 7 and 9 are half sibs through 5, whose own ancestors are reached only through 5
    const pedigree = { sire: [-1, -1, -1, 0, 0, 3, -1, 5, -1, 5], dam: [-1, -1, -1, 1, 2, 4, -1, 6, -1, 8] };
    const result = commonAncestorContributions(pedigree, inbreedingCoefficients(pedigree), 7, 9);
    expect(result.ancestors).toEqual([{ animal: 5, contribution: 0.140625, share: 1 }]);
  });

  it('credits a parent mated to its offspring', () => {
    const pedigree = { sire: [-1, -1, 0], dam: [-1, -1, 1] };
    const result = commonAncestorContributions(pedigree, inbreedingCoefficients(pedigree), 0, 2);
    expect(result.ancestors).toEqual([{ animal: 0, contribution: 0.25, share: 1 }]);
  });

  it("matches Wright's path formula enumerated by brute force, and sums to the expected inbreeding", () => {
    const rng = mulberry32(21);
    for (let trial = 0; trial < 6; trial++) {
      const n = 24;
      const sire = new Int32Array(n).fill(-1);
      const dam = new Int32Array(n).fill(-1);
      for (let i = 4; i < n; i++) {
        // parents among the previous 8 animals: a deep, tangled pedigree
        if (rng() < 0.9) sire[i] = i - 1 - Math.floor(rng() * Math.min(i, 8));
        if (rng() < 0.9) dam[i] = i - 1 - Math.floor(rng() * Math.min(i, 8));
      }
      const pedigree = { sire, dam };
      const F = inbreedingCoefficients(pedigree);
      const [s, d] = [n - 1, n - 2];
      const result = commonAncestorContributions(pedigree, F, s, d, 100);
      const expected = wrightByPaths(pedigree, F, s, d);
      expect(result.ancestors.length).toBe(expected.size);
      for (const a of result.ancestors) expect(a.contribution).toBeCloseTo(expected.get(a.animal)!, 12);
      expect(result.expectedInbreeding).toBeCloseTo(expectedMatingInbreeding(pedigree, F, s, d), 12);
      expect(result.expectedInbreeding).toBeGreaterThan(0);
    }
  });

  it('lists the top ancestors and sums the rest', () => {
    const pedigree = { sire: [-1, -1, 0, 0, -1, -1, 2, 5], dam: [-1, -1, 1, 1, -1, -1, 4, 3] };
    const result = commonAncestorContributions(pedigree, inbreedingCoefficients(pedigree), 6, 7, 1);
    expect(result.ancestors).toHaveLength(1);
    expect(result.others).toBe(0.03125);
  });

  it('stops with a clear error beyond the state budget', () => {
    const pedigree = { sire: [-1, -1, 0, 0, -1, -1, 2, 5], dam: [-1, -1, 1, 1, -1, -1, 4, 3] };
    expect(() => commonAncestorContributions(pedigree, inbreedingCoefficients(pedigree), 6, 7, 5, 1)).toThrow(/^commonAncestorContributions needs more than 1 lineage pair states/);
  });
});
