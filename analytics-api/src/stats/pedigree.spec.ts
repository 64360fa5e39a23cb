import { describe, expect, it } from 'vitest';
import { checkAnimals, checkPedigree } from './pedigree';

describe('checkPedigree', () => {
  it('returns the size of a well-formed pedigree', () => {
    expect(checkPedigree({ sire: [-1, -1, 0], dam: [-1, -1, 1] }, 'f')).toBe(3);
  });

  it('rejects a parent that does not precede its offspring, naming the caller', () => {
    expect(() => checkPedigree({ sire: [-1, 2, -1], dam: [-1, -1, -1] }, 'someFunction')).toThrow(/^someFunction requires parents to precede offspring \(animal 1/);
    expect(() => checkPedigree({ sire: [-1, 1], dam: [-1, -1] }, 'f')).toThrow(/precede/);
    expect(() => checkPedigree({ sire: [-1, 0.5], dam: [-1, -1] }, 'f')).toThrow(/precede/);
  });

  it('rejects arrays of different lengths', () => {
    expect(() => checkPedigree({ sire: [-1], dam: [-1, -1] }, 'f')).toThrow('f requires sire and dam arrays of equal length (1 vs 2)');
  });
});

describe('checkAnimals', () => {
  const pedigree = { sire: [-1, -1], dam: [-1, -1] };
  it('accepts indexes of the pedigree and rejects others or a mismatched F', () => {
    expect(() => checkAnimals(pedigree, [0, 0], [0, 1], 'f')).not.toThrow();
    expect(() => checkAnimals(pedigree, [0, 0], [2], 'f')).toThrow('f requires animal indexes in 0..1 (got 2)');
    expect(() => checkAnimals(pedigree, [0], [0], 'f')).toThrow('f requires sire, dam and F of equal length');
  });
});
