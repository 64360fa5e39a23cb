import { mean, quantile, sampleStandardDeviation } from 'simple-statistics';
import type { GrowthReference } from './growth-reference';
import { growthReferenceAt, type GrowthReferencePoint } from './growth-reference-at';
import { lmsValue } from './lms-value';
import { normalCdf } from './normal-cdf';
import { percentileOfWeighing } from './percentile-of-weighing';
import type { Weighing } from './weight-at-age';
import { Z_95 } from './wilson-interval';

export interface SeniorWeightProjection {
  /** projected weight at the senior age */
  grams: number;
  /** interval bounds; null with a single weighing, or beyond the reference's range */
  lower: number | null;
  upper: number | null;
  /** mean z of the weighings used, and its percentile (0–100) */
  z: number;
  percentile: number;
  weighingsUsed: number;
  /** sample SD of those z (null with a single weighing) */
  zSpread: number | null;
  warnings: string[];
}

/**
 * Projected senior weight by percentile tracking: an animal is assumed to keep its place in
 * the population, so the mean z of its `recent` latest weighings (percentileOfWeighing) is
 * read off the reference at the senior age (lmsValue, or the type-7 quantile at Φ(z̄) in an
 * empirical band).
 * Interval: z̄ ± z₀.₉₇₅·√(s²(1 + 1/k) + (1 + z̄²/2)/n): s²(1 + 1/k) is the prediction variance
 * of a further z of the animal from the spread s of its k z-scores (how well it tracks), and
 * (1 + z̄²/2)/n the large-sample variance of an estimated normal centile μ̂ + zσ̂ from the n
 * reference weights at the senior age (reference uncertainty). Percentiles drift with age,
 * so the interval is a guide, not a guarantee. O(w) for w weighings.
 *
 * @param recent number of latest weighings used (default 3)
 * @returns null when no weighing falls within the reference, or it has nothing at seniorAgeDays
 * @throws when recent is not a positive integer
 */
export function projectSeniorWeight(
  reference: GrowthReference,
  series: readonly Weighing[],
  seniorAgeDays: number,
  recent = 3,
  z = Z_95,
): SeniorWeightProjection | null {
  if (!Number.isInteger(recent) || recent < 1) throw new Error(`projectSeniorWeight requires a positive integer count of recent weighings (got ${recent})`);
  const target = growthReferenceAt(reference, seniorAgeDays);
  if (target === null) return null;
  const scored = series
    .map((w) => ({ ageDays: w.ageDays, result: percentileOfWeighing(reference, w.ageDays, w.grams) }))
    .filter((w) => w.result !== null)
    .sort((a, b) => b.ageDays - a.ageDays)
    .slice(0, recent)
    .map((w) => w.result!.z);
  if (scored.length === 0) return null;

  const warnings: string[] = [];
  const zMean = mean(scored);
  const k = scored.length;
  const spread = k >= 2 ? sampleStandardDeviation(scored) : null;
  let lower: number | null = null;
  let upper: number | null = null;
  if (spread === null) {
    warnings.push('a single weighing: no interval (at least 2 are needed)');
  } else {
    const half = z * Math.sqrt(spread ** 2 * (1 + 1 / k) + (1 + zMean ** 2 / 2) / target.n);
    lower = valueAt(target, zMean - half);
    upper = valueAt(target, zMean + half);
  }
  if (target.method === 'empirical') warnings.push(`the reference at ${seniorAgeDays} days has only ${target.n} weights`);
  const grams = valueAt(target, zMean);
  if (grams === null) return null;
  return { grams, lower, upper, z: zMean, percentile: 100 * normalCdf(zMean), weighingsUsed: k, zSpread: spread, warnings };
}

function valueAt(point: GrowthReferencePoint, zScore: number): number | null {
  if (point.method === 'empirical') return quantile(point.weights, normalCdf(zScore));
  try {
    return lmsValue(zScore, point.lms);
  } catch {
    return null; // z beyond the range the Box-Cox curve can express
  }
}
