import type { PedigreeTreeNode } from '@shared/contracts/animals';

export interface PedigreeSlot {
  /** 1 = parents, 2 = grandparents, … */
  generation: number;
  /** Place within its generation, top to bottom (sire's side first). */
  index: number;
  /** "Sire", "Dam's sire", … as a pedigree form labels it. */
  relation: string;
  /** Grid rows the slot spans so each ancestor sits beside its two parents. */
  rowStart: number;
  rowSpan: number;
  /** null: not recorded. */
  animal: Omit<PedigreeTreeNode, 'sire' | 'dam'> | null;
}

/**
 * The ancestors of a pedigree tree laid out in generation columns, as on a paper pedigree:
 * generation g has 2^g places; place i's parents are places 2i (sire) and 2i + 1 (dam) of the
 * next generation; every slot spans 2^(generations − g) of the 2^generations grid rows.
 * A parent not recorded leaves its place and its ancestors' places empty (null).
 * Cost O(2^generations). Throws `pedigreeSlots requires 1 to 6 generations`.
 */
export function pedigreeSlots(tree: PedigreeTreeNode, generations: number): PedigreeSlot[] {
  if (!Number.isInteger(generations) || generations < 1 || generations > 6) {
    throw new Error('pedigreeSlots requires 1 to 6 generations');
  }
  const rows = 2 ** generations;
  const slots: PedigreeSlot[] = [];
  let level: { node: PedigreeTreeNode | null; relation: string }[] = [{ node: tree, relation: '' }];
  for (let g = 1; g <= generations; g++) {
    level = level.flatMap(({ node, relation }) => [
      { node: node?.sire ?? null, relation: relation ? `${relation}’s sire` : 'Sire' },
      { node: node?.dam ?? null, relation: relation ? `${relation}’s dam` : 'Dam' },
    ]);
    const span = rows / 2 ** g;
    level.forEach(({ node, relation }, index) => {
      const { sire: _s, dam: _d, ...animal } = node ?? ({} as PedigreeTreeNode);
      slots.push({ generation: g, index, relation, rowStart: index * span + 1, rowSpan: span, animal: node ? animal : null });
    });
  }
  return slots;
}

/** How many ancestors of the first `generations` are recorded, out of 2 + 4 + … = 2^(g+1) − 2. */
export function recordedAncestors(slots: readonly PedigreeSlot[], generations: number): { recorded: number; places: number } {
  const inScope = slots.filter((s) => s.generation <= generations);
  return { recorded: inScope.filter((s) => s.animal).length, places: inScope.length };
}
