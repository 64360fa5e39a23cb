import { describe, expect, it } from 'vitest';
import { ancestorShares } from './ancestor-shares';

describe('ancestorShares', () => {
  it('gives ½ per generation, summed over paths (a repeated grandparent counts twice)', () => {
    // 0 × 1 → 2 and 3 (full sibs); 4 = 2 × 3: 0 and 1 appear on both sides
    const shares = ancestorShares({ sire: [-1, -1, 0, 0, 2], dam: [-1, -1, 1, 1, 3] }, 4, 'test');
    expect(Object.fromEntries(shares)).toEqual({ 4: 1, 3: 0.5, 2: 0.5, 1: 0.5, 0: 0.5 });
  });

  it('rejects a parent that does not precede its offspring', () => {
    expect(() => ancestorShares({ sire: [-1, 2, -1], dam: [-1, -1, -1] }, 1, 'someFunction')).toThrow(/^someFunction requires parents to precede offspring/);
  });
});
