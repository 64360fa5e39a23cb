/**
 * Within-family (Mendelian sampling) variance of an animal's breeding value, as a share of
 * the additive variance: d = 1 − ¼(1 + F_sire)·[sire known] − ¼(1 + F_dam)·[dam known],
 * i.e. ½ − ¼(F_s + F_d) with both parents known, ¾ − ¼F_p with one, 1 with none.
 * Source: Quaas (1976) Biometrics 32:949; Mrode (2014) §2.3. O(1).
 *
 * @param sire index of the sire or −1
 * @param dam index of the dam or −1
 * @param F inbreeding coefficients of (at least) the parents
 */
export function mendelianSamplingVariance(sire: number, dam: number, F: ArrayLike<number>): number {
  let d = 1;
  if (sire >= 0) d -= 0.25 * (1 + F[sire]);
  if (dam >= 0) d -= 0.25 * (1 + F[dam]);
  return d;
}
