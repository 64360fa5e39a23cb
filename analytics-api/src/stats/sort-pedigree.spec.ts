import { describe, expect, it } from 'vitest';
import { checkPedigree } from './pedigree';
import { sortPedigree } from './sort-pedigree';

describe('sortPedigree', () => {
  it('puts parents before offspring and keeps the relationships', () => {
    const animals = [
      { id: 'K3', sire: 'B1', dam: 'D2' },
      { id: 'D2', sire: null, dam: 'G0' },
      { id: 'B1', sire: null, dam: null },
      { id: 'G0', sire: null, dam: null },
      { id: 'K4', sire: 'B1', dam: 'K3' },
    ];
    const sorted = sortPedigree(animals);
    expect(checkPedigree(sorted, 'test')).toBe(5);
    expect(sorted.addedFounders).toEqual([]);
    for (const a of animals) {
      const i = sorted.indexOf.get(a.id)!;
      expect(sorted.ids[i]).toBe(a.id);
      expect(sorted.sire[i]).toBe(a.sire === null ? -1 : sorted.indexOf.get(a.sire));
      expect(sorted.dam[i]).toBe(a.dam === null ? -1 : sorted.indexOf.get(a.dam));
    }
  });

  it('adds parents that are referenced but not listed as founders', () => {
    const sorted = sortPedigree([
      { id: 1, sire: 99, dam: null },
      { id: 2, sire: 99, dam: null },
    ]);
    expect(sorted.addedFounders).toEqual([99]);
    expect(sorted.ids).toHaveLength(3);
    expect(sorted.sire[sorted.indexOf.get(1)!]).toBe(sorted.indexOf.get(99));
    expect(sorted.sire[sorted.indexOf.get(2)!]).toBe(sorted.indexOf.get(99));
  });

  it('names an animal on a cycle', () => {
    expect(() =>
      sortPedigree([
        { id: 'A', sire: 'C', dam: null },
        { id: 'B', sire: 'A', dam: null },
        { id: 'C', sire: 'B', dam: null },
      ]),
    ).toThrow(/^sortPedigree found a cycle: animal [ABC] is its own ancestor$/);
    expect(() => sortPedigree([{ id: 'X', sire: null, dam: 'X' }])).toThrow('sortPedigree found a cycle: animal X is its own ancestor');
  });

  it('rejects a duplicate identifier', () => {
    expect(() => sortPedigree([{ id: 'A', sire: null, dam: null }, { id: 'A', sire: null, dam: null }])).toThrow('sortPedigree found animal A listed twice');
  });

  it('sorts a line of 200,000 generations listed youngest first without overflowing the stack', () => {
    const n = 200_000;
    const animals = Array.from({ length: n }, (_, k) => ({ id: n - 1 - k, sire: k === n - 1 ? null : n - 2 - k, dam: null }));
    const sorted = sortPedigree(animals);
    expect(sorted.ids[0]).toBe(0);
    expect(sorted.ids[n - 1]).toBe(n - 1);
    expect(checkPedigree(sorted, 'test')).toBe(n);
  });
});
