import { mean, sampleStandardDeviation } from 'simple-statistics';
import { competitionRanks } from './competition-ranks';

export interface KeeperCandidate {
  id: string;
  /** e.g. breedingValue, ownEvaluation, weightOnTarget, parentsPlacementIndex, inbreeding; null = missing */
  components: Readonly<Record<string, number | null>>;
}

export interface KeeperContribution {
  component: string;
  value: number | null;
  /** direction × (value − mean)/SD among the candidates; 0 when missing */
  z: number;
  weight: number;
  contribution: number;
}

export interface KeeperScore {
  id: string;
  total: number;
  rank: number;
  contributions: KeeperContribution[];
}

/** Components where less is better unless the caller says otherwise. */
export const KEEPER_PENALTIES: Readonly<Record<string, -1>> = { inbreeding: -1 };

/**
 * Keeper index: a transparent weighted sum of standardised components. For each weighted
 * component, z = direction·(x − x̄)/s over the candidates that have it (s the sample SD;
 * direction +1, or −1 for penalties such as inbreeding); a missing value counts as the
 * candidates' average (z = 0; its value stays null), as does every value when fewer than 2 candidates
 * have it or they are all equal. contribution = weight·z, total = Σ contributions, rank by
 * total (competitionRanks). `weightOnTarget` is expected as a closeness score (higher =
 * nearer the breed's target). O(c·k) for c candidates and k components.
 *
 * @param direction +1 or −1 per component (default +1; −1 for KEEPER_PENALTIES)
 * @throws when a weight is not finite or a value is not finite
 */
export function keeperIndex(
  candidates: readonly KeeperCandidate[],
  weights: Readonly<Record<string, number>>,
  direction: Readonly<Record<string, 1 | -1>> = {},
): KeeperScore[] {
  const components = Object.keys(weights).filter((c) => weights[c] !== 0);
  const standardised = components.map((component) => {
    if (!Number.isFinite(weights[component])) throw new Error(`keeperIndex requires a finite weight for ${component}`);
    const sign = direction[component] ?? KEEPER_PENALTIES[component] ?? 1;
    const values = candidates.map((c) => c.components[component] ?? null);
    const present = values.filter((v): v is number => v !== null);
    if (present.some((v) => !Number.isFinite(v))) throw new Error(`keeperIndex requires finite values of ${component}`);
    const centre = present.length > 0 ? mean(present) : 0;
    const sd = present.length >= 2 ? sampleStandardDeviation(present) : 0;
    return values.map((v) => (v !== null && sd > 0 ? (sign * (v - centre)) / sd : 0));
  });
  const totals: number[] = [];
  const scored = candidates.map((candidate, i) => {
    const contributions = components.map((component, k) => ({
      component,
      value: candidate.components[component] ?? null,
      z: standardised[k][i],
      weight: weights[component],
      contribution: weights[component] * standardised[k][i],
    }));
    const total = contributions.reduce((sum, c) => sum + c.contribution, 0);
    totals.push(total);
    return { id: candidate.id, total, rank: 0, contributions };
  });
  const ranks = competitionRanks(totals);
  scored.forEach((s, i) => (s.rank = ranks[i]));
  return scored.sort((a, b) => a.rank - b.rank || a.id.localeCompare(b.id, 'en'));
}
