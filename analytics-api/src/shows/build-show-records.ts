import type { Award } from '@shared/domain/awards';
import { type ClassResultLine, competitionSizes } from '@shared/domain/competition-sizes';
import { DEFAULT_LEG_RULE, type GrandChampionStatus, grandChampionStatus, type LegResultInput, type LegRule } from '@shared/domain/legs';
import type { AgeClass, ClassScheme, Sex } from '@shared/domain/terms';
import { computedAgeClass } from './computed-age-class';

/** One stored result of an animal, with its show. */
export interface StoredResult {
  id: number;
  animalId: number;
  showId: number;
  showName: string;
  showDate: string;
  /** The result's own judge, else the show's judges. */
  judge: string | null;
  showJudges: string[];
  earId: string | null;
  breed: string;
  variety: string | null;
  sex: Sex;
  ageClass: AgeClass;
  entriesInClass: number;
  exhibitorsInClass: number;
  placing: number;
  awards: Award[];
}

export interface AnimalFacts { id: number; birthDate: string | null; classScheme: ClassScheme | null }

export interface ShowRecordEntry extends StoredResult {
  computedAgeClass: AgeClass | null;
  ageClassMismatch: boolean;
}

export interface AnimalShowRecord { results: ShowRecordEntry[]; status: GrandChampionStatus }

/**
 * Each animal's show record: its results (newest first) with the age class its birth date gives
 * on the show day, and its legs and grand champion status under the leg rule.
 * `classes` are the class lines of every show involved (one line per class is enough:
 * competitionSizes takes the largest entries and exhibitors a class reports), from which the
 * variety, breed and show competition sizes of each result follow.
 * Cost O(R + C) for R results and C class lines, plus O(r log r) per animal for legs.
 * Throws what grandChampionStatus throws for an invalid rule.
 */
export function buildShowRecords(
  results: readonly StoredResult[],
  classes: readonly (ClassResultLine & { showId: number })[],
  animals: readonly AnimalFacts[],
  rule: LegRule = DEFAULT_LEG_RULE,
): Map<number, AnimalShowRecord> {
  const classesByShow = new Map<number, ClassResultLine[]>();
  for (const c of classes) {
    const list = classesByShow.get(c.showId) ?? [];
    list.push(c);
    classesByShow.set(c.showId, list);
  }
  const resultsByShow = new Map<number, StoredResult[]>();
  for (const r of results) {
    const list = resultsByShow.get(r.showId) ?? [];
    list.push(r);
    resultsByShow.set(r.showId, list);
  }
  // The animals' own lines go after the show's classes in one call per show; being lines of
  // classes already counted, they change no sizes, and their sizes come back in order.
  const legInputs = new Map<number, LegResultInput>();
  for (const [showId, own] of resultsByShow) {
    const showClasses = classesByShow.get(showId) ?? [];
    const sizes = competitionSizes([...showClasses, ...own]);
    own.forEach((r, i) => {
      legInputs.set(r.id, {
        showId: String(r.showId), showDate: r.showDate, judge: r.judge ?? r.showJudges.join(', '),
        ageClass: r.ageClass, placing: r.placing, entriesInClass: r.entriesInClass, exhibitorsInClass: r.exhibitorsInClass,
        awards: r.awards, competitionSizes: sizes[showClasses.length + i]!, earId: r.earId, sex: r.sex, breed: r.breed,
      });
    });
  }
  const byAnimal = new Map<number, StoredResult[]>();
  for (const r of results) {
    const list = byAnimal.get(r.animalId) ?? [];
    list.push(r);
    byAnimal.set(r.animalId, list);
  }
  const out = new Map<number, AnimalShowRecord>();
  for (const a of animals) {
    const own = (byAnimal.get(a.id) ?? []).slice().sort((x, y) => (x.showDate < y.showDate ? 1 : x.showDate > y.showDate ? -1 : y.id - x.id));
    const entries = own.map((r) => {
      const computed = computedAgeClass(a.birthDate, r.showDate, a.classScheme);
      return { ...r, computedAgeClass: computed, ageClassMismatch: computed !== null && computed !== r.ageClass };
    });
    out.set(a.id, { results: entries, status: grandChampionStatus(own.map((r) => legInputs.get(r.id)!), rule) });
  }
  return out;
}
