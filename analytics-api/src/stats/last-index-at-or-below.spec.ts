import { describe, expect, it } from 'vitest';
import { lastIndexAtOrBelow } from './last-index-at-or-below';

describe('lastIndexAtOrBelow', () => {
  const edges = [0, 7, 14, 42, 98];
  const at = (x: number) => lastIndexAtOrBelow(edges.length, (i) => edges[i]!, x);
  it('finds the last value at or below x, agreeing with a linear scan', () => {
    expect([-1, 0, 6.9, 7, 13, 41, 42, 97, 98, 500].map(at)).toEqual([-1, 0, 0, 1, 1, 2, 3, 3, 4, 4]);
    for (let x = -3; x < 110; x += 0.5) expect(at(x)).toBe(edges.findLastIndex((e) => e <= x));
    expect(lastIndexAtOrBelow(0, () => 0, 5)).toBe(-1);
  });
});
