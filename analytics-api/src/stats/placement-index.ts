import { checkPlacing } from './placing';
import { Z_95 } from './wilson-interval';

export interface PlacementResult {
  placing: number;
  entries: number;
}

export interface PlacementIndex {
  /** results placed in the top k */
  observed: number;
  /** top-k placings expected by chance, Σ min(k, n)/n */
  expected: number;
  /** observed / expected: 1 = as chance, 2 = twice as often */
  index: number;
  lower: number;
  upper: number;
  n: number;
  warnings: string[];
}

/**
 * Placement index: observed top-k placings over those expected if placings were random,
 * E = Σ pᵢ with pᵢ = min(k, nᵢ)/nᵢ.
 *
 * Interval: the score method (Wilson's, generalised to unequal chance probabilities). If each
 * result reaches the top k with probability θ·pᵢ, O has mean θE and variance Σ θpᵢ(1 − θpᵢ) =
 * θE − θ²Q with Q = Σ pᵢ²; the interval is the set of θ with (O − θE)² ≤ z²(θE − θ²Q), the
 * roots of θ²(E² + z²Q) − θ(2OE + z²E) + O² = 0. With equal class sizes it is exactly the Wilson
 * interval divided by p. O(r) for r results.
 *
 * @param k top places counted (default 3)
 * @param z normal quantile of the interval (default 95%)
 * @throws when there are no results, k is not a positive integer, or a result is invalid
 */
export function placementIndex(results: readonly PlacementResult[], k = 3, z = Z_95): PlacementIndex {
  if (results.length === 0) throw new Error('placementIndex requires at least 1 result');
  if (!Number.isInteger(k) || k < 1) throw new Error(`placementIndex requires a positive integer k (got ${k})`);
  let observed = 0;
  let expected = 0;
  let squares = 0;
  for (const { placing, entries } of results) {
    checkPlacing(placing, entries, 'placementIndex');
    const chance = Math.min(k, entries) / entries;
    if (placing <= k) observed++;
    expected += chance;
    squares += chance * chance;
  }
  const z2 = z * z;
  const a = expected * expected + z2 * squares;
  const b = 2 * observed * expected + z2 * expected;
  const root = Math.sqrt(Math.max(0, b * b - 4 * a * observed * observed));
  const warnings: string[] = [];
  if (results.length < 10) warnings.push(`only ${results.length} results: the index is very uncertain`);
  if (squares === expected) warnings.push('every class had k or fewer entries: placings say nothing about merit');
  return {
    observed,
    expected,
    index: observed / expected,
    lower: observed === 0 ? 0 : (b - root) / (2 * a),
    upper: (b + root) / (2 * a),
    n: results.length,
    warnings,
  };
}
