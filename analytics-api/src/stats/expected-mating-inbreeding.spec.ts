import { describe, expect, it } from 'vitest';
import { expectedMatingInbreeding } from './expected-mating-inbreeding';
import { inbreedingCoefficients } from './inbreeding-coefficients';
import { mulberry32 } from './random';
import { syntheticPedigree } from './synthetic-pedigree';

describe('expectedMatingInbreeding', () => {
  it('gives 0.0625 for first cousins (Falconer & Mackay 1996, ch. 5)', () => {
    const pedigree = { sire: [-1, -1, 0, 0, -1, -1, 2, 5], dam: [-1, -1, 1, 1, -1, -1, 4, 3] };
    expect(expectedMatingInbreeding(pedigree, inbreedingCoefficients(pedigree), 6, 7)).toBe(0.0625);
  });

  it('equals the inbreeding of an offspring actually added to the pedigree', () => {
    const base = syntheticPedigree(500, { seed: 12, herdsPerPopulation: 2, bucksPerHerd: 2, doesPerHerd: 5, littersPerDoe: 1, meanLitterSize: 4 });
    const F = inbreedingCoefficients(base);
    const rng = mulberry32(3);
    for (let t = 0; t < 20; t++) {
      const sire = Math.floor(rng() * 500);
      const dam = Math.floor(rng() * 500);
      const withOffspring = { sire: [...base.sire, sire], dam: [...base.dam, dam] };
      const actual = inbreedingCoefficients(withOffspring)[500];
      expect(expectedMatingInbreeding(base, F, sire, dam)).toBeCloseTo(actual, 12);
    }
  });
});
