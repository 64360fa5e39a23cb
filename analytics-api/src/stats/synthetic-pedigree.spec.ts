import { describe, expect, it } from 'vitest';
import { inbreedingCoefficients } from './inbreeding-coefficients';
import { checkPedigree } from './pedigree';
import { syntheticPedigree } from './synthetic-pedigree';

describe('syntheticPedigree', () => {
  it('writes exactly n animals, parents before offspring, sires bucks and dams does', () => {
    for (const n of [0, 1, 30, 5000]) {
      const p = syntheticPedigree(n, { seed: 3 });
      expect(checkPedigree(p, 'test')).toBe(n);
      let violations = 0;
      for (let i = 0; i < n; i++) {
        if (p.sire[i] >= 0 && (p.sex[p.sire[i]] !== 0 || p.generation[p.sire[i]] >= p.generation[i])) violations++;
        if (p.dam[i] >= 0 && (p.sex[p.dam[i]] !== 1 || p.generation[p.dam[i]] >= p.generation[i])) violations++;
      }
      expect(violations).toBe(0);
    }
  });

  it('is deterministic for a seed', () => {
    const a = syntheticPedigree(3000, { seed: 9 });
    const b = syntheticPedigree(3000, { seed: 9 });
    const c = syntheticPedigree(3000, { seed: 10 });
    expect(b.sire).toEqual(a.sire);
    expect(b.dam).toEqual(a.dam);
    expect(c.sire).not.toEqual(a.sire);
  });

  it('mates relatives, so inbreeding builds up over the generations', () => {
    const p = syntheticPedigree(20_000, { seed: 4 });
    const F = inbreedingCoefficients(p);
    const last = Math.max(...p.generation);
    const meanF = (g: number): number => {
      let sum = 0;
      let count = 0;
      for (let i = 0; i < F.length; i++) if (p.generation[i] === g) (sum += F[i]), count++;
      return sum / count;
    };
    expect(meanF(1)).toBe(0);
    expect(meanF(last)).toBeGreaterThan(0.02);
    expect(meanF(last)).toBeLessThan(0.5);
  });

  it('keeps populations closed: no parent from another population', () => {
    const p = syntheticPedigree(6000, { seed: 2, populationSize: 2000, herdsPerPopulation: 2 });
    const population = (i: number): number => Math.floor(p.herd[i] / 2);
    let crossing = 0;
    for (let i = 0; i < 6000; i++) {
      if (p.sire[i] >= 0 && population(p.sire[i]) !== population(i)) crossing++;
      if (p.dam[i] >= 0 && population(p.dam[i]) !== population(i)) crossing++;
    }
    expect(crossing).toBe(0);
    expect(p.herd[5999]).toBe(5); // three populations of two herds
  });

  it('rejects invalid sizes and rates', () => {
    expect(() => syntheticPedigree(-1)).toThrow('syntheticPedigree requires a non-negative integer n (got -1)');
    expect(() => syntheticPedigree(10, { doesPerHerd: 0 })).toThrow('syntheticPedigree requires doesPerHerd to be a positive integer');
    expect(() => syntheticPedigree(10, { outsideSireRate: 2 })).toThrow('syntheticPedigree requires outsideSireRate between 0 and 1');
  });
});
