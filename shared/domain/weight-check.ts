import { GRAMS_PER_OUNCE } from '../units/weight';
import type { WeightLimits } from './breed';

export type WeightCheckStatus = 'no-limits' | 'under-minimum' | 'on-ideal' | 'within-limits' | 'over-maximum';

export interface WeightCheck {
  status: WeightCheckStatus;
  /** Outside the limits: a judge may disqualify the animal (common practice; check the show's rules). */
  disqualificationRisk: boolean;
  /** grams − ideal, or null when the breed gives no ideal weight. */
  gramsFromIdeal: number | null;
}

/**
 * How close a weight may be to the ideal and still count as "on ideal": 2 oz either side,
 * rounded to whole grams (57 g) because stored weights are whole grams — unrounded, 5 lb 14 oz
 * stored as 2665 g would sit 57 g from a 6 lb ideal stored as 2722 g. Our own choice: about the
 * resolution of a show-table scale read in ounces and a few percent of a small breed's ideal.
 */
export const ON_IDEAL_TOLERANCE_GRAMS = Math.round(2 * GRAMS_PER_OUNCE);

/**
 * Places a weight against a class's limits. Order of tests: over maximum (grams > max) first,
 * then under minimum (grams < min), then on ideal (|grams − ideal| ≤ 57 g, i.e. 2 oz), else within limits.
 * A weight exactly at the maximum or minimum is allowed. Common practice, no source.
 * Cost O(1). Throws `checkWeightAgainstLimits requires a positive whole number of grams`.
 */
export function checkWeightAgainstLimits(grams: number, limits: WeightLimits | null): WeightCheck {
  if (!Number.isInteger(grams) || grams <= 0) {
    throw new Error('checkWeightAgainstLimits requires a positive whole number of grams');
  }
  const ideal = limits?.idealGrams ?? null;
  const gramsFromIdeal = ideal === null ? null : grams - ideal;
  const result = (status: WeightCheckStatus): WeightCheck => ({
    status,
    disqualificationRisk: status === 'over-maximum' || status === 'under-minimum',
    gramsFromIdeal,
  });
  if (!limits || (limits.minGrams === null && ideal === null && limits.maxGrams === null)) return result('no-limits');
  if (limits.maxGrams !== null && grams > limits.maxGrams) return result('over-maximum');
  if (limits.minGrams !== null && grams < limits.minGrams) return result('under-minimum');
  if (gramsFromIdeal !== null && Math.abs(gramsFromIdeal) <= ON_IDEAL_TOLERANCE_GRAMS) return result('on-ideal');
  return result('within-limits');
}
