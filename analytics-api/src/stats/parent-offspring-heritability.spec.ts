import { jStat } from 'jstat';
import { describe, expect, it } from 'vitest';
import { parentOffspringHeritability } from './parent-offspring-heritability';
import { mulberry32, randomNormal } from './random';

describe('parentOffspringHeritability', () => {
  it('gives the least-squares slope and its standard error of jStat.models.ols', () => {
    const pairs = [
      { parent: 2100, offspring: 2050 },
      { parent: 2300, offspring: 2210 },
      { parent: 1950, offspring: 2080 },
      { parent: 2450, offspring: 2300 },
      { parent: 2200, offspring: 2120 },
      { parent: 2050, offspring: 1990 },
      { parent: 2380, offspring: 2260 },
    ];
    const ols = jStat.models.ols(pairs.map((p) => p.offspring), pairs.map((p) => [1, p.parent]));
    const sire = parentOffspringHeritability(pairs, 'sire');
    expect(sire.b).toBeCloseTo(ols.coef[1], 12);
    expect(sire.seB).toBeCloseTo(ols.t.se[1], 12);
    // Falconer & Mackay (1996) ch. 10: h² = 2b for one parent, b for the midparent
    expect(sire.h2).toBeCloseTo(2 * ols.coef[1], 12);
    expect(sire.se).toBeCloseTo(2 * ols.t.se[1], 12);
    const midparent = parentOffspringHeritability(pairs, 'midparent');
    expect(midparent.h2).toBeCloseTo(ols.coef[1], 12);
    expect(sire.warnings[0]).toMatch(/only 7 pairs/);
  });

  it('recovers the heritability of simulated parent–offspring pairs (h² = 0.3)', () => {
    // parent P = A + E; offspring breeding value ½A + Mendelian sampling; cov(P, O) = ½h²
    const rng = mulberry32(30);
    const h2 = 0.3;
    const pairs = Array.from({ length: 4000 }, () => {
      const a = Math.sqrt(h2) * randomNormal(rng);
      const parent = a + Math.sqrt(1 - h2) * randomNormal(rng);
      const offspring = 0.5 * a + Math.sqrt(0.75 * h2) * randomNormal(rng) + Math.sqrt(1 - h2) * randomNormal(rng);
      return { parent, offspring };
    });
    const result = parentOffspringHeritability(pairs, 'dam');
    expect(Math.abs(result.h2 - h2)).toBeLessThan(3 * result.se);
    expect(result.se).toBeLessThan(0.05);
    expect(result.warnings).toEqual([]);
  });

  it('rejects too few pairs and parents without variation', () => {
    expect(() => parentOffspringHeritability([{ parent: 1, offspring: 1 }], 'sire')).toThrow('parentOffspringHeritability requires at least 3 pairs (got 1)');
    expect(() => parentOffspringHeritability([1, 2, 3].map((o) => ({ parent: 5, offspring: o })), 'sire')).toThrow('parentOffspringHeritability requires parents with different values');
  });
});
