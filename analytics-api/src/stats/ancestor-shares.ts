import { IndexMaxHeap } from './index-max-heap';
import type { Pedigree } from './pedigree';

/**
 * The share of every ancestor's genes in an animal, i.e. row `animal` of T = (I − P)⁻¹
 * (Meuwissen & Luo 1992's L without D): 1 for the animal itself, ½ per generation along every
 * path, summed over paths. Traced youngest first, so each ancestor is complete when reached.
 * O(A log A) for A ancestors, independent of the pedigree's size.
 *
 * @param caller the public function's name, for the error message
 * @returns ancestor index → share, including the animal (share 1)
 * @throws when a parent does not precede its offspring
 */
export function ancestorShares(pedigree: Pedigree, animal: number, caller: string): Map<number, number> {
  const { sire, dam } = pedigree;
  const shares = new Map<number, number>([[animal, 1]]);
  const heap = new IndexMaxHeap();
  heap.push(animal);
  while (heap.size > 0) {
    const k = heap.pop();
    const half = 0.5 * (shares.get(k) as number);
    for (const p of [sire[k], dam[k]]) {
      if (p < 0) continue;
      if (!(p < k)) throw new Error(`${caller} requires parents to precede offspring (animal ${k} has parent ${p}); use sortPedigree first`);
      const previous = shares.get(p);
      if (previous === undefined) heap.push(p);
      shares.set(p, (previous ?? 0) + half);
    }
  }
  return shares;
}
