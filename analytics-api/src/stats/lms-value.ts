import { checkLms, LMS_ZERO_POWER, type Lms } from './lms';

/**
 * The measurement at z-score z under an LMS reference (Cole & Green 1992):
 * x = M(1 + L·S·z)^(1/L) for L ≠ 0, x = M·exp(S·z) for L = 0. O(1).
 *
 * @throws when L, M, S are invalid or 1 + L·S·z ≤ 0 (z beyond the transform's range)
 */
export function lmsValue(z: number, lms: Lms): number {
  checkLms(lms, 'lmsValue');
  if (!Number.isFinite(z)) throw new Error(`lmsValue requires a finite z (got ${z})`);
  const { L, M, S } = lms;
  if (Math.abs(L) < LMS_ZERO_POWER) return M * Math.exp(S * z);
  const base = 1 + L * S * z;
  if (!(base > 0)) throw new Error(`lmsValue is undefined where 1 + L·S·z ≤ 0 (L ${L}, S ${S}, z ${z})`);
  return M * base ** (1 / L);
}
