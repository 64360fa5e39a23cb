import { describe, expect, it } from 'vitest';
import { denseRelationshipMatrix } from './dense-relationship-matrix';
import { inbreedingCoefficients } from './inbreeding-coefficients';
import { mulberry32 } from './random';
import { syntheticPedigree } from './synthetic-pedigree';

/** A random pedigree: each animal's parents drawn among earlier animals, sometimes unknown. */
function randomPedigree(n: number, seed: number): { sire: Int32Array; dam: Int32Array } {
  const rng = mulberry32(seed);
  const sire = new Int32Array(n).fill(-1);
  const dam = new Int32Array(n).fill(-1);
  for (let i = 3; i < n; i++) {
    if (rng() < 0.9) sire[i] = Math.floor(rng() * i);
    if (rng() < 0.9) dam[i] = Math.floor(rng() * i);
  }
  return { sire, dam };
}

describe('inbreedingCoefficients', () => {
  // Falconer & Mackay (1996) ch. 5: offspring of full sibs 0.25, of parent × offspring 0.25,
  // of half sibs 0.125, of first cousins 0.0625.
  it('gives the textbook values of Falconer & Mackay (1996)', () => {
    const fullSibs = inbreedingCoefficients({ sire: [-1, -1, 0, 0, 2], dam: [-1, -1, 1, 1, 3] });
    expect(fullSibs[4]).toBe(0.25);
    const parentOffspring = inbreedingCoefficients({ sire: [-1, -1, 0, 0], dam: [-1, -1, 1, 2] });
    expect(parentOffspring[3]).toBe(0.25);
    const halfSibs = inbreedingCoefficients({ sire: [-1, -1, -1, 0, 0, 3], dam: [-1, -1, -1, 1, 2, 4] });
    expect(halfSibs[5]).toBe(0.125);
    // grandparents 0 × 1 → full sibs 2, 3; their mates 4, 5; cousins 6 (2 × 4), 7 (5 × 3); 8 = 6 × 7
    const cousins = inbreedingCoefficients({ sire: [-1, -1, 0, 0, -1, -1, 2, 5, 6], dam: [-1, -1, 1, 1, -1, -1, 4, 3, 7] });
    expect(cousins[8]).toBe(0.0625);
  });

  // Wright's path formula by hand. 3 = 0 × 1 and 4 = 0 × 2 are half sibs, so their offspring
  // 5 has F_5 = (½)³ = 0.125. 7 = 5 × 6 and 9 = 5 × 8 are half sibs through 5; every path
  // through an older ancestor passes 5 twice, so for 10 = 7 × 9 only A = 5 counts:
  // F_10 = (½)³ · (1 + F_5) = 0.125 · 1.125 = 0.140625.
  it("matches Wright's path formula with an inbred common ancestor", () => {
    const sire = [-1, -1, -1, 0, 0, 3, -1, 5, -1, 5, 7];
    const dam = [-1, -1, -1, 1, 2, 4, -1, 6, -1, 8, 9];
    const F = inbreedingCoefficients({ sire, dam });
    expect(F[5]).toBe(0.125);
    expect(F[10]).toBeCloseTo(0.140625, 15);
  });

  it('matches the tabular method (F = a_ii − 1) on random and line-bred pedigrees', () => {
    const pedigrees = [
      randomPedigree(120, 1),
      randomPedigree(200, 2),
      syntheticPedigree(400, { seed: 5, herdsPerPopulation: 2, bucksPerHerd: 2, doesPerHerd: 4, littersPerDoe: 1, meanLitterSize: 3, closeMatingRate: 0.3 }),
    ];
    for (const pedigree of pedigrees) {
      const F = inbreedingCoefficients(pedigree);
      const A = denseRelationshipMatrix(pedigree);
      let maxF = 0;
      for (let i = 0; i < F.length; i++) {
        expect(F[i]).toBeCloseTo(A[i][i] - 1, 12);
        maxF = Math.max(maxF, F[i]);
      }
      expect(maxF).toBeGreaterThan(0.2); // the check is not vacuous
    }
  });

  it('handles selfing (sire = dam): F = ½(1 + F_parent)', () => {
    const F = inbreedingCoefficients({ sire: [-1, 0, 1], dam: [-1, 0, 1] });
    expect(F[1]).toBe(0.5);
    expect(F[2]).toBe(0.75);
  });

  it('rejects a malformed pedigree', () => {
    expect(() => inbreedingCoefficients({ sire: [-1, 1], dam: [-1, -1] })).toThrow(/^inbreedingCoefficients requires parents to precede offspring/);
  });
});
