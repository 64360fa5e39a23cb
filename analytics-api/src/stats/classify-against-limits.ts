export type WeightClass = 'under-minimum' | 'below-ideal' | 'on-ideal' | 'above-ideal' | 'over-maximum';

export interface WeightLimits {
  ideal: number;
  min?: number | null;
  /** over the maximum an animal risks disqualification */
  max?: number | null;
}

/**
 * Places a weight against a breed's limits (all in grams): over `max` → 'over-maximum'
 * (disqualification risk), under `min` → 'under-minimum', within ±idealTolerance·ideal of the
 * ideal → 'on-ideal' (the tolerance is the product's choice, default 2.5%, not from a
 * standard), else below or above ideal. The limits themselves count as inside. O(1).
 *
 * @throws when the limits are not positive or not in order min ≤ ideal ≤ max
 */
export function classifyAgainstLimits(grams: number, limits: WeightLimits, idealTolerance = 0.025): WeightClass {
  const { ideal, min = null, max = null } = limits;
  if (!(grams > 0) || !(ideal > 0) || (min !== null && !(min > 0)) || (max !== null && !(max > 0)) || !(idealTolerance >= 0)) {
    throw new Error('classifyAgainstLimits requires positive weights and a non-negative tolerance');
  }
  if ((min !== null && min > ideal) || (max !== null && ideal > max)) {
    throw new Error(`classifyAgainstLimits requires min ≤ ideal ≤ max (got ${min} ≤ ${ideal} ≤ ${max})`);
  }
  if (max !== null && grams > max) return 'over-maximum';
  if (min !== null && grams < min) return 'under-minimum';
  if (Math.abs(grams - ideal) <= idealTolerance * ideal) return 'on-ideal';
  return grams < ideal ? 'below-ideal' : 'above-ideal';
}
