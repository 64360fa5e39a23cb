import { type GrowthAnimal, type GrowthQuery, type GrowthReferenceReport, type GrowthReport, type SeniorProjection } from '@shared/contracts/analytics';
import { checkWeightAgainstLimits } from '@shared/domain/weight-check';
import type { ClassScheme, Sex } from '@shared/domain/terms';
import { INTERMEDIATE_UNTIL_MONTHS, JUNIOR_UNTIL_MONTHS } from '@shared/domain/age-class';
import { fitGrowthReference } from '../stats/fit-growth-reference';
import { growthBandEdges } from '../stats/growth-band-edges';
import { GROWTH_CENTILES, type GrowthReference } from '../stats/growth-reference';
import { percentileOfWeighing } from '../stats/percentile-of-weighing';
import { projectSeniorWeight } from '../stats/project-senior-weight';
import type { CacheEntry } from './analytics-cache';
import { type HerdContext, sentence } from './analytics-context';
import type { AnimalRow } from './analytics.repository';
import { animalRef, type HerdData, herdAnimals, limitsOf } from './herd-data';

/**
 * The senior weight is projected at 12 months, when the reference reaches it: exhibition breeds
 * are near their adult weight by then and show as seniors well before (common practice, no
 * source). A reference that stops earlier gives the projection at its oldest age, if that is
 * at least the breed's senior class age.
 */
export const SENIOR_AGE_DAYS = 365;
const DAYS_PER_MONTH = 365.25 / 12;
/** Bands weekly to 26 weeks, then joined 4-week blocks of at least 20 weighings, up to two years. */
const BAND_OPTIONS = { fineDays: 7, fineUntilDays: 182, blockDays: 28, minBandSize: 20, maxBandDays: 112, untilDays: 728 } as const;

export interface FittedReference {
  reference: GrowthReference | null;
  weighings: number;
  animals: number;
  /** Where the weighings became too few for another band (null when they reach two years), and how many were left beyond. */
  thinsOutFromDays: number | null;
  beyond: number;
  warnings: string[];
}

const weeks = (days: number) => Math.round(days / 7);

/** The age a senior weight is projected at from a reference: 12 months, or its oldest age if at least the senior class age; else null. */
export function projectionAgeDays(reference: GrowthReference, classScheme: ClassScheme): number | null {
  const lastWithWeights = [...reference.bands].reverse().find((b) => b.n > 0);
  if (!lastWithWeights) return null;
  const seniorFrom = Math.ceil((classScheme === 'six-class' ? INTERMEDIATE_UNTIL_MONTHS : JUNIOR_UNTIL_MONTHS) * DAYS_PER_MONTH);
  const age = Math.min(SENIOR_AGE_DAYS, lastWithWeights.toDays - 1);
  return age >= seniorFrom ? age : null;
}

/**
 * LMS weight-for-age reference of one breed and sex from every weighing in the scope
 * (fitGrowthReference), memoized per scope stamp.
 */
export function growthReferenceOf(entry: CacheEntry<HerdData>, breedId: number, sex: Sex): FittedReference {
  return entry.memo(`growth:${breedId}:${sex}`, () => {
    const all: { ageDays: number; grams: number }[] = [];
    let animals = 0;
    for (const a of entry.data.animals) {
      if (a.breedId !== breedId || a.sex !== sex) continue;
      const series = entry.data.series.get(a.id);
      if (!series?.length) continue;
      animals++;
      for (const w of series) all.push({ ageDays: w.ageDays, grams: w.grams });
    }
    const none = { reference: null, weighings: 0, animals, thinsOutFromDays: null, beyond: 0 };
    if (all.length === 0) return { ...none, warnings: ['No weighings of this breed and sex in the scope: no growth reference.'] };
    const { edges, thinsOutFromDays, beyond } = growthBandEdges(all.map((p) => p.ageDays), BAND_OPTIONS);
    const end = edges[edges.length - 1]!;
    const points = all.filter((p) => p.ageDays < end);
    if (points.length === 0) return { ...none, beyond, warnings: ['Every weighing of this breed and sex is of an adult, too few for a growth reference.'] };
    const reference = fitGrowthReference(points, { edges });
    const empirical = reference.bands.filter((b) => b.fallback === 'empirical').length;
    const warnings: string[] = [];
    if (empirical > 0) warnings.push(`${empirical} of ${reference.bands.length} age bands have fewer than 20 weights: their centiles are the sample's own, not a fitted curve.`);
    if (thinsOutFromDays !== null) {
      warnings.push(`Weighings thin out after ${weeks(thinsOutFromDays)} weeks (about ${Math.round(thinsOutFromDays / DAYS_PER_MONTH)} months): the reference stops there`
        + (beyond > 0 ? `; ${beyond} later weighing${beyond === 1 ? ' is' : 's are'} too few for centiles.` : '.'));
    }
    if (animals < 30) warnings.push(`Only ${animals} animals of this breed and sex are weighed: the bands are a rough guide (want 30 or more).`);
    return { reference, weighings: points.length, animals, thinsOutFromDays, beyond, warnings };
  });
}

function referenceReport(data: HerdData, fitted: FittedReference, breedId: number, sex: Sex): GrowthReferenceReport {
  const limits = limitsOf(data, breedId, sex, 'senior');
  return {
    breed: { id: breedId, name: data.breeds.get(breedId)?.name ?? `Breed ${breedId}` },
    sex,
    weighings: fitted.weighings,
    animals: fitted.animals,
    reachesDays: fitted.reference?.toDays ?? 0,
    thinsOutFromDays: fitted.thinsOutFromDays,
    weighingsBeyond: fitted.beyond,
    bands: (fitted.reference?.bands ?? []).map((b) => ({
      fromDays: b.fromDays, toDays: b.toDays, midDays: b.midDays, n: b.n,
      method: b.lms ? 'lms' : b.weights ? 'empirical' : null,
      lms: b.lms,
      centiles: b.centiles ? { p3: b.centiles[3], p10: b.centiles[10], p25: b.centiles[25], p50: b.centiles[50], p75: b.centiles[75], p90: b.centiles[90], p97: b.centiles[97] } : null,
    })),
    seniorLimits: limits ? { minGrams: limits.minGrams, idealGrams: limits.idealGrams, maxGrams: limits.maxGrams } : null,
    warnings: fitted.warnings,
  };
}

/**
 * An animal's projected senior weight (percentile tracking of its latest weighings against the
 * reference of its breed and sex, projectSeniorWeight) checked against the breed's senior
 * limits with shared/domain/weight-check (over the maximum = disqualification risk).
 */
export function seniorProjection(data: HerdData, reference: GrowthReference | null, a: AnimalRow): { projection: SeniorProjection | null; warnings: string[] } {
  const series = data.series.get(a.id) ?? [];
  if (!reference || series.length === 0) return { projection: null, warnings: [] };
  const scheme = a.breedId === null ? 'four-class' : (data.breeds.get(a.breedId)?.classScheme ?? 'four-class');
  const ageDays = projectionAgeDays(reference, scheme);
  if (ageDays === null) return { projection: null, warnings: ['The weighings of its breed and sex do not reach the senior class age: no projection.'] };
  const p = projectSeniorWeight(reference, series, ageDays);
  if (p === null) return { projection: null, warnings: ['No weighing falls within the reference ages: no projection.'] };
  const limits = limitsOf(data, a.breedId, a.sex, 'senior');
  const check = limits ? checkWeightAgainstLimits(Math.max(1, Math.round(p.grams)), limits) : null;
  return {
    projection: {
      ageDays, grams: p.grams, lower: p.lower, upper: p.upper, percentile: p.percentile, z: p.z, weighingsUsed: p.weighingsUsed,
      check,
      upperOverMaximum: limits?.maxGrams != null && p.upper !== null && p.upper > limits.maxGrams,
    },
    warnings: p.warnings.map(sentence),
  };
}

function classification(projection: SeniorProjection | null): string {
  if (!projection) return 'No projection: too few weighings within the reference ages.';
  const status = projection.check?.status ?? 'no-limits';
  const words: Record<typeof status, string> = {
    'no-limits': 'The breed gives no senior limits to compare with.',
    'under-minimum': 'Projected under the senior minimum: disqualification risk as a senior.',
    'on-ideal': 'Projected on the ideal senior weight.',
    'within-limits': 'Projected within the senior limits.',
    'over-maximum': 'Projected over the senior maximum: disqualification risk.',
  };
  const upper = projection.upperOverMaximum && status !== 'over-maximum' ? ' The upper end of the projection passes the maximum: watch its weight.' : '';
  return words[status] + upper;
}

/**
 * Growth curves: the LMS references (bands 3–97 by age) of the requested breed and sex — or of
 * the chosen animals' breeds and sexes — from the weights of every rabbitry the caller may see
 * (or the herd alone with scope=rabbitry), and each chosen animal's weighings with percentile
 * and z, projected senior weight with interval, the breed's ideal and maximum and the
 * classification. Chosen animals must belong to the route's rabbitry.
 */
export function growthReport(ctx: HerdContext, q: GrowthQuery): GrowthReport {
  const herd = ctx.herd.data;
  const refEntry = ctx.scope;
  const warnings: string[] = [];
  const own = herdAnimals(herd, [ctx.rabbitryId]);
  let chosen: AnimalRow[] = [];
  if (q.animals) {
    chosen = q.animals.map((id) => herd.animal.get(id)).filter((a): a is AnimalRow => a !== undefined && a.rabbitryId === ctx.rabbitryId);
    const missing = q.animals.length - chosen.length;
    if (missing > 0) warnings.push(`${missing} of the animals asked for ${missing === 1 ? 'is' : 'are'} not in this rabbitry and ${missing === 1 ? 'is' : 'are'} left out.`);
  }
  if (q.litter !== undefined) {
    const kits = own.filter((a) => a.litterId === q.litter);
    if (kits.length === 0) warnings.push('That litter has no recorded kits in this rabbitry.');
    chosen.push(...kits.filter((k) => !chosen.includes(k)));
  }

  const combos = new Map<string, { breedId: number; sex: Sex }>();
  const addCombo = (breedId: number, sex: Sex) => combos.set(`${breedId}:${sex}`, { breedId, sex });
  const breedCounts = new Map<number, number>();
  for (const a of own) if (a.breedId !== null) breedCounts.set(a.breedId, (breedCounts.get(a.breedId) ?? 0) + 1);
  const breedId = q.breed ?? [...breedCounts].sort((x, y) => y[1] - x[1])[0]?.[0];
  if (breedId !== undefined && (q.breed !== undefined || chosen.length === 0)) {
    if (!herd.breeds.has(breedId)) warnings.push('That breed is not in the catalogue.');
    else for (const sex of q.sex ? [q.sex] : (['buck', 'doe'] as const)) addCombo(breedId, sex);
  }
  for (const a of chosen) if (a.breedId !== null) addCombo(a.breedId, a.sex);
  if (combos.size === 0) warnings.push(own.length === 0 ? 'This rabbitry has no animals yet: growth curves need weighed animals.' : 'No breed to draw: give the herd’s animals a breed.');

  const references = [...combos.values()].map(({ breedId: b, sex }) => referenceReport(refEntry.data, growthReferenceOf(refEntry, b, sex), b, sex));
  const animals: GrowthAnimal[] = chosen.map((a) => {
    const fitted = a.breedId === null ? null : growthReferenceOf(refEntry, a.breedId, a.sex);
    const reference = fitted?.reference ?? null;
    const own: string[] = [];
    if (a.breedId === null) own.push('No breed recorded: no growth reference to compare with.');
    if (!a.birthDate) own.push('No birth date: ages and percentiles cannot be worked out.');
    const weighings = (herd.series.get(a.id) ?? []).map((w) => {
      const p = reference ? percentileOfWeighing(reference, w.ageDays, w.grams) : null;
      return { weighedOn: w.weighedOn, ageDays: w.ageDays, grams: w.grams, z: p?.z ?? null, percentile: p?.percentile ?? null };
    });
    const { projection, warnings: pw } = seniorProjection(herd, reference, a);
    const limits = limitsOf(herd, a.breedId, a.sex, 'senior');
    const latest = [...weighings].reverse().find((w) => w.percentile !== null);
    return {
      animal: animalRef(herd, a),
      weighings,
      latestPercentile: latest?.percentile ?? null,
      projection,
      idealGrams: limits?.idealGrams ?? null,
      maxGrams: limits?.maxGrams ?? null,
      classification: classification(projection),
      warnings: [...own, ...pw],
    };
  });
  return {
    scope: ctx.scopeInfo,
    asOf: ctx.asOf,
    warnings,
    centiles: [...GROWTH_CENTILES],
    seniorAgeDays: SENIOR_AGE_DAYS,
    references,
    animals,
  };
}
