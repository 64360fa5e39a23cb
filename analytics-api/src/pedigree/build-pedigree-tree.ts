import type { PedigreeTreeNode } from '@shared/contracts/animals';

export interface AncestorRow extends Omit<PedigreeTreeNode, 'sire' | 'dam'> {
  sireId: number | null;
  damId: number | null;
}

/**
 * The pedigree tree of `rootId` to `generations` generations of ancestors (1 = parents) from a
 * flat list of the animals involved. A parent not recorded is null; nodes in the last generation
 * carry no parents at all. An ancestor reached twice (line breeding) appears at each place.
 * Cost O(2^generations). Throws `buildPedigreeTree requires the root animal among the rows`.
 */
export function buildPedigreeTree(rows: readonly AncestorRow[], rootId: number, generations: number): PedigreeTreeNode {
  const byId = new Map(rows.map((r) => [r.id, r]));
  const node = (id: number, depth: number): PedigreeTreeNode => {
    const { sireId, damId, ...facts } = byId.get(id)!;
    if (depth === generations) return facts;
    const parent = (pid: number | null) => (pid !== null && byId.has(pid) ? node(pid, depth + 1) : null);
    return { ...facts, sire: parent(sireId), dam: parent(damId) };
  };
  if (!byId.has(rootId)) throw new Error('buildPedigreeTree requires the root animal among the rows');
  return node(rootId, 0);
}
