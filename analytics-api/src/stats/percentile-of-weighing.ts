import type { GrowthReference } from './growth-reference';
import { growthReferenceAt } from './growth-reference-at';
import { lmsZ } from './lms-z';
import { normalCdf } from './normal-cdf';
import { normalQuantile } from './normal-quantile';

export interface WeighingPercentile {
  z: number;
  /** 0–100 */
  percentile: number;
  method: 'lms' | 'empirical';
  /** weights behind the reference at this age */
  n: number;
}

/**
 * Percentile of one weighing against a growth reference (fitGrowthReference). LMS ages:
 * z = lmsZ(grams, L, M, S at the age), percentile = 100·Φ(z). Empirical bands: the mid-rank
 * share p = (below + ½·equal)/n, kept within [½/n, 1 − ½/n], and z = Φ⁻¹(p). O(1) for LMS,
 * O(n) for an empirical band.
 *
 * @returns null when the reference has nothing at that age
 * @throws when grams is not positive
 */
export function percentileOfWeighing(reference: GrowthReference, ageDays: number, grams: number): WeighingPercentile | null {
  if (!(grams > 0) || !Number.isFinite(grams)) throw new Error(`percentileOfWeighing requires a positive weight (got ${grams})`);
  const point = growthReferenceAt(reference, ageDays);
  if (point === null) return null;
  if (point.method === 'lms') {
    const z = lmsZ(grams, point.lms);
    return { z, percentile: 100 * normalCdf(z), method: 'lms', n: point.n };
  }
  const { weights, n } = point;
  let below = 0;
  let equal = 0;
  for (const w of weights) {
    if (w < grams) below++;
    else if (w === grams) equal++;
  }
  const p = Math.min(1 - 0.5 / n, Math.max(0.5 / n, (below + 0.5 * equal) / n));
  return { z: normalQuantile(p), percentile: 100 * p, method: 'empirical', n };
}
