import { ancestorShares } from './ancestor-shares';
import { IndexMaxHeap } from './index-max-heap';
import { checkAnimals, type Pedigree } from './pedigree';

export interface CommonAncestorContribution {
  animal: number;
  /** part of the mating's expected inbreeding that passes through this ancestor */
  contribution: number;
  /** contribution / expected inbreeding */
  share: number;
}

export interface CommonAncestorContributions {
  expectedInbreeding: number;
  ancestors: CommonAncestorContribution[];
  /** sum of the contributions of the common ancestors not listed */
  others: number;
}

/**
 * Decomposes the expected inbreeding of a mating sire × dam by common ancestor, as in
 * Wright's path formula F = Σ_A Σ_paths (½)^(n₁+n₂+1)(1 + F_A), where a pair of paths from
 * sire and dam to A counts only when A is the only animal the two paths share (Falconer &
 * Mackay 1996, ch. 5). The paths are not enumerated: a pair of gene lineages (x, y) starts at
 * (sire, dam) and the younger one (higher index) steps to each of its parents with weight ½;
 * the first animal both lineages reach is exactly Wright's A, so a state (A, A) ends there
 * and adds weight · (1 + F_A) / 2 to A. Lineages that can no longer reach a common ancestor
 * are dropped. The contributions sum to expectedMatingInbreeding.
 *
 * Cost: O(P log P) for P pair states, at most the product of the two parents' ancestor
 * counts (far fewer in practice); bounded by `maxStates`.
 *
 * @param top how many ancestors to list, largest contribution first (default 5)
 * @throws when an index is outside the pedigree, or the decomposition needs more than
 *   maxStates pair states
 */
export function commonAncestorContributions(
  pedigree: Pedigree,
  F: ArrayLike<number>,
  sire: number,
  dam: number,
  top = 5,
  maxStates = 2_000_000,
): CommonAncestorContributions {
  const caller = 'commonAncestorContributions';
  checkAnimals(pedigree, F, [sire, dam], caller);
  const fromSire = ancestorShares(pedigree, sire, caller);
  const fromDam = ancestorShares(pedigree, dam, caller);

  // A lineage position is useful when a common ancestor is among its ancestors (or itself).
  const union = [...new Set([...fromSire.keys(), ...fromDam.keys()])].sort((a, b) => a - b);
  const useful = new Set<number>();
  for (const x of union) {
    const s = pedigree.sire[x];
    const d = pedigree.dam[x];
    if ((fromSire.has(x) && fromDam.has(x)) || useful.has(s) || useful.has(d)) useful.add(x);
  }

  const reached = new Map<number, number>(); // A → Σ weight of lineage pairs meeting first at A
  const states = new Map<number, Map<number, number>>(); // younger → older → weight
  const heap = new IndexMaxHeap();
  let stateCount = 0;
  const add = (x: number, y: number, weight: number): void => {
    if (x === y) {
      reached.set(x, (reached.get(x) ?? 0) + weight);
      return;
    }
    if (!useful.has(x) || !useful.has(y)) return;
    const younger = Math.max(x, y);
    const older = Math.min(x, y);
    let row = states.get(younger);
    if (row === undefined) {
      row = new Map();
      states.set(younger, row);
      heap.push(younger);
    }
    const previous = row.get(older);
    if (previous === undefined && ++stateCount > maxStates) {
      throw new Error(`${caller} needs more than ${maxStates} lineage pair states; the pedigree is too deep for a decomposition`);
    }
    row.set(older, (previous ?? 0) + weight);
  };
  add(sire, dam, 1);
  while (heap.size > 0) {
    const younger = heap.pop();
    const row = states.get(younger) as Map<number, number>;
    states.delete(younger);
    for (const [older, weight] of row) {
      for (const p of [pedigree.sire[younger], pedigree.dam[younger]]) {
        if (p >= 0) add(p, older, 0.5 * weight);
      }
    }
  }

  const all = [...reached].map(([animal, weight]) => ({ animal, contribution: (weight * (1 + F[animal])) / 2 }));
  const expectedInbreeding = all.reduce((sum, a) => sum + a.contribution, 0);
  all.sort((a, b) => b.contribution - a.contribution || a.animal - b.animal);
  const listed = all.slice(0, Math.max(0, top));
  return {
    expectedInbreeding,
    ancestors: listed.map((a) => ({ ...a, share: expectedInbreeding > 0 ? a.contribution / expectedInbreeding : 0 })),
    others: all.slice(listed.length).reduce((sum, a) => sum + a.contribution, 0),
  };
}
