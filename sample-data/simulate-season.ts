import { ageClassOn, ageInDays } from '../shared/domain/age-class';
import type { Award } from '../shared/domain/awards';
import type { Breed } from '../shared/domain/breed';
import { addDays } from '../shared/domain/calendar-date';
import { competitionSizes } from '../shared/domain/competition-sizes';
import { grandChampionStatus, type LegResultInput } from '../shared/domain/legs';
import { AGE_CLASSES, type AgeClass, type Sex } from '../shared/domain/terms';
import { checkWeightAgainstLimits } from '../shared/domain/weight-check';
import type { ResultImportRecord } from '../shared/imports/import-records';
import { meanWeightAt } from './growth';
import { Random } from './random';
import { LAST_DAY, NON_MEMBER_EXHIBITORS, SHOWS, SIMULATION, type ShowPlan } from './scenario';
import { type HerdSimulation, modelWeight, type SimAnimal } from './simulate-herds';

/** An animal on a show table: a member's simulated animal or an outside exhibitor's. */
interface Exhibit {
  exhibitor: string;
  earId: string | null;
  breed: Breed;
  variety: string;
  sex: Sex;
  born: string;
  merit: number;
  growthScale: number;
  member: SimAnimal | null;
}

interface Entry {
  exhibit: Exhibit;
  ageClass: AgeClass;
  score: number;
  placing: number;
  awards: Award[];
}

const MIN_CLASS = 3;
const MAX_CLASS = 15;
const ENTRIES_PER_CLASS = { member: 3, outside: 3 };

function weighsWithinLimits(e: Exhibit, date: string, ageClass: AgeClass): boolean {
  const limits = e.breed.weightLimits[e.sex][ageClass];
  const grams = e.member
    ? modelWeight(e.member, date)
    : meanWeightAt(e.breed, e.sex, ageInDays(e.born, date)) * e.growthScale;
  return !checkWeightAgainstLimits(Math.round(grams), limits).disqualificationRisk;
}

function isShowable(e: Exhibit, date: string): boolean {
  if (e.born > date) return false;
  const age = ageInDays(e.born, date);
  if (age < SIMULATION.firstShowAgeDays || age > 4 * 365) return false;
  const m = e.member;
  return m === null || (m.arrived !== null && m.arrived <= date && (m.exit === null || m.exit.date > date));
}

/** The outside exhibitors' animals for the season, each kept across shows. */
function outsideStock(breeds: readonly Breed[], rng: Random, memberEarIds: Set<string>): Exhibit[] {
  const stock: Exhibit[] = [];
  const used = new Set(memberEarIds);
  const earId = () => {
    let id: string;
    do id = `${rng.pick([...'ACEGJKLNPRUVXYZ'])}${rng.int(1, 99)}${rng.pick([...'ABDEHKMNRTW'])}`; while (used.has(id));
    used.add(id);
    return id;
  };
  for (const exhibitor of NON_MEMBER_EXHIBITORS) {
    const chosen = rng.shuffle(breeds).slice(0, rng.int(1, 2));
    for (const breed of chosen) {
      const count = rng.int(15, 30);
      // Outside exhibitors favour a breed's first-listed (commoner) varieties.
      const popularity = breed.varieties.map((_, i) => (i + 1) ** -1.5);
      for (let i = 0; i < count; i++) {
        stock.push({
          exhibitor, breed, earId: rng.chance(0.6) ? earId() : null, variety: breed.varieties[rng.weighted(popularity)]!,
          sex: rng.chance(0.5) ? 'buck' : 'doe', born: addDays('2024-09-01', rng.int(0, 715)),
          merit: rng.normal(0, 1), growthScale: 1 + SIMULATION.weightCv * rng.normal(0, 1), member: null,
        });
      }
    }
  }
  return stock;
}

/** Best first: the breeder's own view of which animals to bring (evaluation total, else a look). */
function breederPick(e: Exhibit, rng: Random): number {
  const ev = e.member?.evaluation;
  return ev ? Object.values(ev.scores).reduce((s, v) => s + v, 0) / 10 + rng.normal(0, 0.5) : e.merit + rng.normal(0, 0.8);
}

function topBy<T>(items: T[], score: (t: T) => number, n: number): T[] {
  return items.map((t) => ({ t, s: score(t) })).sort((a, b) => b.s - a.s).slice(0, n).map((x) => x.t);
}

export interface SeasonSimulation {
  results: ResultImportRecord[];
  shows: ShowPlan[];
}

/**
 * The 2026 season: at each show the members bring their best showable animals (right age,
 * inside the weight limits), outside exhibitors bring theirs, classes are topped up to at least
 * 3 and trimmed to at most 15 entries, and the judge's ranking is type merit plus show-day noise.
 * Awards go up from the class winners: BOV/BOSV per variety, BOB/BOSB per breed, BIS.
 */
export function simulateSeason(herds: readonly HerdSimulation[], breeds: readonly Breed[], seed: number): SeasonSimulation {
  const rng = new Random(seed);
  const members: Exhibit[] = herds.flatMap((h) =>
    h.animals
      .filter((a) => a.kind !== 'stub' && a.born !== null)
      .map((a) => ({
        exhibitor: h.rabbitry.name, earId: a.earId, breed: a.breed, variety: a.variety, sex: a.sex, born: a.born!,
        merit: a.merit, growthScale: a.growthScale, member: a,
      })),
  );
  const outside = outsideStock(breeds, rng, new Set(members.map((m) => m.earId!)));
  const walkInEarId = (): string | null => (rng.chance(0.5) ? `W${rng.int(100, 999)}` : null);
  const results: ResultImportRecord[] = [];

  SHOWS.forEach((show, showIndex) => {
    if (show.date > LAST_DAY) throw new Error(`simulateSeason requires shows on or before ${LAST_DAY}`);
    const attending = new Set([
      ...herds.filter(() => rng.chance(0.8)).map((h) => h.rabbitry.name),
      ...NON_MEMBER_EXHIBITORS.filter(() => rng.chance(0.6)),
    ]);
    const classes = new Map<string, Entry[]>();
    const classKey = (e: Exhibit, ageClass: AgeClass) => [e.breed.key, e.variety, e.sex, ageClass].join('|');
    const bring = (pool: Exhibit[], perClass: number) => {
      const byExhibitorClass = new Map<string, Exhibit[]>();
      for (const e of pool) {
        if (!attending.has(e.exhibitor) || !isShowable(e, show.date)) continue;
        const ageClass = ageClassOn(e.born, show.date, e.breed.classScheme);
        if (!weighsWithinLimits(e, show.date, ageClass)) continue;
        const key = `${e.exhibitor}|${classKey(e, ageClass)}`;
        if (!byExhibitorClass.has(key)) byExhibitorClass.set(key, []);
        byExhibitorClass.get(key)!.push(e);
      }
      for (const group of byExhibitorClass.values()) {
        for (const e of topBy(group, (x) => breederPick(x, rng), perClass)) {
          const ageClass = ageClassOn(e.born, show.date, e.breed.classScheme);
          const key = classKey(e, ageClass);
          if (!classes.has(key)) classes.set(key, []);
          classes.get(key)!.push({ exhibit: e, ageClass, score: 0, placing: 0, awards: [] });
        }
      }
    };
    bring(members, ENTRIES_PER_CLASS.member);
    bring(outside, ENTRIES_PER_CLASS.outside);

    for (const entries of classes.values()) {
      const first = entries[0]!;
      // Walk-in entries from outside exhibitors keep every class at a realistic size.
      const target = Math.max(Math.min(MAX_CLASS, MIN_CLASS + rng.poisson(1)), entries.length);
      while (entries.length < target) {
        const e = first.exhibit;
        entries.push({
          exhibit: {
            exhibitor: rng.pick(NON_MEMBER_EXHIBITORS), earId: walkInEarId(), breed: e.breed, variety: e.variety, sex: e.sex,
            born: e.born, merit: rng.normal(0, 1), growthScale: 1, member: null,
          },
          ageClass: first.ageClass, score: 0, placing: 0, awards: [],
        });
      }
      while (entries.length > MAX_CLASS) {
        const outsiders = entries.filter((x) => x.exhibit.member === null);
        const drop = outsiders.length > 0 ? rng.pick(outsiders) : rng.pick(entries);
        entries.splice(entries.indexOf(drop), 1);
      }
      for (const x of entries) x.score = x.exhibit.merit + rng.normal(0, SIMULATION.showDayNoiseSd);
      entries.sort((a, b) => b.score - a.score).forEach((x, i) => (x.placing = i + 1));
    }

    // Awards from the class winners upward.
    const winners = [...classes.values()].map((c) => c[0]!);
    const best = (list: Entry[]) => list.reduce<Entry | null>((b, x) => (b === null || x.score > b.score ? x : b), null);
    const bestOfBreed: Entry[] = [];
    for (const breed of breeds) {
      const breedWinners = winners.filter((w) => w.exhibit.breed === breed);
      if (breedWinners.length === 0) continue;
      const candidates: Entry[] = [];
      if (breed.varieties.length > 1) {
        for (const variety of breed.varieties) {
          const vw = breedWinners.filter((w) => w.exhibit.variety === variety);
          const bov = best(vw);
          if (!bov) continue;
          bov.awards.push('BOV');
          candidates.push(bov);
          const bosv = best(vw.filter((w) => w.exhibit.sex !== bov.exhibit.sex));
          if (bosv) {
            bosv.awards.push('BOSV');
            candidates.push(bosv);
          }
        }
      } else {
        candidates.push(...breedWinners);
      }
      const bob = best(candidates.filter((c) => breed.varieties.length === 1 || c.awards.includes('BOV')))!;
      bob.awards.push('BOB');
      bestOfBreed.push(bob);
      const bosb = best(candidates.filter((c) => c.exhibit.sex !== bob.exhibit.sex));
      bosb?.awards.push('BOSB');
    }
    best(bestOfBreed)?.awards.push('BIS');

    const judgeOf = (breed: Breed) => show.judges[(breeds.indexOf(breed) + showIndex) % 2]!;
    const ordered = [...classes.values()].sort((a, b) => {
      const x = a[0]!.exhibit;
      const y = b[0]!.exhibit;
      return (
        breeds.indexOf(x.breed) - breeds.indexOf(y.breed) ||
        x.breed.varieties.indexOf(x.variety) - y.breed.varieties.indexOf(y.variety) ||
        (x.sex === y.sex ? 0 : x.sex === 'buck' ? -1 : 1) ||
        AGE_CLASSES.indexOf(a[0]!.ageClass) - AGE_CLASSES.indexOf(b[0]!.ageClass)
      );
    });
    for (const entries of ordered) {
      const exhibitors = new Set(entries.map((x) => x.exhibit.exhibitor)).size;
      for (const x of entries) {
        results.push({
          showName: show.name, showDate: show.date, location: show.location, judge: judgeOf(x.exhibit.breed), sanctionNo: show.sanctionNo,
          earId: x.exhibit.earId, exhibitor: x.exhibit.exhibitor, breed: x.exhibit.breed.name,
          variety: x.exhibit.breed.varieties.length > 1 ? x.exhibit.variety : null, sex: x.exhibit.sex, ageClass: x.ageClass,
          entriesInClass: entries.length, exhibitorsInClass: exhibitors, placing: x.placing,
          awards: (['BOV', 'BOSV', 'BOB', 'BOSB', 'BIS'] as const).filter((aw) => x.awards.includes(aw)),
        });
      }
    }
  });
  return { results, shows: SHOWS };
}

/**
 * Grand champions of the season by the default leg rule (legs.ts), among the members'
 * registered animals (a grand champion certificate is issued for registered animals —
 * common practice, no source). Returns "rabbitry name|ear ID" keys.
 */
export function seasonGrandChampions(results: readonly ResultImportRecord[], herds: readonly HerdSimulation[]): Set<string> {
  const byShow = new Map<string, ResultImportRecord[]>();
  for (const r of results) {
    const key = `${r.showName}|${r.showDate}`;
    if (!byShow.has(key)) byShow.set(key, []);
    byShow.get(key)!.push(r);
  }
  const perAnimal = new Map<string, LegResultInput[]>();
  for (const [showId, lines] of byShow) {
    const sizes = competitionSizes(lines);
    lines.forEach((r, i) => {
      if (!r.earId) return;
      const key = `${r.exhibitor}|${r.earId}`;
      if (!perAnimal.has(key)) perAnimal.set(key, []);
      perAnimal.get(key)!.push({
        showId, showDate: r.showDate, judge: r.judge, ageClass: r.ageClass, placing: r.placing,
        entriesInClass: r.entriesInClass, exhibitorsInClass: r.exhibitorsInClass, awards: r.awards,
        competitionSizes: sizes[i]!, earId: r.earId, sex: r.sex, breed: r.breed,
      });
    });
  }
  const champions = new Set<string>();
  for (const h of herds) {
    for (const a of h.animals) {
      const key = `${h.rabbitry.name}|${a.earId}`;
      const mine = perAnimal.get(key);
      if (a.registrationNo && mine && grandChampionStatus(mine).isGrandChampion) champions.add(key);
    }
  }
  return champions;
}
