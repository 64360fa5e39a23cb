import { jStat } from 'jstat';
import { describe, expect, it } from 'vitest';
import { halfSibHeritability } from './half-sib-heritability';
import { mulberry32, randomNormal } from './random';

// Dyestuff (Davies & Goldsmith 1972, as shipped with R's lme4): 6 batches × 5 yields.
const dyestuff = [
  [1545, 1440, 1440, 1520, 1580],
  [1540, 1555, 1490, 1560, 1495],
  [1595, 1550, 1605, 1510, 1560],
  [1445, 1440, 1595, 1465, 1545],
  [1595, 1630, 1515, 1635, 1625],
  [1520, 1455, 1450, 1480, 1445],
];

describe('halfSibHeritability', () => {
  it('reproduces the one-way ANOVA of the Dyestuff data', () => {
    const result = halfSibHeritability(dyestuff);
    expect(result.msBetween).toBeCloseTo(11271.5, 6);
    expect(result.msWithin).toBeCloseTo(2451.25, 6);
    expect(result.dfBetween).toBe(5);
    expect(result.dfWithin).toBe(24);
    expect(result.f).toBeCloseTo(4.598266, 6);
    expect(result.f).toBeCloseTo(jStat.anovafscore(...dyestuff), 10); // confirmed with jStat.anovafscore
    expect(result.k0).toBe(5);
    expect(result.sireVariance).toBeCloseTo(1764.05, 6);
    expect(result.t).toBeCloseTo(0.4184874, 7);
    expect(result.h2).toBeCloseTo(4 * 0.4184874, 6);
    expect(result.warnings).toEqual(expect.arrayContaining([expect.stringMatching(/only 6 sires/), expect.stringMatching(/only 30 offspring/)]));
  });

  it('uses the unbalanced k₀ = (N − Σn²/N)/(s − 1): sizes 2, 3, 5 give 3.1', () => {
    const result = halfSibHeritability([
      [10, 12],
      [9, 11, 13],
      [14, 15, 13, 16, 12],
    ]);
    expect(result.k0).toBeCloseTo(3.1, 14);
    expect(result.f).toBeCloseTo(jStat.anovafscore([10, 12], [9, 11, 13], [14, 15, 13, 16, 12]), 10);
  });

  it('has a standard error (Swiger et al. 1964) close to the spread of estimates in simulated unbalanced data', () => {
    // t = 0.1 (h² = 0.4); 60 sires with 4–16 offspring each
    const rng = mulberry32(44);
    const t = 0.1;
    const sizes = Array.from({ length: 60 }, () => 4 + Math.floor(rng() * 13));
    const estimates: number[] = [];
    const ses: number[] = [];
    for (let replicate = 0; replicate < 400; replicate++) {
      const groups = sizes.map((size) => {
        const sireEffect = Math.sqrt(t) * randomNormal(rng);
        return Array.from({ length: size }, () => sireEffect + Math.sqrt(1 - t) * randomNormal(rng));
      });
      const result = halfSibHeritability(groups);
      estimates.push(result.h2);
      ses.push(result.se);
    }
    const mean = estimates.reduce((a, b) => a + b, 0) / estimates.length;
    const sd = Math.sqrt(estimates.reduce((a, b) => a + (b - mean) ** 2, 0) / (estimates.length - 1));
    const meanSe = ses.reduce((a, b) => a + b, 0) / ses.length;
    expect(Math.abs(mean - 4 * t)).toBeLessThan(0.05);
    expect(meanSe / sd).toBeGreaterThan(0.85);
    expect(meanSe / sd).toBeLessThan(1.15);
  });

  it('reports a negative sire component as 0 with a warning', () => {
    const result = halfSibHeritability([
      [1, 9, 5],
      [2, 8, 5],
      [3, 7, 5],
    ]);
    expect(result.sireVariance).toBe(0);
    expect(result.h2).toBe(0);
    expect(result.warnings[0]).toMatch(/negative/);
  });

  it('needs 2 sire groups and a group with 2 records', () => {
    expect(() => halfSibHeritability([[1, 2, 3]])).toThrow('halfSibHeritability requires at least 2 sire groups');
    expect(() => halfSibHeritability([[1], [2], []])).toThrow('halfSibHeritability requires a sire group with at least 2 records');
  });
});
