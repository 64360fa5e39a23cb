/**
 * A binary max-heap of non-negative integer indexes on a growable Int32Array: push and pop
 * in O(log size). Used to visit ancestors youngest first (highest index first), so every
 * animal is reached only after all its descendants in the traversal.
 */
export class IndexMaxHeap {
  private items: Int32Array;
  size = 0;

  constructor(initialCapacity = 64) {
    this.items = new Int32Array(Math.max(1, initialCapacity));
  }

  push(value: number): void {
    if (this.size === this.items.length) {
      const grown = new Int32Array(this.items.length * 2);
      grown.set(this.items);
      this.items = grown;
    }
    const items = this.items;
    let i = this.size++;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (items[parent] >= value) break;
      items[i] = items[parent];
      i = parent;
    }
    items[i] = value;
  }

  /** Removes and returns the largest index; call only when size > 0. */
  pop(): number {
    const items = this.items;
    const top = items[0];
    const last = items[--this.size];
    const size = this.size;
    let i = 0;
    for (;;) {
      let child = 2 * i + 1;
      if (child >= size) break;
      if (child + 1 < size && items[child + 1] > items[child]) child++;
      if (items[child] <= last) break;
      items[i] = items[child];
      i = child;
    }
    items[i] = last;
    return top;
  }
}
