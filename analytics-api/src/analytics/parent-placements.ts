import { mean, sampleStandardDeviation } from 'simple-statistics';
import type { MeanWithSe, Proportion } from '@shared/contracts/analytics';
import { betaBinomialShrinkage } from '../stats/beta-binomial-shrinkage';
import { competitionRanks } from '../stats/competition-ranks';
import { placementIndex } from '../stats/placement-index';
import { placementScore } from '../stats/placement-score';
import { wilsonInterval } from '../stats/wilson-interval';

export interface OffspringResult { animalId: number; placing: number; entries: number }
export interface ParentGroup<P> { parent: P; results: OffspringResult[] }

export interface ParentPlacementStats<P> {
  parent: P;
  rank: number;
  entries: number;
  offspringShown: number;
  topK: Proportion;
  meanPlacementScore: MeanWithSe | null;
  placementIndex: { index: number; lower: number; upper: number; observed: number; expected: number } | null;
  shrunkenShare: number;
  shrinkage: number;
  warnings: string[];
}

export interface ParentPlacements<P> {
  parents: ParentPlacementStats<P>[];
  prior: { mean: number; rho: number; alpha: number | null; beta: number | null } | null;
  warnings: string[];
}

/** A mean and its standard error s/√n (null SE below 2 values). */
export function meanWithSe(values: readonly number[]): MeanWithSe | null {
  if (values.length === 0) return null;
  return { mean: mean(values), se: values.length >= 2 ? sampleStandardDeviation(values) / Math.sqrt(values.length) : null, n: values.length };
}

export function proportion(count: number, n: number): Proportion {
  const w = wilsonInterval(count, n);
  return { count, n, share: w.estimate, lower: w.lower, upper: w.upper };
}

/**
 * Placement figures of each parent from its offspring's results: top-k share with its Wilson
 * interval, mean placement score, placement index (observed / expected top-k placings), and
 * the top-k share shrunk toward the rate of all parents together (beta-binomial, empirical
 * Bayes), by which parents are ranked. Results must have 1 ≤ placing ≤ entries. Shared by the
 * sire & dam report and the season's top sires. O(R + P log P).
 */
export function parentPlacements<P>(groups: readonly ParentGroup<P>[], k: number): ParentPlacements<P> {
  const warnings: string[] = [];
  const withResults = groups.filter((g) => g.results.length > 0);
  const counts = withResults.map((g) => ({ successes: g.results.filter((r) => r.placing <= k).length, trials: g.results.length }));
  let shrunk: { shrunken: number; shrinkage: number }[];
  let prior: ParentPlacements<P>['prior'] = null;
  if (withResults.length >= 2) {
    const fit = betaBinomialShrinkage(counts);
    prior = fit.prior;
    shrunk = fit.groups;
    if (fit.prior.rho === 0) warnings.push('The parents differ no more than chance would make them: every shrunken rate equals the overall rate.');
  } else {
    shrunk = counts.map((c) => ({ shrunken: c.successes / c.trials, shrinkage: 0 }));
    if (withResults.length === 1) warnings.push('Only one parent has results: its rate cannot be compared or shrunk toward others.');
  }
  const ranks = competitionRanks(shrunk.map((s) => s.shrunken));
  const parents = withResults.map((g, i): ParentPlacementStats<P> => {
    const results = g.results;
    const scores = results.map((r) => placementScore(r.placing, r.entries)).filter((s): s is number => s !== null);
    const pi = placementIndex(results, k);
    const offspringShown = new Set(results.map((r) => r.animalId)).size;
    const own: string[] = [];
    if (results.length < 20) own.push(`Only ${results.length} result${results.length === 1 ? '' : 's'} from ${offspringShown} offspring: treat the rate as a rough guide (want 20 or more).`);
    if (pi === null) own.push(`Every class had ${k} or fewer entries: placings say nothing about merit here.`);
    else if (pi.certain > 0) own.push(`${pi.certain} result${pi.certain === 1 ? '' : 's'} in classes of ${k} or fewer entries, where every animal places, ${pi.certain === 1 ? 'is' : 'are'} left out of the placement index.`);
    return {
      parent: g.parent,
      rank: ranks[i]!,
      entries: results.length,
      offspringShown,
      topK: proportion(counts[i]!.successes, counts[i]!.trials),
      meanPlacementScore: meanWithSe(scores),
      placementIndex: pi && { index: pi.index, lower: pi.lower, upper: pi.upper, observed: pi.observed, expected: pi.expected },
      shrunkenShare: shrunk[i]!.shrunken,
      shrinkage: shrunk[i]!.shrinkage,
      warnings: own,
    };
  }).sort((a, b) => a.rank - b.rank || b.entries - a.entries);
  return { parents, prior, warnings };
}

/** Top-k share and mean placement score of a set of results (each counted once). */
export function resultsSummary(results: readonly OffspringResult[], k: number): { topK: Proportion | null; meanPlacementScore: MeanWithSe | null } {
  const scores = results.map((r) => placementScore(r.placing, r.entries)).filter((s): s is number => s !== null);
  return {
    topK: results.length > 0 ? proportion(results.filter((r) => r.placing <= k).length, results.length) : null,
    meanPlacementScore: meanWithSe(scores),
  };
}
