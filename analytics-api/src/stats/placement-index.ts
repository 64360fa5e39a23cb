import { checkPlacing } from './placing';
import { Z_95 } from './wilson-interval';

export interface PlacementResult {
  placing: number;
  entries: number;
}

export interface PlacementIndex {
  /** counted results placed in the top k */
  observed: number;
  /** top-k placings of the counted results expected by chance, Σ k/nᵢ */
  expected: number;
  /** observed / expected, held at `ceiling`: 1 = as chance, 2 = twice as often */
  index: number;
  lower: number;
  upper: number;
  /** the largest index the chance model allows, 1/max pᵢ */
  ceiling: number;
  /** results counted: classes of more than k entries */
  n: number;
  /** results left out: classes of k or fewer entries, where every animal places */
  certain: number;
  warnings: string[];
}

/**
 * Placement index: observed top-k placings over those expected if placings were random,
 * E = Σ pᵢ with pᵢ = k/nᵢ, over the results whose class had more than k entries (in a smaller
 * class every animal places, whatever its merit, so those results are left out).
 *
 * Model: each result reaches the top k with probability θ·pᵢ. A probability cannot pass 1, so
 * θ lies in [0, θmax] with θmax = 1/max pᵢ (the smallest counted class's chance reaching 1);
 * the index is O/E held at θmax.
 *
 * Interval: the score method (Wilson's, generalised to unequal chance probabilities). O has
 * mean θE and variance Σ θpᵢ(1 − θpᵢ) = θE − θ²Q with Q = Σ pᵢ²; the interval is the set of θ
 * in [0, θmax] with (O′ − θE)² ≤ z²(θE − θ²Q), between the roots of
 * θ²(E² + z²Q) − θ(2O′E + z²E) + O′² = 0. O′ = min(O, θmax·E): placings beyond what the model
 * can produce even at its ceiling count as at the ceiling, so the roots are always real (the
 * variance is ≥ 0 for θ ≤ θmax ≤ E/Q) and the interval holds its estimate; this only lowers
 * the lower end, so coverage is kept. With equal class sizes it is exactly the Wilson interval
 * divided by p. O(r) for r results.
 *
 * @param k top places counted (default 3)
 * @param z normal quantile of the interval (default 95%)
 * @returns null when every class had k or fewer entries (no placing says anything about merit)
 * @throws when there are no results, k is not a positive integer, or a result is invalid
 */
export function placementIndex(results: readonly PlacementResult[], k = 3, z = Z_95): PlacementIndex | null {
  if (results.length === 0) throw new Error('placementIndex requires at least 1 result');
  if (!Number.isInteger(k) || k < 1) throw new Error(`placementIndex requires a positive integer k (got ${k})`);
  let observed = 0;
  let expected = 0;
  let squares = 0;
  let largest = 0;
  let n = 0;
  for (const { placing, entries } of results) {
    checkPlacing(placing, entries, 'placementIndex');
    if (entries <= k) continue;
    const chance = k / entries;
    if (placing <= k) observed++;
    expected += chance;
    squares += chance * chance;
    largest = Math.max(largest, chance);
    n++;
  }
  if (n === 0) return null;
  const ceiling = 1 / largest;
  const counted = Math.min(observed, ceiling * expected);
  const z2 = z * z;
  const a = expected * expected + z2 * squares;
  const b = 2 * counted * expected + z2 * expected;
  // ≥ 0 in exact arithmetic (see above); the guard only absorbs rounding.
  const root = Math.sqrt(Math.max(0, b * b - 4 * a * counted * counted));
  const warnings: string[] = [];
  if (n < 10) warnings.push(`only ${n} results in classes of more than ${k}: the index is very uncertain`);
  if (observed > counted) {
    warnings.push(`${observed} of ${n} results placed, more than chance allows even at the ceiling: the index is held at ${ceiling.toFixed(2)}, where a place in the smallest class is certain`);
  }
  return {
    observed,
    expected,
    index: counted / expected,
    lower: counted === 0 ? 0 : Math.max(0, (b - root) / (2 * a)),
    upper: Math.min(ceiling, (b + root) / (2 * a)),
    ceiling,
    n,
    certain: results.length - n,
    warnings,
  };
}
