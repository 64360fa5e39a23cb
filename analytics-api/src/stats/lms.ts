/** Box-Cox power L, median M and coefficient of variation S of a growth reference at one age. */
export interface Lms {
  L: number;
  M: number;
  S: number;
}

/** |L| below this is treated as 0 (the logarithmic limit of the Box-Cox transform). */
export const LMS_ZERO_POWER = 1e-8;

/** Throws unless M and S are positive and L is finite. */
export function checkLms({ L, M, S }: Lms, caller: string): void {
  if (!Number.isFinite(L) || !(M > 0) || !(S > 0) || !Number.isFinite(M) || !Number.isFinite(S)) {
    throw new Error(`${caller} requires a finite L and positive M and S`);
  }
}
