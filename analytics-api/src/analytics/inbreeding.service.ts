import type { CommonAncestor, InbreedingReport, PairingsQuery, PairingsReport, RelationshipReport } from '@shared/contracts/analytics';
import { AppError, notFound } from '../http/app-error';
import { additiveRelationship } from '../stats/additive-relationship';
import { commonAncestorContributions } from '../stats/common-ancestor-contributions';
import { denseRelationshipMatrix } from '../stats/dense-relationship-matrix';
import { distributionSummary } from '../stats/distribution-summary';
import type { CacheEntry } from './analytics-cache';
import { type HerdContext, pedigreeOf } from './analytics-context';
import type { AnimalRow } from './analytics.repository';
import { blupRun, chooseHeritability } from './breeding-values.service';
import { BREEDING_CAUTIONS, breedingAgeDays } from './cautions';
import { ageOn, animalRef, type HerdData, herdAnimals, type PedigreeIndex } from './herd-data';
import { traitInfo } from './trait-values';

/** A herd's relationship table is kept whole up to this many animals (8·n² bytes). */
const DENSE_LIMIT = 3000;
const MATRIX_CAP = 40;
const BANDS = [
  { label: 'not inbred', from: 0, to: 0 },
  { label: 'under 1/16', from: 0, to: 0.0625 },
  { label: '1/16 to 1/8 (as first cousins’ offspring)', from: 0.0625, to: 0.125 },
  { label: '1/8 to 1/4 (as half sibs’ offspring)', from: 0.125, to: 0.25 },
  { label: '1/4 and over (as full sibs’ offspring)', from: 0.25, to: null },
] as const;

interface Relationships { ped: PedigreeIndex; a(i: number, j: number): number }

/** a_ij between pedigree indexes: from the whole table for a herd, pair by pair beyond DENSE_LIMIT. */
function relationshipsOf(entry: CacheEntry<HerdData>): Relationships {
  return entry.memo('relationships', () => {
    const ped = pedigreeOf(entry);
    const n = ped.pedigree.ids.length;
    if (n <= DENSE_LIMIT) {
      const A = denseRelationshipMatrix(ped.pedigree);
      return { ped, a: (i: number, j: number) => A[i]![j]! };
    }
    return { ped, a: (i: number, j: number) => additiveRelationship(ped.pedigree, ped.F, i, j) };
  });
}

function ancestors(data: HerdData, ped: PedigreeIndex, i: number, j: number, top: number): { list: CommonAncestor[]; others: number } {
  const c = commonAncestorContributions(ped.pedigree, ped.F, i, j, top);
  return {
    list: c.ancestors.map((x) => {
      const a = data.animal.get(ped.pedigree.ids[x.animal]!);
      return { animal: a ? animalRef(data, a) : null, contribution: x.contribution, share: x.share };
    }),
    others: c.others,
  };
}

const nameOf = (c: CommonAncestor) => (c.animal ? `${c.animal.earId}${c.animal.name ? ` ${c.animal.name}` : ''}` : 'an unrecorded ancestor');
const percent = (share: number) => `${Math.round(share * 100)} %`;

function explainF(f: number, list: CommonAncestor[]): string {
  if (list.length === 0) return `F = ${f.toFixed(3)}.`;
  const named = list.slice(0, 3).map((c) => `${nameOf(c)} (${percent(c.share)})`).join(', ');
  return `F = ${f.toFixed(3)}: its sire and dam share ancestors, mostly ${named}.`;
}

/** Every herd animal's inbreeding coefficient, their distribution, and the most inbred explained by common ancestors. */
export function inbreedingReport(ctx: HerdContext): InbreedingReport {
  const data = ctx.herd.data;
  const ped = pedigreeOf(ctx.herd);
  const own = data.animals.filter((a) => a.rabbitryId === ctx.rabbitryId);
  const herd = own.filter((a) => !a.isStub);
  const fs = herd.map((a) => ped.fOf(a.id));
  const warnings: string[] = [];
  if (herd.length === 0) warnings.push('This rabbitry has no animals yet: inbreeding needs a recorded pedigree.');
  const withBoth = own.filter((a) => a.sireId !== null && a.damId !== null).length;
  const founders = own.filter((a) => a.sireId === null && a.damId === null).length;
  if (herd.length > 0 && withBoth < herd.length / 2) warnings.push(`Only ${withBoth} of ${herd.length} animals have both parents recorded: inbreeding is underestimated where the pedigree stops.`);
  const topInbred = herd.filter((a) => ped.fOf(a.id) > 0).sort((x, y) => ped.fOf(y.id) - ped.fOf(x.id) || x.earId.localeCompare(y.earId)).slice(0, 10).map((a) => {
    const f = ped.fOf(a.id);
    const { list } = ancestors(data, ped, ped.pedigree.indexOf.get(a.sireId!)!, ped.pedigree.indexOf.get(a.damId!)!, 3);
    return { animal: animalRef(data, a), f, explanation: explainF(f, list), commonAncestors: list };
  });
  return {
    scope: ctx.scopeInfo,
    asOf: ctx.asOf,
    warnings,
    cautions: [...BREEDING_CAUTIONS],
    pedigree: { animals: own.length, withBothParents: withBoth, founders, herdAnimals: herd.length },
    summary: fs.length > 0 ? distributionSummary(fs) : null,
    inbred: fs.filter((f) => f > 0).length,
    bands: BANDS.map((b) => ({
      ...b,
      count: fs.filter((f) => (b.to === 0 ? f === 0 : f > 0 && f >= b.from && (b.to === null || f < b.to))).length,
    })),
    animals: own.map((a) => ({ animal: animalRef(data, a), f: ped.fOf(a.id), sireId: a.sireId, damId: a.damId })),
    topInbred,
  };
}

function herdAnimal(ctx: HerdContext, id: number): AnimalRow {
  const a = ctx.herd.data.animal.get(id);
  if (!a || a.rabbitryId !== ctx.rabbitryId) throw notFound('Animal');
  return a;
}

/** In words, how closely an additive relationship makes two animals related (Falconer & Mackay 1996, ch. 5 reference values). */
function closeness(a: number): string {
  if (a >= 0.5) return 'as closely related as full sibs or parent and offspring';
  if (a >= 0.25) return 'as closely related as half sibs';
  if (a >= 0.125) return 'as closely related as first cousins';
  if (a > 0) return 'distantly related';
  return 'not related through any recorded ancestor';
}

export function relationshipReport(ctx: HerdContext, aId: number, bId: number): RelationshipReport {
  if (aId === bId) throw new AppError('validation', 'Choose two different animals', 400, { b: 'Choose an animal other than the first' });
  const data = ctx.herd.data;
  const A = herdAnimal(ctx, aId);
  const B = herdAnimal(ctx, bId);
  const rel = relationshipsOf(ctx.herd);
  const ia = rel.ped.pedigree.indexOf.get(A.id)!;
  const ib = rel.ped.pedigree.indexOf.get(B.id)!;
  const a = rel.a(ia, ib);
  const fa = rel.ped.F[ia]!;
  const fb = rel.ped.F[ib]!;
  const { list, others } = ancestors(data, rel.ped, ia, ib, 5);
  const oppositeSexes = A.sex !== B.sex;
  const named = list.slice(0, 3).map((c) => `${nameOf(c)} (${percent(c.share)})`).join(', ');
  return {
    scope: ctx.scopeInfo,
    asOf: ctx.asOf,
    warnings: [],
    cautions: [...BREEDING_CAUTIONS],
    a: { animal: animalRef(data, A), f: fa },
    b: { animal: animalRef(data, B), f: fb },
    additiveRelationship: a,
    coefficientOfRelationship: a / Math.sqrt((1 + fa) * (1 + fb)),
    expectedOffspringInbreeding: a / 2,
    oppositeSexes,
    commonAncestors: list,
    otherAncestorsContribution: others,
    explanation: `${A.earId} and ${B.earId} are ${closeness(a)} (a = ${a.toFixed(3)})${list.length ? `, through ${named}` : ''}.`
      + (oppositeSexes ? ` Their offspring would have F = ${(a / 2).toFixed(3)}.` : ''),
  };
}

const level = (f: number): PairingsReport['candidates'][number]['inbreedingLevel'] => (f <= 0 ? 'none' : f < 0.0625 ? 'low' : f < 0.125 ? 'moderate' : 'high');

/**
 * Pairing planner: candidate mates of the other sex among the herd's active animals of
 * breeding age (same breed), each with the offspring's expected inbreeding a/2, the mate's
 * breeding value for the trait and the expected offspring value (mean of the parents'), the
 * common ancestors behind any inbreeding; matings of high expected inbreeding (≥ 1/8) go last.
 * Plus the does × bucks table of expected inbreeding (up to 40 × 40, youngest first).
 */
export function pairingsReport(ctx: HerdContext, q: PairingsQuery): PairingsReport {
  const data = ctx.herd.data;
  const animal = herdAnimal(ctx, q.animal);
  const info = traitInfo(data, q.trait);
  const rel = relationshipsOf(ctx.herd);
  const breed = animal.breedId === null ? undefined : data.breeds.get(animal.breedId);
  const minAge = breedingAgeDays(breed);
  const warnings: string[] = [];
  const breeders = herdAnimals(data, [ctx.rabbitryId]).filter((a) => {
    if (a.status !== 'active' || a.id === animal.id || (a.birthDate !== null && a.birthDate > ctx.asOf)) return false;
    if (animal.breedId !== null && a.breedId !== animal.breedId) return false;
    const age = ageOn(a, ctx.asOf);
    return age === null || age >= minAge;
  });
  const h2 = chooseHeritability(ctx.visible, q.trait, undefined);
  const run = blupRun(ctx.herd, q.trait, h2.value);
  const ebvs = run.ebv;
  if (ebvs.size === 0) warnings.push(`No records of ${info.label.toLowerCase()} in this herd: breeding values are not given.`);
  else if (run.accuracy.size === 0) warnings.push('Accuracies of the breeding values are not given: the herd has too many animals for the exact computation, or its contemporary groups and sexes are confounded.');
  const own = ebvs.get(animal.id) ?? null;
  const i = rel.ped.pedigree.indexOf.get(animal.id)!;
  const mates = breeders.filter((a) => a.sex !== animal.sex);
  if (mates.length === 0) warnings.push(`No active ${animal.sex === 'buck' ? 'does' : 'bucks'} of breeding age (${Math.round(minAge / 30.4)} months for this breed) in the herd.`);
  const candidates = mates.map((m) => {
    const j = rel.ped.pedigree.indexOf.get(m.id)!;
    const f = rel.a(i, j) / 2;
    const mateEbv = ebvs.get(m.id) ?? null;
    const mateAccuracy = mateEbv === null ? null : (run.accuracy.get(m.id) ?? null);
    const notes: string[] = [];
    if (!m.birthDate) notes.push('No birth date: taken to be of breeding age.');
    if (f >= 0.125) notes.push('High expected inbreeding: as close as a half-sib mating or closer.');
    return {
      mate: animalRef(data, m),
      ageDays: ageOn(m, ctx.asOf),
      expectedInbreeding: f,
      inbreedingLevel: level(f),
      mateEbv,
      mateAccuracy,
      expectedOffspringEbv: own !== null && mateEbv !== null ? (own + mateEbv) / 2 : null,
      j,
      notes,
    };
  }).sort((x, y) => Number(x.expectedInbreeding >= 0.125) - Number(y.expectedInbreeding >= 0.125)
    || (y.expectedOffspringEbv ?? -Infinity) - (x.expectedOffspringEbv ?? -Infinity)
    || x.expectedInbreeding - y.expectedInbreeding || x.mate.earId.localeCompare(y.mate.earId));
  const listed = candidates.slice(0, q.limit).map(({ j, ...c }, rank) => ({
    ...c,
    rank: rank + 1,
    commonAncestors: c.expectedInbreeding >= 1 / 32 ? ancestors(data, rel.ped, i, j, 3).list : [],
  }));

  const byAge = (x: AnimalRow, y: AnimalRow) => (y.birthDate ?? '').localeCompare(x.birthDate ?? '') || x.earId.localeCompare(y.earId);
  const allDoes = breeders.concat(animal).filter((a) => a.sex === 'doe').sort(byAge);
  const allBucks = breeders.concat(animal).filter((a) => a.sex === 'buck').sort(byAge);
  const pick = (list: AnimalRow[]) => {
    const top = list.slice(0, MATRIX_CAP);
    if (list.length > MATRIX_CAP && !top.includes(animal) && list.includes(animal)) top[MATRIX_CAP - 1] = animal;
    return top;
  };
  const does = pick(allDoes);
  const bucks = pick(allBucks);
  const index = (a: AnimalRow) => rel.ped.pedigree.indexOf.get(a.id)!;
  return {
    scope: ctx.scopeInfo,
    asOf: ctx.asOf,
    warnings,
    cautions: [...BREEDING_CAUTIONS],
    animal: { animal: animalRef(data, animal), ebv: own, accuracy: own === null ? null : (run.accuracy.get(animal.id) ?? null) },
    trait: info,
    breedingAgeDays: minAge,
    candidatesConsidered: mates.length,
    candidates: listed,
    matrix: {
      does: does.map((a) => animalRef(data, a)),
      bucks: bucks.map((a) => animalRef(data, a)),
      values: does.map((d) => bucks.map((b) => rel.a(index(d), index(b)) / 2)),
      totalDoes: allDoes.length,
      totalBucks: allBucks.length,
      truncated: allDoes.length > MATRIX_CAP || allBucks.length > MATRIX_CAP,
    },
  };
}
