import type { AnimalRef } from '@shared/contracts/analytics';
import type { WeightLimits } from '@shared/domain/breed';
import { daysBetween } from '@shared/domain/calendar-date';
import type { AgeClass, Sex } from '@shared/domain/terms';
import { inbreedingCoefficients } from '../stats/inbreeding-coefficients';
import { sortPedigree, type SortedPedigree } from '../stats/sort-pedigree';
import { AppError } from '../http/app-error';
import type { AnimalRow, BreedRow, EvaluationRow, HerdResultRow, HerdRows, LitterRow } from './analytics.repository';

export interface Weighed { weighedOn: string; ageDays: number; grams: number }

/** The records of a scope (one or several rabbitries), indexed for the analytics. Built once per stamp. */
export interface HerdData {
  rabbitryIds: number[];
  rabbitries: { id: number; name: string }[];
  animals: AnimalRow[];
  animal: Map<number, AnimalRow>;
  breeds: Map<number, BreedRow>;
  /** Weighings with ages (animals with a birth date), oldest first. */
  series: Map<number, Weighed[]>;
  /** Evaluations per animal, oldest first. */
  evaluations: Map<number, EvaluationRow[]>;
  results: HerdResultRow[];
  resultsOf: Map<number, HerdResultRow[]>;
  litters: LitterRow[];
  /** Animal ids of each parent's offspring. */
  offspring: Map<number, number[]>;
}

export function buildHerdData(rows: HerdRows): HerdData {
  const animal = new Map(rows.animals.map((a) => [a.id, a]));
  const series = new Map<number, Weighed[]>();
  for (const w of rows.weights) {
    const a = animal.get(w.animalId);
    if (!a?.birthDate || w.weighedOn < a.birthDate || !(w.grams > 0)) continue;
    let list = series.get(w.animalId);
    if (!list) series.set(w.animalId, (list = []));
    list.push({ weighedOn: w.weighedOn, ageDays: daysBetween(a.birthDate, w.weighedOn), grams: w.grams });
  }
  const evaluations = groupBy(rows.evaluations, (e) => e.animalId);
  const resultsOf = groupBy(rows.results, (r) => r.animalId);
  const offspring = new Map<number, number[]>();
  for (const a of rows.animals) {
    for (const p of [a.sireId, a.damId]) {
      if (p === null) continue;
      let list = offspring.get(p);
      if (!list) offspring.set(p, (list = []));
      list.push(a.id);
    }
  }
  return {
    rabbitryIds: rows.rabbitries.map((r) => r.id),
    rabbitries: rows.rabbitries,
    animals: rows.animals,
    animal,
    breeds: new Map(rows.breeds.map((b) => [b.id, b])),
    series,
    evaluations,
    results: rows.results,
    resultsOf,
    litters: rows.litters,
    offspring,
  };
}

function groupBy<T>(items: readonly T[], key: (item: T) => number): Map<number, T[]> {
  const out = new Map<number, T[]>();
  for (const item of items) {
    const k = key(item);
    let list = out.get(k);
    if (!list) out.set(k, (list = []));
    list.push(item);
  }
  return out;
}

export interface PedigreeIndex {
  pedigree: SortedPedigree<number>;
  F: Float64Array;
  /** F of an animal by id (0 when unknown). */
  fOf(id: number): number;
}

/**
 * The scope's pedigree in parents-first order and every animal's inbreeding coefficient.
 * Parents outside the scope become founders. O(n) for a pedigree of bounded depth.
 * Throws AppError 409 when the records hold a loop (an animal that is its own ancestor).
 */
export function pedigreeIndex(data: HerdData): PedigreeIndex {
  let pedigree: SortedPedigree<number>;
  try {
    pedigree = sortPedigree(data.animals.map((a) => ({ id: a.id, sire: a.sireId, dam: a.damId })));
  } catch (e) {
    const found = /animal (\d+) is its own ancestor/.exec((e as Error).message);
    const a = found ? data.animal.get(Number(found[1])) : undefined;
    throw new AppError('pedigree-loop', `The pedigree has a loop${a ? `: ${a.earId} is recorded as its own ancestor` : ''}; correct its parents first`, 409);
  }
  const F = inbreedingCoefficients(pedigree);
  return { pedigree, F, fOf: (id) => { const i = pedigree.indexOf.get(id); return i === undefined ? 0 : F[i]!; } };
}

export function animalRef(data: HerdData, a: AnimalRow): AnimalRef {
  return {
    id: a.id, rabbitryId: a.rabbitryId, earId: a.earId, name: a.name, sex: a.sex, breedId: a.breedId,
    breed: a.breedId === null ? null : (data.breeds.get(a.breedId)?.name ?? null), variety: a.variety, line: a.line,
    birthDate: a.birthDate, status: a.status, isStub: a.isStub,
  };
}

/** The breed's limits for a sex and age class, or null when the breed or its limits are unknown. */
export function limitsOf(data: HerdData, breedId: number | null, sex: Sex, ageClass: AgeClass): WeightLimits | null {
  if (breedId === null) return null;
  return data.breeds.get(breedId)?.weightLimits?.[sex]?.[ageClass] ?? null;
}

/** Whole days of age on a day, or null without a birth date (or before birth). */
export function ageOn(a: AnimalRow, day: string): number | null {
  if (!a.birthDate || a.birthDate > day) return null;
  return daysBetween(a.birthDate, day);
}

/** Animals of the herd itself (not outside stubs) in some rabbitries. */
export function herdAnimals(data: HerdData, rabbitryIds: readonly number[]): AnimalRow[] {
  const set = new Set(rabbitryIds);
  return data.animals.filter((a) => !a.isStub && set.has(a.rabbitryId));
}
