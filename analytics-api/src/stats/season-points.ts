import { competitionRanks } from './competition-ranks';
import { checkPlacing } from './placing';

export interface SeasonResult {
  exhibitor: string;
  breed: string;
  /** 1 = first */
  placing: number;
  /** animals judged in the class */
  entries: number;
  /** award names, e.g. 'bestOfVariety', 'bestOfBreed', 'bestInShow' */
  awards: readonly string[];
}

export type PointsFormula = (
  | { kind: 'multiplied'; base: readonly number[] }
  | { kind: 'flat'; table: readonly number[] }
) & {
  /** points added per award, e.g. { bestOfVariety: 5, bestOfBreed: 10, bestInShow: 25 } */
  bonuses?: Readonly<Record<string, number>>;
};

/** The common show-rule base: placings 1–5 earn 6, 4, 3, 2, 1 × animals in the class. */
export const MULTIPLIED_BASE = [6, 4, 3, 2, 1] as const;

export interface Standing {
  exhibitor: string;
  /** null in the per-exhibitor standings */
  breed: string | null;
  points: number;
  results: number;
  firsts: number;
  awards: number;
  /** competition rank ("1224"); per breed within the breed */
  rank: number;
}

export interface SeasonStandings {
  byExhibitor: Standing[];
  /** grouped by breed (alphabetical), ranked within each breed */
  byExhibitorBreed: Standing[];
}

/**
 * Season points and standings. A result earns base[placing − 1] × entries ('multiplied'; the
 * common show-rule base 6/4/3/2/1, common practice) or table[placing − 1] ('flat'); placings
 * beyond the list earn 0; each award adds its bonus (unknown awards add 0). Standings are
 * sorted by points, ties sharing a rank (competitionRanks) and listed by name. O(r + e log e)
 * for r results and e exhibitor (× breed) entries.
 *
 * @throws when a placing or entries count is invalid, or a points value is negative or not finite
 */
export function seasonPoints(results: readonly SeasonResult[], formula: PointsFormula): SeasonStandings {
  const table = formula.kind === 'multiplied' ? formula.base : formula.table;
  const bonuses = formula.bonuses ?? {};
  for (const value of [...table, ...Object.values(bonuses)]) {
    if (!(value >= 0) || !Number.isFinite(value)) throw new Error('seasonPoints requires non-negative finite points');
  }
  const exhibitors = new Map<string, Standing>();
  const exhibitorBreeds = new Map<string, Standing>();
  const tally = (map: Map<string, Standing>, key: string, exhibitor: string, breed: string | null): Standing => {
    let standing = map.get(key);
    if (standing === undefined) {
      standing = { exhibitor, breed, points: 0, results: 0, firsts: 0, awards: 0, rank: 0 };
      map.set(key, standing);
    }
    return standing;
  };
  for (const result of results) {
    const { exhibitor, breed, placing, entries, awards } = result;
    checkPlacing(placing, entries, `seasonPoints (${exhibitor})`);
    const placed = table[placing - 1] ?? 0;
    let points = formula.kind === 'multiplied' ? placed * entries : placed;
    for (const award of awards) points += bonuses[award] ?? 0;
    for (const standing of [tally(exhibitors, exhibitor, exhibitor, null), tally(exhibitorBreeds, JSON.stringify([breed, exhibitor]), exhibitor, breed)]) {
      standing.points += points;
      standing.results++;
      if (placing === 1) standing.firsts++;
      standing.awards += awards.length;
    }
  }
  const byExhibitor = ranked([...exhibitors.values()]);
  const breeds = [...new Set([...exhibitorBreeds.values()].map((s) => s.breed as string))].sort(compareText);
  const byExhibitorBreed = breeds.flatMap((breed) => ranked([...exhibitorBreeds.values()].filter((s) => s.breed === breed)));
  return { byExhibitor, byExhibitorBreed };
}

function ranked(standings: Standing[]): Standing[] {
  const ranks = competitionRanks(standings.map((s) => s.points));
  standings.forEach((s, i) => (s.rank = ranks[i]));
  return standings.sort((a, b) => a.rank - b.rank || compareText(a.exhibitor, b.exhibitor));
}

function compareText(a: string, b: string): number {
  return a.localeCompare(b, 'en');
}
