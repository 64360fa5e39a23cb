/**
 * Binary search in ascending values: the index of the last value ≤ x, or −1 when every value
 * is above x (values read through `valueAt`, so no array need be built). O(log n).
 */
export function lastIndexAtOrBelow(count: number, valueAt: (i: number) => number, x: number): number {
  let lo = -1;
  let hi = count;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (valueAt(mid) <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}
