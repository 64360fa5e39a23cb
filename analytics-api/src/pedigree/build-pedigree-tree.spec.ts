import { describe, expect, it } from 'vitest';
import { type AncestorRow, buildPedigreeTree } from './build-pedigree-tree';

const row = (id: number, sireId: number | null, damId: number | null, sex: 'buck' | 'doe' = 'buck'): AncestorRow => ({
  id, earId: `E${id}`, name: null, sex, variety: null, weightGrams: null, registrationNo: null,
  grandChampion: false, breeder: null, isStub: false, sireId, damId,
});

describe('buildPedigreeTree', () => {
  it('nests parents to the generations asked, with null for unrecorded parents', () => {
    // 1 ← (2, 3); 2 ← (4, null); 4 ← (5, 6)
    const rows = [row(1, 2, 3), row(2, 4, null), row(3, null, null, 'doe'), row(4, 5, 6), row(5, null, null), row(6, null, null, 'doe')];
    const tree = buildPedigreeTree(rows, 1, 2);
    expect(tree.sire?.earId).toBe('E2');
    expect(tree.dam?.earId).toBe('E3');
    expect(tree.sire?.sire?.earId).toBe('E4');
    expect(tree.sire?.dam).toBeNull();
    // Generation 2 is the last one asked for: its nodes carry no parents.
    expect(tree.sire?.sire).not.toHaveProperty('sire');
    expect(tree.dam?.sire).toBeNull();
  });

  it('places an ancestor reached twice (line breeding) at both places', () => {
    // 1 ← (2, 3); 2 ← (4, -); 3 ← (4, -): 4 is grandsire on both sides.
    const rows = [row(1, 2, 3), row(2, 4, null), row(3, 4, null, 'doe'), row(4, null, null)];
    const tree = buildPedigreeTree(rows, 1, 3);
    expect(tree.sire?.sire?.id).toBe(4);
    expect(tree.dam?.sire?.id).toBe(4);
  });

  it('throws when the root is missing', () => {
    expect(() => buildPedigreeTree([], 1, 4)).toThrow('buildPedigreeTree requires the root animal among the rows');
  });
});
