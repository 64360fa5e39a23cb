import { Matrix, inverse, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { animalModelBlup, type BlupRecord } from './animal-model-blup';
import { denseRelationshipMatrix } from './dense-relationship-matrix';
import { inbreedingCoefficients } from './inbreeding-coefficients';
import { mendelianSamplingVariance } from './mendelian-sampling-variance';
import type { Pedigree } from './pedigree';
import { mulberry32, randomNormal } from './random';
import { syntheticPedigree } from './synthetic-pedigree';

// Mrode (2014) Example 3.1: animals 1–8 (indexes 0–7), records on 4–8, sex fixed (0 male, 1 female).
const mrode = {
  pedigree: { sire: [-1, -1, -1, 0, 2, 0, 3, 2], dam: [-1, -1, -1, -1, 1, 1, 4, 5] },
  records: [
    [3, 4.5, 0],
    [4, 2.9, 1],
    [5, 3.9, 1],
    [6, 3.5, 0],
    [7, 5.0, 0],
  ].map(([animal, y, sex]) => ({ animal, y, fixed: [sex] })),
};

/** Henderson's MME built densely with ml-matrix from the tabular A, the reference-level constraint applied. */
function denseMme(pedigree: Pedigree, records: BlupRecord[], fixedLevels: number[], alpha: number) {
  const n = pedigree.sire.length;
  const kept: [number, number][] = []; // fixed equations kept, as [factor, level]
  fixedLevels.forEach((levels, f) => {
    for (let l = f === 0 ? 0 : 1; l < levels; l++) kept.push([f, l]);
  });
  const p = kept.length;
  const W = records.map((r) => {
    const row = new Array<number>(p + n).fill(0);
    kept.forEach(([f, l], c) => (row[c] = r.fixed[f] === l ? 1 : 0));
    row[p + r.animal] = 1;
    return row;
  });
  const WM = new Matrix(W);
  const lhs = WM.transpose().mmul(WM);
  const Ainv = inverse(new Matrix(denseRelationshipMatrix(pedigree).map((row) => Array.from(row))));
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) lhs.set(p + i, p + j, lhs.get(p + i, p + j) + alpha * Ainv.get(i, j));
  const rhs = WM.transpose().mmul(Matrix.columnVector(records.map((r) => r.y)));
  return { lhs, rhs, kept, p };
}

describe('animalModelBlup', () => {
  it('reproduces Mrode (2014) Example 3.1 (α = 2) to 1e-5', () => {
    const F = inbreedingCoefficients(mrode.pedigree);
    const result = animalModelBlup({ ...mrode, F, fixedLevels: [2], alpha: 2 });
    expect(result.converged).toBe(true);
    expect(result.relativeResidual).toBeLessThan(1e-9);
    expect(result.fixed[0][0]).toBeCloseTo(4.358502, 5);
    expect(result.fixed[0][1]).toBeCloseTo(3.40443, 5);
    const expected = [0.098445, -0.01877, -0.041084, -0.008663, -0.185732, 0.176872, -0.249459, 0.182615];
    expected.forEach((value, i) => expect(result.breedingValues[i]).toBeCloseTo(value, 5));
  });

  it('takes h² instead of α: h² = 1/3 is α = 2', () => {
    const F = inbreedingCoefficients(mrode.pedigree);
    const byH2 = animalModelBlup({ ...mrode, F, fixedLevels: [2], h2: 1 / 3 });
    const byAlpha = animalModelBlup({ ...mrode, F, fixedLevels: [2], alpha: 2 });
    byAlpha.breedingValues.forEach((v, i) => expect(byH2.breedingValues[i]).toBeCloseTo(v, 10));
  });

  it('gives exact accuracies √(1 − α·C^ii/(1 + F)) from the inverse (checked with ml-matrix inverse)', () => {
    const F = inbreedingCoefficients(mrode.pedigree);
    const result = animalModelBlup({ ...mrode, F, fixedLevels: [2], alpha: 2 });
    const { lhs, p } = denseMme(mrode.pedigree, mrode.records, [2], 2);
    const Cinv = inverse(lhs);
    result.accuracy!.forEach((r, i) => expect(r).toBeCloseTo(Math.sqrt(1 - (2 * Cinv.get(p + i, p + i)) / (1 + F[i])), 8));
    // an animal with its own record and progeny is evaluated more accurately than a founder without
    expect(result.accuracy![3]).toBeGreaterThan(result.accuracy![1]);
  });

  it('matches a dense ml-matrix solve with two fixed factors on inbred pedigrees', () => {
    for (const seed of [1, 2, 3]) {
      const pedigree = syntheticPedigree(120, { seed, herdsPerPopulation: 2, bucksPerHerd: 2, doesPerHerd: 4, littersPerDoe: 1, meanLitterSize: 3, closeMatingRate: 0.3 });
      const F = inbreedingCoefficients(pedigree);
      const rng = mulberry32(seed);
      const records: BlupRecord[] = [];
      for (let i = 0; i < 120; i++) {
        if (rng() < 0.2) continue; // some animals without records
        const group = Math.floor(rng() * 4);
        records.push({ animal: i, y: 10 + pedigree.sex[i] + group + randomNormal(rng), fixed: [pedigree.sex[i], group] });
      }
      const result = animalModelBlup({ pedigree, F, records, fixedLevels: [2, 4], h2: 0.3 });
      const { lhs, rhs, kept, p } = denseMme(pedigree, records, [2, 4], 0.7 / 0.3);
      const solution = solve(lhs, rhs);
      kept.forEach(([f, l], c) => expect(result.fixed[f][l]).toBeCloseTo(solution.get(c, 0), 7));
      expect(result.fixed[1][0]).toBe(0); // the reference level
      for (let i = 0; i < 120; i++) expect(result.breedingValues[i]).toBeCloseTo(solution.get(p + i, 0), 7);
    }
  });

  it('recovers simulated breeding values and converges on a 5,000-animal pedigree', () => {
    const n = 5000;
    const pedigree = syntheticPedigree(n, { seed: 17 });
    const F = inbreedingCoefficients(pedigree);
    const rng = mulberry32(17);
    const h2 = 0.4;
    const truth = new Float64Array(n);
    const records: BlupRecord[] = [];
    for (let i = 0; i < n; i++) {
      const s = pedigree.sire[i];
      const d = pedigree.dam[i];
      truth[i] = 0.5 * ((s >= 0 ? truth[s] : 0) + (d >= 0 ? truth[d] : 0)) + Math.sqrt(mendelianSamplingVariance(s, d, F) * h2) * randomNormal(rng);
      records.push({ animal: i, y: 100 + 2 * pedigree.sex[i] + truth[i] + Math.sqrt(1 - h2) * randomNormal(rng), fixed: [pedigree.sex[i]] });
    }
    const result = animalModelBlup({ pedigree, F, records, fixedLevels: [2], h2 });
    expect(result.converged).toBe(true);
    expect(result.accuracy).toBeNull(); // beyond the exact-accuracy limit
    expect(result.fixed[0][1] - result.fixed[0][0]).toBeCloseTo(2, 0);
    const meanOf = (a: ArrayLike<number>) => Array.from(a).reduce((x, y) => x + y, 0) / a.length;
    const mt = meanOf(truth);
    const me = meanOf(result.breedingValues);
    let sxy = 0;
    let sxx = 0;
    let syy = 0;
    for (let i = 0; i < n; i++) {
      sxy += (truth[i] - mt) * (result.breedingValues[i] - me);
      sxx += (truth[i] - mt) ** 2;
      syy += (result.breedingValues[i] - me) ** 2;
    }
    // expected accuracy with an own record and relatives, h² = 0.4: about 0.7
    expect(sxy / Math.sqrt(sxx * syy)).toBeGreaterThan(0.6);
  });

  it('warns about fixed levels without records and sets them to 0', () => {
    const F = inbreedingCoefficients(mrode.pedigree);
    const result = animalModelBlup({ ...mrode, F, fixedLevels: [3], alpha: 2 });
    expect(result.fixed[0][2]).toBe(0);
    expect(result.warnings).toContain('fixed factor 0 level 2 has no records; its solution is set to 0');
    expect(result.fixed[0][0]).toBeCloseTo(4.358502, 5);
  });

  it('rejects invalid input with clear errors', () => {
    const F = inbreedingCoefficients(mrode.pedigree);
    const base = { ...mrode, F, fixedLevels: [2] };
    expect(() => animalModelBlup({ ...base })).toThrow('animalModelBlup requires exactly one of h2 and alpha');
    expect(() => animalModelBlup({ ...base, h2: 0.3, alpha: 2 })).toThrow('animalModelBlup requires exactly one of h2 and alpha');
    expect(() => animalModelBlup({ ...base, h2: 1 })).toThrow('animalModelBlup requires h2 strictly between 0 and 1 (got 1)');
    expect(() => animalModelBlup({ ...base, alpha: 2, records: [{ animal: 9, y: 1, fixed: [0] }] })).toThrow('animalModelBlup record 0 refers to animal 9, not in the pedigree');
    expect(() => animalModelBlup({ ...base, alpha: 2, records: [{ animal: 3, y: 1, fixed: [2] }] })).toThrow('animalModelBlup record 0 has level 2 of fixed factor 0, outside 0..1');
    expect(() => animalModelBlup({ ...base, alpha: 2, fixedLevels: [] })).toThrow(/at least one fixed factor/);
  });
});
