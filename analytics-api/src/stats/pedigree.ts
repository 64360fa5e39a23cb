/**
 * A pedigree of n animals indexed 0..n−1 in an order where parents precede offspring:
 * sire[i] and dam[i] are parent indexes lower than i, or −1 when unknown.
 * `sortPedigree` produces this shape from arbitrary identifiers.
 */
export interface Pedigree {
  readonly sire: ArrayLike<number>;
  readonly dam: ArrayLike<number>;
}

/**
 * Checks that a pedigree is well formed (equal lengths, integer parents that precede their
 * offspring) and returns its size. O(n).
 *
 * @param caller the public function's name, for the error message
 * @throws when lengths differ or a parent index is not −1 or an earlier animal
 */
export function checkPedigree(pedigree: Pedigree, caller: string): number {
  const { sire, dam } = pedigree;
  const n = sire.length;
  if (dam.length !== n) {
    throw new Error(`${caller} requires sire and dam arrays of equal length (${n} vs ${dam.length})`);
  }
  for (let i = 0; i < n; i++) {
    const s = sire[i];
    const d = dam[i];
    if (!(s === -1 || (Number.isInteger(s) && s >= 0 && s < i)) || !(d === -1 || (Number.isInteger(d) && d >= 0 && d < i))) {
      throw new Error(`${caller} requires parents to precede offspring (animal ${i} has sire ${s}, dam ${d}); use sortPedigree first`);
    }
  }
  return n;
}

/**
 * Checks, in O(1), that F matches the pedigree and that each index is an animal of it —
 * for functions that look at a few animals of a large pedigree.
 *
 * @throws when lengths differ or an index is outside 0..n−1
 */
export function checkAnimals(pedigree: Pedigree, F: ArrayLike<number>, animals: readonly number[], caller: string): void {
  const n = pedigree.sire.length;
  if (pedigree.dam.length !== n || F.length !== n) throw new Error(`${caller} requires sire, dam and F of equal length`);
  for (const a of animals) {
    if (!Number.isInteger(a) || a < 0 || a >= n) throw new Error(`${caller} requires animal indexes in 0..${n - 1} (got ${a})`);
  }
}
