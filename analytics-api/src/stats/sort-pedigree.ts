export interface PedigreeRecord<K extends string | number> {
  id: K;
  sire: K | null;
  dam: K | null;
}

export interface SortedPedigree<K extends string | number> {
  /** identifiers in the new order: parents before offspring */
  ids: K[];
  /** parent index in `ids`, −1 unknown */
  sire: Int32Array;
  dam: Int32Array;
  indexOf: Map<K, number>;
  /** parents referenced but not listed, added as founders (unknown parents) */
  addedFounders: K[];
}

/**
 * Orders a pedigree so that parents precede offspring (a topological order: depth-first,
 * parents before the animal, animals otherwise in input order) and turns identifiers into
 * indexes. A parent that is referenced but not listed is added as a founder, so relatives
 * through it stay related. O(n) time and memory; iterative, so deep lines cannot overflow
 * the call stack.
 *
 * @throws on a duplicate identifier, and on a cycle (an animal that is its own ancestor),
 *   naming an animal on the cycle
 */
export function sortPedigree<K extends string | number>(animals: readonly PedigreeRecord<K>[]): SortedPedigree<K> {
  const position = new Map<K, number>();
  animals.forEach((a, i) => {
    if (position.has(a.id)) throw new Error(`sortPedigree found animal ${String(a.id)} listed twice`);
    position.set(a.id, i);
  });
  const addedFounders: K[] = [];
  for (const a of animals) {
    for (const parent of [a.sire, a.dam]) {
      if (parent !== null && !position.has(parent)) {
        position.set(parent, animals.length + addedFounders.length);
        addedFounders.push(parent);
      }
    }
  }
  const total = animals.length + addedFounders.length;
  const parentPosition = (p: K | null): number => (p === null ? -1 : (position.get(p) as number));
  const sireAt = new Int32Array(total).fill(-1);
  const damAt = new Int32Array(total).fill(-1);
  animals.forEach((a, i) => {
    sireAt[i] = parentPosition(a.sire);
    damAt[i] = parentPosition(a.dam);
  });
  const idAt = (p: number): K => (p < animals.length ? animals[p].id : addedFounders[p - animals.length]);

  const NEW = 0;
  const OPEN = 1;
  const DONE = 2;
  const state = new Uint8Array(total);
  const newIndex = new Int32Array(total);
  const ids: K[] = [];
  const stack = new Int32Array(total);
  const nextParent = new Uint8Array(total); // 0: visit sire, 1: visit dam, 2: emit
  for (let root = 0; root < total; root++) {
    if (state[root] !== NEW) continue;
    let top = 0;
    stack[top++] = root;
    state[root] = OPEN;
    while (top > 0) {
      const p = stack[top - 1];
      if (nextParent[p] < 2) {
        const parent = nextParent[p] === 0 ? sireAt[p] : damAt[p];
        nextParent[p]++;
        if (parent < 0 || state[parent] === DONE) continue;
        if (state[parent] === OPEN) {
          throw new Error(`sortPedigree found a cycle: animal ${String(idAt(parent))} is its own ancestor`);
        }
        state[parent] = OPEN;
        stack[top++] = parent;
      } else {
        top--;
        state[p] = DONE;
        newIndex[p] = ids.length;
        ids.push(idAt(p));
      }
    }
  }

  const sire = new Int32Array(total);
  const dam = new Int32Array(total);
  const indexOf = new Map<K, number>();
  for (let p = 0; p < total; p++) {
    const i = newIndex[p];
    sire[i] = sireAt[p] < 0 ? -1 : newIndex[sireAt[p]];
    dam[i] = damAt[p] < 0 ? -1 : newIndex[damAt[p]];
    indexOf.set(idAt(p), i);
  }
  return { ids, sire, dam, indexOf, addedFounders };
}
