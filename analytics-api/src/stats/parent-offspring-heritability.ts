import { linearRegression, mean } from 'simple-statistics';

export interface ParentOffspringPair {
  /** the parent's value, or the mean of both parents for 'midparent' */
  parent: number;
  offspring: number;
}

export interface ParentOffspringHeritability {
  h2: number;
  se: number;
  /** regression slope of offspring on parent */
  b: number;
  seB: number;
  n: number;
  warnings: string[];
}

/**
 * Heritability from the regression of offspring on parent (Falconer & Mackay 1996, ch. 10):
 * h² = 2b for one parent (sire or dam), h² = b for the midparent. b = Sxy/Sxx by least squares
 * (simple-statistics linearRegression), SE(b) = √(s²/Sxx) with s² = Σ residual²/(n − 2);
 * SE(h²) = 2·SE(b) or SE(b). Each pair is one point: an offspring mean per parent, or one
 * point per offspring, as the caller chooses (points of one family are not independent, so
 * the SE is then optimistic). O(n).
 *
 * @throws when there are fewer than 3 pairs, a value is not finite, or all parents are equal
 */
export function parentOffspringHeritability(
  pairs: readonly ParentOffspringPair[],
  kind: 'sire' | 'dam' | 'midparent',
): ParentOffspringHeritability {
  const n = pairs.length;
  if (n < 3) throw new Error(`parentOffspringHeritability requires at least 3 pairs (got ${n})`);
  if (pairs.some((p) => !Number.isFinite(p.parent) || !Number.isFinite(p.offspring))) {
    throw new Error('parentOffspringHeritability requires finite values');
  }
  const meanParent = mean(pairs.map((p) => p.parent));
  let sxx = 0;
  for (const p of pairs) sxx += (p.parent - meanParent) ** 2;
  if (!(sxx > 0)) throw new Error('parentOffspringHeritability requires parents with different values');
  const { m: b, b: intercept } = linearRegression(pairs.map((p) => [p.parent, p.offspring]));
  let sse = 0;
  for (const p of pairs) sse += (p.offspring - intercept - b * p.parent) ** 2;
  const seB = Math.sqrt(sse / (n - 2) / sxx);
  const factor = kind === 'midparent' ? 1 : 2;
  const h2 = factor * b;
  const warnings: string[] = [];
  if (n < 50) warnings.push(`only ${n} pairs: the estimate is very uncertain`);
  if (h2 < 0 || h2 > 1) warnings.push(`the estimate ${h2.toFixed(2)} lies outside 0–1: sampling error or non-genetic resemblance`);
  return { h2, se: factor * seB, b, seB, n, warnings };
}
