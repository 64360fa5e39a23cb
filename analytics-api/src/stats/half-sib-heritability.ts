export interface HalfSibHeritability {
  h2: number;
  se: number;
  /** intraclass correlation of paternal half sibs, σ²s/(σ²s + σ²w) */
  t: number;
  sireVariance: number;
  withinVariance: number;
  msBetween: number;
  msWithin: number;
  dfBetween: number;
  dfWithin: number;
  f: number;
  k0: number;
  sires: number;
  n: number;
  warnings: string[];
}

/**
 * Heritability from paternal half sibs by one-way ANOVA of offspring records grouped by sire
 * (Falconer & Mackay 1996, ch. 10; Becker 1984, Manual of Quantitative Genetics):
 *   MSb = Σnᵢ(ȳᵢ − ȳ)²/(s − 1), MSw = ΣΣ(y − ȳᵢ)²/(N − s),
 *   k₀ = (N − Σnᵢ²/N)/(s − 1), σ²s = (MSb − MSw)/k₀, σ²w = MSw,
 *   t = σ²s/(σ²s + σ²w), h² = 4t.
 * SE by Swiger, Harvey, Everson & Gregory (1964) Biometrics 20:818 (from memory), for
 * unbalanced data: Var(t) = 2(N − 1)(1 − t)²(1 + (k₀ − 1)t)² / (k₀²(N − s)(s − 1)),
 * SE(h²) = 4·SE(t). A negative σ²s is reported as 0 (with a warning). Empty groups are left
 * out. O(N).
 *
 * @param groups the offspring values of each sire
 * @throws when fewer than 2 sire groups have records, no group has 2 records, or a value is not finite
 */
export function halfSibHeritability(groups: readonly (readonly number[])[]): HalfSibHeritability {
  const used = groups.filter((g) => g.length > 0);
  const s = used.length;
  if (s < 2) throw new Error('halfSibHeritability requires at least 2 sire groups');
  let N = 0;
  let total = 0;
  let sumSquaredSizes = 0;
  for (const g of used) {
    for (const y of g) if (!Number.isFinite(y)) throw new Error('halfSibHeritability requires finite values');
    N += g.length;
    sumSquaredSizes += g.length * g.length;
    for (const y of g) total += y;
  }
  if (N === s) throw new Error('halfSibHeritability requires a sire group with at least 2 records');
  const grand = total / N;
  let ssBetween = 0;
  let ssWithin = 0;
  for (const g of used) {
    let sum = 0;
    for (const y of g) sum += y;
    const groupMean = sum / g.length;
    ssBetween += g.length * (groupMean - grand) ** 2;
    for (const y of g) ssWithin += (y - groupMean) ** 2;
  }
  const dfBetween = s - 1;
  const dfWithin = N - s;
  const msBetween = ssBetween / dfBetween;
  const msWithin = ssWithin / dfWithin;
  const k0 = (N - sumSquaredSizes / N) / dfBetween;
  const warnings: string[] = [];
  let sireVariance = (msBetween - msWithin) / k0;
  if (sireVariance < 0) {
    warnings.push('the between-sire variance came out negative and is reported as 0');
    sireVariance = 0;
  }
  const t = sireVariance + msWithin > 0 ? sireVariance / (sireVariance + msWithin) : 0;
  const varianceT = (2 * (N - 1) * (1 - t) ** 2 * (1 + (k0 - 1) * t) ** 2) / (k0 * k0 * dfWithin * dfBetween);
  const h2 = 4 * t;
  if (s < 20) warnings.push(`only ${s} sires (fewer than 20): the estimate is very uncertain`);
  if (N < 100) warnings.push(`only ${N} offspring (fewer than 100): the estimate is very uncertain`);
  if (h2 > 1) warnings.push(`the estimate ${h2.toFixed(2)} exceeds 1: sampling error or shared litter environment`);
  return {
    h2,
    se: 4 * Math.sqrt(varianceT),
    t,
    sireVariance,
    withinVariance: msWithin,
    msBetween,
    msWithin,
    dfBetween,
    dfWithin,
    f: msWithin > 0 ? msBetween / msWithin : Infinity,
    k0,
    sires: s,
    n: N,
    warnings,
  };
}
