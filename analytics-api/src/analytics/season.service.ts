import { DEFAULT_POINTS_FORMULA, PointsFormula, type SeasonReport } from '@shared/contracts/analytics';
import type { Award } from '@shared/domain/awards';
import { competitionSizes } from '@shared/domain/competition-sizes';
import { DEFAULT_LEG_RULE, grandChampionStatus, type LegResultInput, type LegRule, legRuleSchema, legsEarned } from '@shared/domain/legs';
import { seasonPoints, type SeasonResult } from '../stats/season-points';
import { parseAwards } from '../shows/parse-awards';
import type { ClubResultRow, ClubRows } from './analytics.repository';
import { parentPlacements } from './parent-placements';

/** Lines drawn in the cumulative-points chart: the leaders and every member, at most this many. */
const MAX_SERIES = 25;
const LEADERS = 10;
const MAX_TOP_SIRES = 20;

export interface ClubData {
  rows: ClubRows;
  formula: PointsFormula;
  formulaIsDefault: boolean;
  formulaWarning: string | null;
  legRule: LegRule;
  members: Set<string>;
}

const norm = (s: string | null | undefined) => (s ?? '').trim().toLowerCase();

export function buildClubData(rows: ClubRows): ClubData {
  let formula = DEFAULT_POINTS_FORMULA;
  let formulaIsDefault = true;
  let formulaWarning: string | null = null;
  if (rows.club.pointsFormula !== null) {
    const parsed = PointsFormula.safeParse(rows.club.pointsFormula);
    if (parsed.success) {
      formula = parsed.data;
      formulaIsDefault = false;
    } else {
      formulaWarning = 'The club’s stored points formula is not valid; the default 6/4/3/2/1 × entries is used. An officer can set it again.';
    }
  }
  const rule = legRuleSchema.safeParse({ ...DEFAULT_LEG_RULE, ...((rows.club.legRule as object | null) ?? {}) });
  return {
    rows, formula, formulaIsDefault, formulaWarning,
    legRule: rule.success ? rule.data : DEFAULT_LEG_RULE,
    members: new Set(rows.members.map((m) => norm(m.exhibitorName)).filter((n) => n !== '')),
  };
}

/** The animal a result belongs to: its herd animal, else ear ID + exhibitor + breed + sex, else the result alone. */
function identity(r: ClubResultRow): string {
  if (r.animalId !== null) return `animal:${r.animalId}`;
  if (r.earId) return `ear:${norm(r.exhibitor)}|${norm(r.earId)}|${norm(r.breed)}|${r.sex}`;
  return `row:${r.id}`;
}

/**
 * Season report of a club over a date range (the club's season unless given): standings per
 * exhibitor and per exhibitor × breed by the club's points formula (seasonPoints; default
 * 6/4/3/2/1 × animals in the class), cumulative points per show date, entries by breed and
 * show, legs earned (shared/domain/legs, the club's leg rule) per exhibitor, and the top sires
 * of members' animals (parentPlacements, top 3). O(R log R) for R results.
 */
export function seasonReport(data: ClubData, from: string | null, to: string | null): SeasonReport {
  const { club } = data.rows;
  const inRange = (d: string) => (from === null || d >= from) && (to === null || d <= to);
  const shows = data.rows.shows.filter((s) => inRange(s.date));
  const showById = new Map(shows.map((s) => [s.id, s]));
  const results = data.rows.results.filter((r) => showById.has(r.showId) && r.placing >= 1 && r.placing <= r.entries);
  const invalid = data.rows.results.filter((r) => showById.has(r.showId)).length - results.length;
  const isMember = (exhibitor: string) => data.members.has(norm(exhibitor));
  const awardsOf = new Map<string, Award[]>();
  const awards = (text: string) => {
    let a = awardsOf.get(text);
    if (!a) awardsOf.set(text, (a = parseAwards(text)));
    return a;
  };
  const toSeason = (r: ClubResultRow): SeasonResult => ({ exhibitor: r.exhibitor, breed: r.breed, placing: r.placing, entries: r.entries, awards: awards(r.awards) });

  const standings = seasonPoints(results.map(toSeason), data.formula);
  const mark = <T extends { exhibitor: string }>(s: T) => ({ ...s, isMember: isMember(s.exhibitor) });

  // Cumulative points: one seasonPoints per show date, summed in date order.
  const byDate = new Map<string, ClubResultRow[]>();
  for (const r of results) {
    const date = showById.get(r.showId)!.date;
    let list = byDate.get(date);
    if (!list) byDate.set(date, (list = []));
    list.push(r);
  }
  const dates = [...byDate.keys()].sort();
  const drawn = [...new Set([
    ...standings.byExhibitor.slice(0, LEADERS).map((s) => s.exhibitor),
    ...standings.byExhibitor.filter((s) => isMember(s.exhibitor)).map((s) => s.exhibitor),
  ])].slice(0, MAX_SERIES);
  const running = new Map(drawn.map((e) => [e, 0]));
  const series = new Map(drawn.map((e) => [e, [] as number[]]));
  for (const date of dates) {
    const day = seasonPoints(byDate.get(date)!.filter((r) => running.has(r.exhibitor)).map(toSeason), data.formula).byExhibitor;
    for (const s of day) running.set(s.exhibitor, running.get(s.exhibitor)! + s.points);
    for (const e of drawn) series.get(e)!.push(running.get(e)!);
  }

  // Entries by show and breed.
  const breeds = [...new Set(results.map((r) => r.breed))].sort((a, b) => a.localeCompare(b, 'en'));
  const breedIndex = new Map(breeds.map((b, i) => [b, i]));
  const showIndex = new Map(shows.map((s, i) => [s.id, i]));
  const counts = shows.map(() => breeds.map(() => 0));
  for (const r of results) counts[showIndex.get(r.showId)!]![breedIndex.get(r.breed)!]!++;

  // Legs: competition sizes per show, then each animal's results under the club's leg rule.
  const byShow = new Map<number, ClubResultRow[]>();
  for (const r of results) {
    let list = byShow.get(r.showId);
    if (!list) byShow.set(r.showId, (list = []));
    list.push(r);
  }
  const byAnimal = new Map<string, { exhibitor: string; inputs: LegResultInput[] }>();
  for (const [showId, lines] of byShow) {
    const show = showById.get(showId)!;
    const sizes = competitionSizes(lines.map((l) => ({ breed: l.breed, variety: l.variety, sex: l.sex, ageClass: l.ageClass, entriesInClass: l.entries, exhibitorsInClass: l.exhibitors })));
    lines.forEach((r, i) => {
      const key = identity(r);
      let a = byAnimal.get(key);
      if (!a) byAnimal.set(key, (a = { exhibitor: r.exhibitor, inputs: [] }));
      a.inputs.push({
        showId: String(showId), showDate: show.date, judge: r.judge ?? show.judges.join(', '), ageClass: r.ageClass, placing: r.placing,
        entriesInClass: r.entries, exhibitorsInClass: r.exhibitors, awards: awards(r.awards), competitionSizes: sizes[i]!,
        earId: r.earId, sex: r.sex, breed: r.breed,
      });
    });
  }
  const legsPerExhibitor = new Map<string, { legs: number; animals: number; champions: number }>();
  const legsOfAnimal = new Map<number, number>();
  for (const [key, a] of byAnimal) {
    const legs = legsEarned(a.inputs, data.legRule).length;
    if (legs === 0) continue;
    if (key.startsWith('animal:')) legsOfAnimal.set(Number(key.slice(7)), legs);
    const t = legsPerExhibitor.get(a.exhibitor) ?? { legs: 0, animals: 0, champions: 0 };
    t.legs += legs;
    t.animals++;
    if (legs >= data.legRule.legsRequired && grandChampionStatus(a.inputs, data.legRule).isGrandChampion) t.champions++;
    legsPerExhibitor.set(a.exhibitor, t);
  }

  // Top sires: members' herd animals grouped by sire.
  const sireOf = new Map(data.rows.sires.map((s) => [s.animalId, s]));
  const exhibitorOfHerd = new Map(data.rows.members.filter((m) => m.rabbitryId !== null).map((m) => [m.rabbitryId!, m.exhibitorName]));
  const groups = new Map<number, { parent: (typeof data.rows.sires)[number]; results: { animalId: number; placing: number; entries: number }[] }>();
  for (const r of results) {
    if (r.animalId === null) continue;
    const s = sireOf.get(r.animalId);
    if (!s) continue;
    let g = groups.get(s.sireId);
    if (!g) groups.set(s.sireId, (g = { parent: s, results: [] }));
    g.results.push({ animalId: r.animalId, placing: r.placing, entries: r.entries });
  }
  const sires = parentPlacements([...groups.values()], 3);
  const topSires = sires.parents.slice(0, MAX_TOP_SIRES).map((s) => ({
    sire: { id: s.parent.sireId, earId: s.parent.sireEarId, name: s.parent.sireName },
    exhibitor: exhibitorOfHerd.get(s.parent.rabbitryId) ?? null,
    rank: s.rank, entries: s.entries, offspringShown: s.offspringShown, topK: s.topK,
    meanPlacementScore: s.meanPlacementScore, placementIndex: s.placementIndex, shrunkenShare: s.shrunkenShare,
    legs: [...new Set(groups.get(s.parent.sireId)!.results.map((r) => r.animalId))].reduce((sum, id) => sum + (legsOfAnimal.get(id) ?? 0), 0),
  }));

  const warnings: string[] = [];
  if (data.formulaWarning) warnings.push(data.formulaWarning);
  if (shows.length === 0) warnings.push(from || to ? 'No shows of the club fall in this period.' : 'The club has no shows yet.');
  else if (results.length === 0) warnings.push('The club’s shows in this period have no results yet: an officer imports them.');
  if (invalid > 0) warnings.push(`${invalid} result${invalid === 1 ? '' : 's'} with a placing beyond the class size ${invalid === 1 ? 'was' : 'were'} left out.`);
  if (results.length > 0 && groups.size === 0) warnings.push('No result is matched to a member’s herd animal yet: top sires need members’ ear IDs in their herd records.');
  else if (groups.size > 0 && groups.size < 5) warnings.push(`Only ${groups.size} sires with members’ results: the comparison is rough.`);
  warnings.push(...sires.warnings);

  return {
    club: { id: club.id, name: club.name },
    from, to,
    warnings,
    formula: data.formula,
    formulaIsDefault: data.formulaIsDefault,
    totals: {
      shows: shows.length, results: results.length, exhibitors: standings.byExhibitor.length,
      memberResults: results.filter((r) => isMember(r.exhibitor)).length, matchedResults: results.filter((r) => r.animalId !== null).length,
    },
    standings: { byExhibitor: standings.byExhibitor.map(mark), byExhibitorBreed: standings.byExhibitorBreed.map(mark) },
    cumulative: { dates, series: drawn.map((e) => ({ exhibitor: e, isMember: isMember(e), points: series.get(e)! })), totalExhibitors: standings.byExhibitor.length },
    entries: {
      shows: shows.map((s) => ({ id: s.id, name: s.name, date: s.date })),
      breeds,
      counts,
      byBreed: breeds.map((b, i) => ({ breed: b, entries: counts.reduce((sum, row) => sum + row[i]!, 0) })),
    },
    legs: [...legsPerExhibitor].map(([exhibitor, t]) => ({ exhibitor, isMember: isMember(exhibitor), legs: t.legs, animalsWithLegs: t.animals, grandChampionsCompleted: t.champions }))
      .sort((a, b) => b.legs - a.legs || a.exhibitor.localeCompare(b.exhibitor, 'en')),
    topSires,
  };
}
