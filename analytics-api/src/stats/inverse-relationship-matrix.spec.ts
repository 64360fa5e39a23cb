import { inverse, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { denseRelationshipMatrix } from './dense-relationship-matrix';
import { inbreedingCoefficients } from './inbreeding-coefficients';
import { inverseRelationshipMatrix } from './inverse-relationship-matrix';
import { syntheticPedigree } from './synthetic-pedigree';

function dense(m: ReturnType<typeof inverseRelationshipMatrix>): number[][] {
  const rows = Array.from({ length: m.n }, () => new Array<number>(m.n).fill(0));
  for (let r = 0; r < m.n; r++) for (let k = m.rowStart[r]; k < m.rowStart[r + 1]; k++) rows[r][m.column[k]] = m.value[k];
  return rows;
}

describe('inverseRelationshipMatrix', () => {
  // Mrode (2014) Example 3.1 pedigree, entries worked by hand from Henderson's rules; the book's
  // left-hand side shows α·11/6 = 3.667 for animal 1 (from memory).
  it("applies Henderson's rules to the Mrode (2014) Example 3.1 pedigree", () => {
    const pedigree = { sire: [-1, -1, -1, 0, 2, 0, 3, 2], dam: [-1, -1, -1, -1, 1, 1, 4, 5] };
    const Ainv = dense(inverseRelationshipMatrix(pedigree, inbreedingCoefficients(pedigree)));
    // animal 1 (index 0): 1 (own) + 1/3 (offspring 4, b = 4/3, ¼b) + ½ (offspring 6, b = 2, ¼b) = 11/6
    expect(Ainv[0][0]).toBeCloseTo(11 / 6, 14);
    // (1, 4): −½ · 4/3 = −2/3
    expect(Ainv[0][3]).toBeCloseTo(-2 / 3, 14);
  });

  it('is the inverse of the tabular A (ml-matrix inverse) on an inbred pedigree', () => {
    const pedigree = syntheticPedigree(150, { seed: 6, herdsPerPopulation: 2, bucksPerHerd: 2, doesPerHerd: 4, littersPerDoe: 1, meanLitterSize: 3, closeMatingRate: 0.3, unknownParentRate: 0.1 });
    const F = inbreedingCoefficients(pedigree);
    expect(Math.max(...F)).toBeGreaterThan(0.2);
    const sparse = inverseRelationshipMatrix(pedigree, F);
    const reference = inverse(new Matrix(denseRelationshipMatrix(pedigree).map((row) => Array.from(row))));
    const ours = dense(sparse);
    let largestError = 0;
    for (let i = 0; i < 150; i++) for (let j = 0; j < 150; j++) largestError = Math.max(largestError, Math.abs(ours[i][j] - reference.get(i, j)));
    expect(largestError).toBeLessThan(1e-8);
    expect(sparse.value.length).toBeLessThanOrEqual(7 * 150);
  });

  it('rejects an F of the wrong length', () => {
    expect(() => inverseRelationshipMatrix({ sire: [-1], dam: [-1] }, [])).toThrow('inverseRelationshipMatrix requires F of length 1 (got 0)');
  });
});
