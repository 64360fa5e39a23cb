import { mean, sampleStandardDeviation } from 'simple-statistics';
import { type TraitInfo, WEIGHT_TRAIT_AGES, WEIGHT_TRAITS } from '@shared/contracts/analytics';
import { AppError } from '../http/app-error';
import { placementScore } from '../stats/placement-score';
import { weightAtAge } from '../stats/weight-at-age';
import type { HerdData } from './herd-data';

/** Tolerance of the weight-at-age interpolation, as the analytics brief fixes it: ±10 days. */
export const WEIGHT_TOLERANCE_DAYS = 10;
export const PLACEMENT_TRAIT = 'placement_score';

export interface TraitValues {
  info: TraitInfo;
  /** Each animal's record in the trait's own unit. */
  raw: Map<number, number>;
  /** The record standardised within breed and sex: (y − group mean) / group SD. */
  z: Map<number, number>;
  /** SD of the animal's breed × sex group (to turn standardised values back into units). */
  groupSd: Map<string, number>;
  groupOf(animalId: number): string;
  adjustment: string;
  /** Records left out because their breed × sex group had fewer than 2 values or no spread. */
  unstandardised: number;
}

const WEIGHT_LABELS: Record<(typeof WEIGHT_TRAITS)[number], string> = {
  weight_8w: 'Weight at 8 weeks', weight_12w: 'Weight at 12 weeks', weight_16w: 'Weight at 16 weeks',
};

/** The trait's description, or a 400 naming the traits the scope's breeds know. */
export function traitInfo(data: HerdData, trait: string): TraitInfo {
  if ((WEIGHT_TRAITS as readonly string[]).includes(trait)) {
    const key = trait as (typeof WEIGHT_TRAITS)[number];
    return { key, label: WEIGHT_LABELS[key], kind: 'weight', unit: 'grams', standardAgeDays: WEIGHT_TRAIT_AGES[key], toleranceDays: WEIGHT_TOLERANCE_DAYS };
  }
  if (trait === PLACEMENT_TRAIT) {
    return { key: trait, label: 'Placement score at shows', kind: 'placement', unit: 'score', standardAgeDays: null, toleranceDays: null };
  }
  for (const breed of data.breeds.values()) {
    const t = breed.traits.find((x) => x.key === trait);
    if (t) return { key: trait, label: t.label, kind: 'evaluation', unit: 'points', standardAgeDays: null, toleranceDays: null };
  }
  const known = [...WEIGHT_TRAITS, PLACEMENT_TRAIT, ...new Set([...data.breeds.values()].flatMap((b) => b.traits.map((t) => t.key)))];
  throw new AppError('validation', `Unknown trait ${trait}`, 400, { trait: `Choose one of ${known.join(', ')}` });
}

/**
 * Each animal's record of a trait, raw and standardised within breed × sex so that breeds and
 * sexes pool (weights and scores differ between them far more than within):
 * - weight_8w/12w/16w: weightAtAge of the animal's weighings at 56/84/112 days, interpolated
 *   between weighings at most 10 days either side, never extrapolated;
 * - an evaluation trait: the score of the animal's first evaluation holding it (a breeder
 *   evaluates juniors at about the same age);
 * - placement_score: the mean class-size-adjusted placement score of the animal's results.
 * O(records).
 */
export function traitValues(data: HerdData, trait: string): TraitValues {
  const info = traitInfo(data, trait);
  const raw = new Map<number, number>();
  if (info.kind === 'weight') {
    for (const [id, series] of data.series) {
      const v = weightAtAge(series, info.standardAgeDays!, WEIGHT_TOLERANCE_DAYS);
      if (v !== null) raw.set(id, v);
    }
  } else if (info.kind === 'evaluation') {
    for (const [id, list] of data.evaluations) {
      const first = list.find((e) => typeof e.scores[trait] === 'number' && Number.isFinite(e.scores[trait]));
      if (first) raw.set(id, first.scores[trait]!);
    }
  } else {
    for (const [id, list] of data.resultsOf) {
      const scores = list.filter((r) => r.placing >= 1 && r.placing <= r.entries).map((r) => placementScore(r.placing, r.entries)).filter((s): s is number => s !== null);
      if (scores.length > 0) raw.set(id, mean(scores));
    }
  }
  const groupOf = (id: number): string => {
    const a = data.animal.get(id);
    return `${a?.breedId ?? 'none'}|${a?.sex ?? 'none'}`;
  };
  const groups = new Map<string, number[]>();
  for (const [id, v] of raw) {
    const g = groupOf(id);
    let list = groups.get(g);
    if (!list) groups.set(g, (list = []));
    list.push(v);
  }
  const centre = new Map<string, number>();
  const groupSd = new Map<string, number>();
  for (const [g, values] of groups) {
    if (values.length < 2) continue;
    const sd = sampleStandardDeviation(values);
    if (!(sd > 0)) continue;
    centre.set(g, mean(values));
    groupSd.set(g, sd);
  }
  const z = new Map<number, number>();
  let unstandardised = 0;
  for (const [id, v] of raw) {
    const g = groupOf(id);
    const sd = groupSd.get(g);
    if (sd === undefined) unstandardised++;
    else z.set(id, (v - centre.get(g)!) / sd);
  }
  return {
    info, raw, z, groupSd, groupOf, unstandardised,
    adjustment: 'Records are standardised within breed and sex (difference from the group mean in standard deviations), so breeds and sexes pool.',
  };
}
