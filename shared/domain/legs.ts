import * as z from 'zod';
import { type Award, AWARD_COMPETITION, AWARD_LABELS, AWARDS } from './awards';
import type { CompetitionSize, CompetitionSizes } from './competition-sizes';
import type { AgeClass, Sex } from './terms';

/**
 * A club's rule for legs toward grand champion. The default is common practice, no source:
 * a leg for first in class, BOV/BOSV, BOB/BOSB or BIS when that competition had at least
 * 5 animals from at least 3 exhibitors; grand champion after 3 legs under at least 2 judges,
 * at least one won as intermediate or senior, all with the same ear ID, sex and breed.
 */
export interface LegRule {
  minEntries: number;
  minExhibitors: number;
  firstInClassEarnsLeg: boolean;
  legAwards: Award[];
  legsRequired: number;
  minJudges: number;
  minLegsAsIntermediateOrSenior: number;
}

export const DEFAULT_LEG_RULE: LegRule = {
  minEntries: 5,
  minExhibitors: 3,
  firstInClassEarnsLeg: true,
  legAwards: [...AWARDS],
  legsRequired: 3,
  minJudges: 2,
  minLegsAsIntermediateOrSenior: 1,
};

export const legRuleSchema = z.object({
  minEntries: z.number().int().min(1),
  minExhibitors: z.number().int().min(1),
  firstInClassEarnsLeg: z.boolean(),
  legAwards: z.array(z.enum(AWARDS)),
  legsRequired: z.number().int().min(1),
  minJudges: z.number().int().min(1),
  minLegsAsIntermediateOrSenior: z.number().int().min(0),
});

/** One show result of one animal. earId, sex and breed, when given, must agree for legs to add up. */
export interface LegResultInput {
  showId: string;
  showDate: string;
  judge: string;
  ageClass: AgeClass;
  placing: number;
  entriesInClass: number;
  exhibitorsInClass: number;
  awards: Award[];
  competitionSizes: CompetitionSizes;
  earId?: string | null;
  sex?: Sex | null;
  breed?: string | null;
}

export type LegBasis = 'first-in-class' | Award;

export interface Leg {
  showId: string;
  showDate: string;
  judge: string;
  ageClass: AgeClass;
  basis: LegBasis;
  /** The size of the competition the leg was won in. */
  entries: number;
  exhibitors: number;
}

export const LEG_BASIS_LABELS: Record<LegBasis, string> = { 'first-in-class': 'First in class', ...AWARD_LABELS };

// When one show offers several qualifying wins, the leg is named after the highest one.
const BASIS_RANK: readonly LegBasis[] = ['BIS', 'BOB', 'BOSB', 'BOV', 'BOSV', 'first-in-class'];

function qualifies(size: CompetitionSize, rule: LegRule): boolean {
  return size.entries >= rule.minEntries && size.exhibitors >= rule.minExhibitors;
}

function checkRule(rule: LegRule, caller: string): void {
  const parsed = legRuleSchema.safeParse(rule);
  if (!parsed.success) throw new Error(`${caller} requires a valid leg rule (${parsed.error.issues[0]?.message})`);
}

/**
 * The legs an animal's results earn under a rule, at most one per show, oldest first.
 * A win qualifies when its competition (class for first in class, variety for BOV/BOSV, breed
 * for BOB/BOSB, show for BIS) had ≥ minEntries animals from ≥ minExhibitors exhibitors.
 * At most one leg per show is common practice: a leg certifies the animal beat a field on the
 * day, and winning class, variety and breed at one show is one such day, not three.
 * Cost O(n log n) for n results. Throws `legsEarned requires a valid leg rule (…)`.
 */
export function legsEarned(results: readonly LegResultInput[], rule: LegRule = DEFAULT_LEG_RULE): Leg[] {
  checkRule(rule, 'legsEarned');
  const byShow = new Map<string, Leg>();
  for (const r of results) {
    const candidates: Leg[] = [];
    const base = { showId: r.showId, showDate: r.showDate, judge: r.judge, ageClass: r.ageClass };
    if (rule.firstInClassEarnsLeg && r.placing === 1) {
      const size = { entries: r.entriesInClass, exhibitors: r.exhibitorsInClass };
      if (qualifies(size, rule)) candidates.push({ ...base, basis: 'first-in-class', ...size });
    }
    for (const award of r.awards) {
      if (!rule.legAwards.includes(award)) continue;
      const size = r.competitionSizes[AWARD_COMPETITION[award]];
      if (qualifies(size, rule)) candidates.push({ ...base, basis: award, ...size });
    }
    const known = byShow.get(r.showId);
    if (known) candidates.push(known);
    candidates.sort((a, b) => BASIS_RANK.indexOf(a.basis) - BASIS_RANK.indexOf(b.basis));
    if (candidates[0]) byShow.set(r.showId, candidates[0]);
  }
  return [...byShow.values()].sort((a, b) => (a.showDate < b.showDate ? -1 : a.showDate > b.showDate ? 1 : 0));
}

export interface GrandChampionStatus {
  isGrandChampion: boolean;
  /** The show date on which the last needed condition was met. */
  completedOn: string | null;
  /** Legs that count together (same ear ID, sex and breed as the latest result). */
  legs: Leg[];
  /** What is still needed, in words a breeder reads; empty when grand champion. */
  missing: string[];
}

/**
 * Grand champion status under a rule: legs (legsEarned) won with the same ear ID, sex and breed
 * as the animal's latest result count together; the animal is grand champion when, taking legs
 * in date order, it first holds ≥ legsRequired legs under ≥ minJudges different judges with
 * ≥ minLegsAsIntermediateOrSenior won as intermediate or senior. Judges are compared
 * case-insensitively. Results without ear ID, sex or breed are taken to match.
 * Cost O(n log n). Throws `grandChampionStatus requires a valid leg rule (…)`.
 */
export function grandChampionStatus(
  results: readonly LegResultInput[],
  rule: LegRule = DEFAULT_LEG_RULE,
): GrandChampionStatus {
  checkRule(rule, 'grandChampionStatus');
  const latest = [...results].sort((a, b) => (a.showDate < b.showDate ? 1 : a.showDate > b.showDate ? -1 : 0))[0];
  const norm = (s: string | null | undefined) => s?.trim().toUpperCase() || null;
  const matches = (r: LegResultInput) =>
    (['earId', 'sex', 'breed'] as const).every((k) => {
      const want = norm(latest?.[k]);
      const have = norm(r[k]);
      return want === null || have === null || want === have;
    });
  const legs = legsEarned(results.filter(matches), rule);
  const legShows = new Set(legs.map((l) => l.showId));
  const excluded = legsEarned(results.filter((r) => !matches(r)), rule).filter((l) => !legShows.has(l.showId)).length;

  const judges = new Set<string>();
  let older = 0;
  let completedOn: string | null = null;
  for (const [i, leg] of legs.entries()) {
    judges.add(leg.judge.trim().toLowerCase());
    if (leg.ageClass !== 'junior') older++;
    if (i + 1 >= rule.legsRequired && judges.size >= rule.minJudges && older >= rule.minLegsAsIntermediateOrSenior) {
      completedOn = leg.showDate;
      break;
    }
  }

  const missing: string[] = [];
  if (completedOn === null) {
    const short = rule.legsRequired - legs.length;
    if (short > 0) missing.push(`needs ${short} more leg${short === 1 ? '' : 's'} (has ${legs.length} of ${rule.legsRequired})`);
    if (judges.size < rule.minJudges) {
      missing.push(`needs legs under at least ${rule.minJudges} different judges (has ${judges.size})`);
    }
    if (older < rule.minLegsAsIntermediateOrSenior) {
      const n = rule.minLegsAsIntermediateOrSenior;
      missing.push(`needs ${n === 1 ? 'a leg' : `${n} legs`} won as intermediate or senior`);
    }
    if (excluded > 0) {
      missing.push(`${excluded} leg${excluded === 1 ? ' was' : 's were'} won under a different ear ID, sex or breed and cannot count`);
    }
  }
  return { isGrandChampion: completedOn !== null, completedOn, legs, missing };
}
