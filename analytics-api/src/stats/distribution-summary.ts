import { max, mean, min, quantile } from 'simple-statistics';

export interface DistributionSummary {
  n: number;
  min: number;
  q1: number;
  median: number;
  q3: number;
  max: number;
  mean: number;
}

/**
 * Five-number summary and mean of a sample (for box plots by line or rabbitry), quartiles by
 * simple-statistics quantile: Hyndman & Fan (1996) type 7, R's default. O(n log n).
 *
 * @throws when values is empty or holds a non-finite number
 */
export function distributionSummary(values: readonly number[]): DistributionSummary {
  if (values.length === 0) throw new Error('distributionSummary requires at least 1 value');
  if (values.some((v) => !Number.isFinite(v))) throw new Error('distributionSummary requires finite values');
  const sorted = [...values].sort((a, b) => a - b);
  const [q1, median, q3] = quantile(sorted, [0.25, 0.5, 0.75]);
  return { n: sorted.length, min: min(sorted), q1, median, q3, max: max(sorted), mean: mean(sorted) };
}
