import { checkLms, LMS_ZERO_POWER, type Lms } from './lms';

/**
 * z-score of a measurement under an LMS reference (Cole & Green 1992, Stat. Med. 11:1305):
 * z = ((x/M)^L − 1)/(L·S) for L ≠ 0, z = ln(x/M)/S for L = 0. O(1).
 *
 * @throws when x is not positive, or L, M, S are invalid
 */
export function lmsZ(x: number, lms: Lms): number {
  checkLms(lms, 'lmsZ');
  if (!(x > 0) || !Number.isFinite(x)) throw new Error(`lmsZ requires a positive measurement (got ${x})`);
  const { L, M, S } = lms;
  return Math.abs(L) < LMS_ZERO_POWER ? Math.log(x / M) / S : ((x / M) ** L - 1) / (L * S);
}
