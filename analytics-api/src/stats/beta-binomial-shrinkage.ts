export interface SuccessCount {
  successes: number;
  trials: number;
}

export interface BetaBinomialShrinkage {
  prior: {
    /** pooled rate Σx/Σn, the prior mean */
    mean: number;
    /** intra-group correlation ρ = 1/(α + β + 1); 0 when no extra-binomial variation is seen */
    rho: number;
    /** prior α and β; null when ρ = 0 (infinitely strong prior: every rate is the pooled one) */
    alpha: number | null;
    beta: number | null;
  };
  groups: {
    raw: number | null;
    /** posterior mean (x + α)/(n + α + β) */
    shrunken: number;
    /** weight of the prior mean in the shrunken rate, (α + β)/(n + α + β) */
    shrinkage: number;
  }[];
  warnings: string[];
}

/**
 * Empirical-Bayes shrinkage of per-group rates (e.g. a parent's offspring placed in the top
 * 3) toward the pooled rate, with a beta(α, β) prior fitted by the method of moments with
 * weights nᵢ — the first step of Kleinman (1973) JASA 68:46–54 (from memory), the algebra of a
 * one-way ANOVA intraclass correlation. With p̄ = Σxᵢ/N, S = Σ nᵢ(pᵢ − p̄)² and
 * E[S] = p̄(1 − p̄)[(m − 1)(1 − ρ) + ρ(N − Σnᵢ²/N)]:
 *   ρ̂ = (S/(p̄(1 − p̄)) − (m − 1)) / (N − Σnᵢ²/N − (m − 1)),   α + β = 1/ρ̂ − 1,
 *   α = p̄(α + β), β = (1 − p̄)(α + β); shrunken rate (xᵢ + α)/(nᵢ + α + β).
 * ρ̂ is clipped to [0, 1]: at 0 every group gets the pooled rate, at 1 its own rate.
 * Groups with 0 trials are kept (raw null, shrunken = prior mean). O(m).
 *
 * @throws when there are fewer than 2 groups with trials, or a count is invalid
 */
export function betaBinomialShrinkage(groups: readonly SuccessCount[]): BetaBinomialShrinkage {
  let N = 0;
  let X = 0;
  let sumSquares = 0;
  let m = 0;
  for (const { successes, trials } of groups) {
    if (!Number.isInteger(trials) || trials < 0 || !Number.isInteger(successes) || successes < 0 || successes > trials) {
      throw new Error(`betaBinomialShrinkage requires integer counts with 0 ≤ successes ≤ trials (got ${successes} of ${trials})`);
    }
    if (trials > 0) m++;
    N += trials;
    X += successes;
    sumSquares += trials * trials;
  }
  if (m < 2) throw new Error('betaBinomialShrinkage requires at least 2 groups with trials');
  const mean = X / N;
  const warnings: string[] = [];
  let rho: number;
  if (mean === 0 || mean === 1) {
    rho = 0;
    warnings.push(`every trial was a ${mean === 0 ? 'failure' : 'success'}: no between-group variation can be estimated`);
  } else {
    let S = 0;
    for (const { successes, trials } of groups) if (trials > 0) S += trials * (successes / trials - mean) ** 2;
    const effective = N - sumSquares / N - (m - 1);
    rho = effective > 0 ? (S / (mean * (1 - mean)) - (m - 1)) / effective : 0;
    if (effective <= 0) warnings.push('every group has a single trial: the prior cannot be fitted');
    else if (rho <= 0) warnings.push('no variation between groups beyond chance: every rate is shrunk to the pooled rate');
    rho = Math.min(1, Math.max(0, rho));
  }
  if (m < 10) warnings.push(`only ${m} groups: the fitted prior is rough`);
  const strength = rho > 0 ? 1 / rho - 1 : Infinity; // α + β
  const alpha = Number.isFinite(strength) ? mean * strength : null;
  const beta = Number.isFinite(strength) ? (1 - mean) * strength : null;
  return {
    prior: { mean, rho, alpha, beta },
    groups: groups.map(({ successes, trials }) => {
      const shrinkage = Number.isFinite(strength) ? (trials + strength === 0 ? 0 : strength / (trials + strength)) : 1;
      const raw = trials > 0 ? successes / trials : null;
      return { raw, shrunken: shrinkage * mean + (1 - shrinkage) * (raw ?? mean), shrinkage };
    }),
    warnings,
  };
}
