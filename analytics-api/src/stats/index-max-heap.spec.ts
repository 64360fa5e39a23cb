import { describe, expect, it } from 'vitest';
import { IndexMaxHeap } from './index-max-heap';
import { mulberry32 } from './random';

describe('IndexMaxHeap', () => {
  it('pops in descending order and grows past its initial capacity', () => {
    const rng = mulberry32(5);
    const values = Array.from({ length: 1000 }, () => Math.floor(rng() * 1e6));
    const heap = new IndexMaxHeap(2);
    for (const v of new Set(values)) heap.push(v);
    const popped: number[] = [];
    while (heap.size > 0) popped.push(heap.pop());
    expect(popped).toEqual([...new Set(values)].sort((a, b) => b - a));
  });
});
