import type { GrowthBand, GrowthReference } from './growth-reference';
import type { Lms } from './lms';

/**
 * A growth reference written by hand for specs: weekly bands from day 0, each either LMS
 * (given L, M, S and n) or empirical (given weights), or empty (null). Centiles are left
 * null: the functions under test read L, M, S or the weights.
 */
export function handReference(bands: ({ lms: Lms; n: number; midDays?: number } | { weights: number[] } | null)[]): GrowthReference {
  return {
    fromDays: 0,
    toDays: 7 * bands.length,
    warnings: [],
    bands: bands.map((spec, b): GrowthBand => {
      const base = { fromDays: 7 * b, toDays: 7 * b + 7, midDays: 7 * b + 3.5, raw: null, centiles: null };
      if (spec === null) return { ...base, n: 0, fallback: null, lms: null, weights: null };
      if ('weights' in spec) return { ...base, n: spec.weights.length, fallback: 'empirical', lms: null, weights: [...spec.weights].sort((x, y) => x - y) };
      return { ...base, midDays: spec.midDays ?? base.midDays, n: spec.n, fallback: null, lms: spec.lms, weights: null };
    }),
  };
}
