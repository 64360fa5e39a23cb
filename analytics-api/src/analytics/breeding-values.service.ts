import type { BreedingValuesReport } from '@shared/contracts/analytics';
import { animalModelBlup, type AnimalModelSolution, type BlupRecord } from '../stats/animal-model-blup';
import { competitionRanks } from '../stats/competition-ranks';
import { placementScore } from '../stats/placement-score';
import type { CacheEntry } from './analytics-cache';
import { type HerdContext, pedigreeOf, sentence, traitOf } from './analytics-context';
import { heritabilityEstimates } from './heritability.service';
import { animalRef, type HerdData } from './herd-data';
import { PLACEMENT_TRAIT, type TraitValues } from './trait-values';

/** Used when neither the caller nor the records give a usable heritability: a middling value. */
export const DEFAULT_H2 = 0.25;
/** Exact accuracies (dense inverse) up to this many equations. */
const EXACT_ACCURACY_LIMIT = 1500;

export interface HeritabilityChoice { value: number; source: 'user' | 'half-sib' | 'default'; se: number | null; note: string }

/**
 * The heritability a breeding-value run uses: the caller's, else the paternal half-sib estimate
 * over every rabbitry the caller may see (the largest sample at hand) when it rests on at least
 * 10 sires and lies within 0.02–0.95, else DEFAULT_H2.
 */
export function chooseHeritability(visible: CacheEntry<HerdData>, trait: string, userH2: number | undefined): HeritabilityChoice {
  if (userH2 !== undefined) return { value: userH2, source: 'user', se: null, note: `Your value h² = ${userH2}.` };
  const half = heritabilityEstimates(visible, trait).estimates.halfSib;
  if (half && half.anova!.sires >= 10 && half.h2 >= 0.02 && half.h2 <= 0.95) {
    return { value: half.h2, source: 'half-sib', se: half.se, note: `Paternal half-sib estimate over the rabbitries you may see (${half.anova!.sires} sires, ${half.n} offspring).` };
  }
  const why = !half ? 'no half-sib estimate is possible' : half.anova!.sires < 10 ? `the half-sib estimate rests on only ${half.anova!.sires} sires` : `the half-sib estimate (${half.h2.toFixed(2)}) is implausible`;
  return { value: DEFAULT_H2, source: 'default', se: null, note: `Assumed h² = ${DEFAULT_H2} because ${why}; give h2 to use your own value.` };
}

export interface BlupRun {
  values: TraitValues;
  solution: AnimalModelSolution | null;
  /** EBV by animal id. */
  ebv: Map<number, number>;
  accuracy: Map<number, number>;
  records: number;
  groups: number;
  animalsInPedigree: number;
  fixedEffects: string[];
  warnings: string[];
}

function yearQuarter(date: string | null): string {
  if (!date) return 'unknown';
  return `${date.slice(0, 4)}-Q${Math.floor((Number(date.slice(5, 7)) - 1) / 3) + 1}`;
}

/**
 * Animal-model BLUP of a trait over a scope (animalModelBlup: Henderson's mixed model
 * equations, A⁻¹ by Henderson's rules with inbreeding, preconditioned conjugate gradients),
 * memoized per scope stamp, trait and h².
 * - weights and evaluation traits: one record per animal, standardised within breed × sex;
 *   fixed effects sex and contemporary group = breed × rabbitry × birth year-quarter;
 * - placement_score: one record per show result (class-size-adjusted score); fixed effects
 *   sex and show. Repeated results of an animal are treated as independent (no permanent
 *   environment effect), so accuracies are optimistic.
 */
export function blupRun(entry: CacheEntry<HerdData>, trait: string, h2: number): BlupRun {
  return entry.memo(`blup:${trait}:${h2}`, () => {
    const data = entry.data;
    const values = traitOf(entry, trait);
    const ped = pedigreeOf(entry);
    const groupIndex = new Map<string, number>();
    const level = (key: string) => {
      let i = groupIndex.get(key);
      if (i === undefined) groupIndex.set(key, (i = groupIndex.size));
      return i;
    };
    const records: BlupRecord[] = [];
    const placement = trait === PLACEMENT_TRAIT;
    if (placement) {
      for (const r of data.results) {
        const a = data.animal.get(r.animalId);
        if (!a || !(r.placing >= 1 && r.placing <= r.entries)) continue;
        const y = placementScore(r.placing, r.entries);
        if (y === null) continue;
        records.push({ animal: ped.pedigree.indexOf.get(a.id)!, y, fixed: [a.sex === 'buck' ? 0 : 1, level(`show ${r.showId}`)] });
      }
    } else {
      for (const [id, y] of values.z) {
        const a = data.animal.get(id)!;
        records.push({ animal: ped.pedigree.indexOf.get(id)!, y, fixed: [a.sex === 'buck' ? 0 : 1, level(`${a.breedId}|${a.rabbitryId}|${yearQuarter(a.birthDate)}`)] });
      }
    }
    const fixedEffects = ['sex', placement ? 'contemporary group: show' : 'contemporary group: breed × rabbitry × birth year-quarter'];
    const base = { values, records: records.length, groups: groupIndex.size, animalsInPedigree: ped.pedigree.ids.length, fixedEffects };
    if (records.length === 0) {
      return { ...base, solution: null, ebv: new Map(), accuracy: new Map(), warnings: ['No records of this trait in the scope: no breeding values.'] };
    }
    const solution = animalModelBlup({
      pedigree: ped.pedigree, F: ped.F, records, fixedLevels: [2, groupIndex.size], h2, exactAccuracyLimit: EXACT_ACCURACY_LIMIT,
    });
    const ebv = new Map<number, number>();
    const accuracy = new Map<number, number>();
    ped.pedigree.ids.forEach((id, i) => {
      ebv.set(id, solution.breedingValues[i]!);
      if (solution.accuracy) accuracy.set(id, solution.accuracy[i]!);
    });
    const warnings: string[] = [];
    // Empty levels and reference levels are the engine's bookkeeping; only a failure to converge concerns the breeder.
    if (!solution.converged) warnings.push(sentence(solution.warnings.find((w) => w.startsWith('the solver')) ?? 'the solver did not converge'));
    if (solution.warnings.some((w) => w.includes('singular'))) warnings.push('Contemporary groups and sexes are confounded: accuracies are not given.');
    if (records.length < 50) warnings.push(`Only ${records.length} records: breeding values lean heavily on pedigree and are uncertain.`);
    return { ...base, solution, ebv, accuracy, warnings };
  });
}

export function breedingValuesReport(ctx: HerdContext, trait: string, userH2: number | undefined): BreedingValuesReport {
  const h2 = chooseHeritability(ctx.visible, trait, userH2);
  const run = blupRun(ctx.scope, trait, h2.value);
  const herd = ctx.herd.data;
  const values = run.values;
  const placement = trait === PLACEMENT_TRAIT;
  const listed = herd.animals.filter((a) => a.rabbitryId === ctx.rabbitryId && run.ebv.has(a.id));
  const ranks = competitionRanks(listed.map((a) => run.ebv.get(a.id)!));
  const animals = listed.map((a, i) => {
    const ebv = run.ebv.get(a.id)!;
    const sd = values.groupSd.get(`${a.breedId ?? 'none'}|${a.sex}`);
    return {
      animal: animalRef(herd, a),
      rank: ranks[i]!,
      ebv,
      ebvUnits: placement ? ebv : sd === undefined ? null : ebv * sd,
      accuracy: run.accuracy.get(a.id) ?? null,
      record: values.raw.get(a.id) ?? null,
    };
  }).sort((x, y) => x.rank - y.rank || x.animal.earId.localeCompare(y.animal.earId));
  const warnings = [...run.warnings];
  if (h2.source === 'default') warnings.push(h2.note);
  if (listed.length === 0) warnings.push('This rabbitry has no animals in the pedigree yet: no breeding values to list.');
  return {
    scope: ctx.scopeInfo,
    asOf: ctx.asOf,
    warnings,
    trait: values.info,
    h2,
    model: { fixedEffects: run.fixedEffects, records: run.records, animalsInPedigree: run.animalsInPedigree, contemporaryGroups: run.groups },
    convergence: run.solution
      ? { iterations: run.solution.iterations, relativeResidual: run.solution.relativeResidual, converged: run.solution.converged }
      : { iterations: 0, relativeResidual: 0, converged: false },
    accuracyAvailable: run.accuracy.size > 0,
    animals,
  };
}
