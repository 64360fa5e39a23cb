import type { PedigreeTreeNode } from '@shared/contracts/animals';
import { pedigreeSlots, recordedAncestors } from './pedigree-slots';

const node = (id: number, earId: string, sex: 'buck' | 'doe', parents: Partial<PedigreeTreeNode> = {}): PedigreeTreeNode => ({
  id, earId, name: null, sex, variety: 'Castor', weightGrams: null, registrationNo: null, grandChampion: false, breeder: null,
  isStub: false, ...parents,
});

// A tree with a missing dam's side beyond the dam and one outside parent.
const tree = node(1, 'KIT', 'doe', {
  sire: node(2, 'S', 'buck', { sire: node(4, 'SS', 'buck', { isStub: true }), dam: node(5, 'SD', 'doe') }),
  dam: node(3, 'D', 'doe', { sire: null, dam: null }),
});

describe('pedigreeSlots', () => {
  it('puts 2, 4, 8 and 16 places in the four columns of a paper pedigree', () => {
    const slots = pedigreeSlots(tree, 4);
    expect([1, 2, 3, 4].map((g) => slots.filter((s) => s.generation === g).length)).toEqual([2, 4, 8, 16]);
    expect(recordedAncestors(slots, 3)).toEqual({ recorded: 4, places: 14 });
  });

  it('places each ancestor beside its two parents', () => {
    const slots = pedigreeSlots(tree, 2);
    expect(slots.map((s) => [s.relation, s.animal?.earId ?? null, s.rowStart, s.rowSpan])).toEqual([
      ['Sire', 'S', 1, 2],
      ['Dam', 'D', 3, 2],
      ['Sire’s sire', 'SS', 1, 1],
      ['Sire’s dam', 'SD', 2, 1],
      ['Dam’s sire', null, 3, 1],
      ['Dam’s dam', null, 4, 1],
    ]);
    expect(slots[2].animal).toMatchObject({ isStub: true });
    expect(slots[2].animal).not.toHaveProperty('sire');
  });

  it('names deep places the way a pedigree form does', () => {
    const last = pedigreeSlots(tree, 4).filter((s) => s.generation === 4);
    expect(last[0].relation).toBe('Sire’s sire’s sire’s sire');
    expect(last[15].relation).toBe('Dam’s dam’s dam’s dam');
    expect(last[15].rowStart).toBe(16);
  });

  it('refuses a depth it cannot lay out', () => {
    expect(() => pedigreeSlots(tree, 0)).toThrow('pedigreeSlots requires 1 to 6 generations');
  });
});
