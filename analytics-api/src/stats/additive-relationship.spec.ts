import { describe, expect, it } from 'vitest';
import { additiveRelationship } from './additive-relationship';
import { denseRelationshipMatrix } from './dense-relationship-matrix';
import { inbreedingCoefficients } from './inbreeding-coefficients';
import { mulberry32 } from './random';
import { syntheticPedigree } from './synthetic-pedigree';

describe('additiveRelationship', () => {
  // Falconer & Mackay (1996) ch. 5: full sibs ½, half sibs ¼, parent–offspring ½.
  it('gives the textbook relationships', () => {
    const pedigree = { sire: [-1, -1, -1, 0, 0, 0], dam: [-1, -1, -1, 1, 1, 2] };
    const F = inbreedingCoefficients(pedigree);
    expect(additiveRelationship(pedigree, F, 3, 4)).toBe(0.5);
    expect(additiveRelationship(pedigree, F, 3, 5)).toBe(0.25);
    expect(additiveRelationship(pedigree, F, 0, 5)).toBe(0.5);
    expect(additiveRelationship(pedigree, F, 1, 2)).toBe(0);
    expect(additiveRelationship(pedigree, F, 3, 3)).toBe(1);
  });

  it('matches the tabular method on line-bred pedigrees, both orders of the pair', () => {
    const pedigree = syntheticPedigree(300, { seed: 8, herdsPerPopulation: 2, bucksPerHerd: 2, doesPerHerd: 4, littersPerDoe: 1, meanLitterSize: 3, closeMatingRate: 0.3 });
    const F = inbreedingCoefficients(pedigree);
    const A = denseRelationshipMatrix(pedigree);
    const rng = mulberry32(1);
    for (let t = 0; t < 300; t++) {
      const i = Math.floor(rng() * 300);
      const j = Math.floor(rng() * 300);
      expect(additiveRelationship(pedigree, F, i, j)).toBeCloseTo(A[i][j], 12);
      expect(additiveRelationship(pedigree, F, j, i)).toBeCloseTo(A[i][j], 12);
    }
  });

  it('rejects indexes outside the pedigree and an F of the wrong length', () => {
    const pedigree = { sire: [-1, -1], dam: [-1, -1] };
    expect(() => additiveRelationship(pedigree, [0, 0], 0, 2)).toThrow('additiveRelationship requires animal indexes in 0..1 (got 2)');
    expect(() => additiveRelationship(pedigree, [0], 0, 1)).toThrow('additiveRelationship requires sire, dam and F of equal length');
  });
});
