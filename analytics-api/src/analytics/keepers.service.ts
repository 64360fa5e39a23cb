import {
  KEEPER_COMPONENT_LABELS, KEEPER_COMPONENTS, type KeeperComponent, type KeepersQuery, type KeepersReport,
} from '@shared/contracts/analytics';
import { ageClassOn } from '@shared/domain/age-class';
import { explainKeeper } from '@shared/domain/keeper-explanation';
import { checkWeightAgainstLimits } from '@shared/domain/weight-check';
import type { UnitSetting } from '@shared/units/weight';
import { keeperIndex } from '../stats/keeper-index';
import { placementIndex } from '../stats/placement-index';
import { type HerdContext, pedigreeOf } from './analytics-context';
import type { AnimalRow } from './analytics.repository';
import { blupRun, chooseHeritability } from './breeding-values.service';
import { KEEPER_CAUTIONS } from './cautions';
import { growthReferenceOf, seniorProjection } from './growth.service';
import { ageOn, animalRef, type HerdData, herdAnimals, limitsOf } from './herd-data';

const DIRECTION: Record<KeeperComponent, 1 | -1> = { breedingValue: 1, ownEvaluation: 1, weightOnTarget: 1, parentsPlacementIndex: 1, inbreeding: -1 };

/** The latest evaluation as a share of the breed template's points (%), or null. */
function evaluationPercent(data: HerdData, a: AnimalRow): number | null {
  const list = data.evaluations.get(a.id);
  const breed = a.breedId === null ? undefined : data.breeds.get(a.breedId);
  if (!list?.length || !breed?.traits.length) return null;
  const latest = list[list.length - 1]!;
  let got = 0;
  let possible = 0;
  for (const t of breed.traits) {
    const v = latest.scores[t.key];
    if (typeof v !== 'number') continue;
    got += v;
    possible += t.points;
  }
  return possible > 0 ? (100 * got) / possible : null;
}

/** Placement index (top 3) of a parent's offspring results, or null without results in classes of more than 3. */
function offspringPlacementIndex(data: HerdData, parentId: number | null): number | null {
  if (parentId === null) return null;
  const results = (data.offspring.get(parentId) ?? []).flatMap((o) => data.resultsOf.get(o) ?? []).filter((r) => r.placing >= 1 && r.placing <= r.entries);
  return results.length === 0 ? null : (placementIndex(results, 3)?.index ?? null);
}

/**
 * Keeper board: the herd's juniors (under 6 months on the day, active, not outside stubs)
 * ranked by keeperIndex over five standardised components with the caller's weights —
 * breeding value for a trait (animal-model BLUP, SD units), own latest evaluation (% of the
 * template's points), weight on target (−% of the projected senior weight from the breed's
 * ideal), parents' placement index (mean of sire's and dam's, over their offspring's results),
 * inbreeding (a penalty) — with every component, the projected senior weight, weight flags
 * (disqualification risk), the keeper decision recorded on the animal, and why each stands
 * where it does in a breeder's words, weights in the reader's unit (explainKeeper).
 */
export function keepersReport(ctx: HerdContext, q: KeepersQuery, unit: UnitSetting): KeepersReport {
  const data = ctx.herd.data;
  const weights = Object.fromEntries(KEEPER_COMPONENTS.map((c) => [c, q.weights?.[c] ?? 1])) as Record<KeeperComponent, number>;
  const juniors = herdAnimals(data, [ctx.rabbitryId]).filter((a) => a.status === 'active' && a.birthDate !== null && a.birthDate <= ctx.asOf
    && ageClassOn(a.birthDate, ctx.asOf, 'four-class') === 'junior');
  const warnings: string[] = [];
  const h2 = chooseHeritability(ctx.visible, q.trait, undefined);
  const run = blupRun(ctx.herd, q.trait, h2.value);
  const ped = pedigreeOf(ctx.herd);
  if (juniors.length === 0) warnings.push('No active juniors (under 6 months) in this rabbitry to rank.');
  else if (juniors.length < 3) warnings.push(`Only ${juniors.length} junior${juniors.length === 1 ? '' : 's'}: standardised scores say little with so few to compare.`);
  if (run.ebv.size === 0 && weights.breedingValue !== 0) warnings.push(`No records of ${run.values.info.label.toLowerCase()}: the breeding-value component counts as average for everyone.`);

  const facts = juniors.map((a) => {
    const fitted = a.breedId === null ? null : growthReferenceOf(ctx.visible, a.breedId, a.sex);
    const { projection } = seniorProjection(data, fitted?.reference ?? null, a);
    const ideal = limitsOf(data, a.breedId, a.sex, 'senior')?.idealGrams ?? null;
    const parents = [offspringPlacementIndex(data, a.sireId), offspringPlacementIndex(data, a.damId)].filter((v): v is number => v !== null);
    const series = data.series.get(a.id) ?? [];
    const latest = series[series.length - 1] ?? null;
    const components: Record<KeeperComponent, number | null> = {
      breedingValue: run.ebv.get(a.id) ?? null,
      ownEvaluation: evaluationPercent(data, a),
      weightOnTarget: projection && ideal ? (-100 * Math.abs(projection.grams - ideal)) / ideal : null,
      parentsPlacementIndex: parents.length > 0 ? parents.reduce((s, v) => s + v, 0) / parents.length : null,
      inbreeding: ped.fOf(a.id),
    };
    return { a, projection, latest, components };
  });
  const label = (c: KeeperComponent) => (c === 'breedingValue' ? `${KEEPER_COMPONENT_LABELS[c]} (${run.values.info.label.toLowerCase()})` : KEEPER_COMPONENT_LABELS[c]);
  const scores = keeperIndex(facts.map((f) => ({ id: String(f.a.id), components: f.components })), weights, DIRECTION);
  const factOf = new Map(facts.map((f) => [String(f.a.id), f]));
  const candidates = scores.map((s) => {
    const f = factOf.get(s.id)!;
    const flags: KeepersReport['candidates'][number]['weightFlags'] = [];
    if (f.latest) {
      const check = checkWeightAgainstLimits(f.latest.grams, limitsOf(data, f.a.breedId, f.a.sex, 'junior'));
      if (check.status === 'over-maximum' || check.status === 'under-minimum') {
        flags.push({ kind: 'current', status: check.status, disqualificationRisk: true, message: `Latest weight is ${check.status === 'over-maximum' ? 'over the junior maximum' : 'under the junior minimum'}: disqualification risk in the junior class.` });
      }
    }
    const check = f.projection?.check;
    if (check && check.status !== 'no-limits') {
      const words = { 'under-minimum': 'Projected under the senior minimum: disqualification risk as a senior.', 'on-ideal': 'Projected on the ideal senior weight.', 'within-limits': 'Projected within the senior limits.', 'over-maximum': 'Projected over the senior maximum: disqualification risk.' } as const;
      flags.push({ kind: 'projected', status: check.status, disqualificationRisk: check.disqualificationRisk, message: words[check.status] });
    }
    if (f.projection?.upperOverMaximum && check?.status !== 'over-maximum') {
      flags.push({ kind: 'projected-upper', status: 'over-maximum', disqualificationRisk: false, message: 'The upper end of the projection passes the senior maximum: watch its weight.' });
    }
    return {
      animal: animalRef(data, f.a),
      ageDays: ageOn(f.a, ctx.asOf)!,
      rank: s.rank,
      total: s.total,
      components: s.contributions.map((c) => ({ ...c, component: c.component as KeeperComponent, label: label(c.component as KeeperComponent) })),
      latestWeight: f.latest ? { weighedOn: f.latest.weighedOn, grams: f.latest.grams } : null,
      projectedSeniorWeight: f.projection,
      weightFlags: flags,
      disqualificationRisk: flags.some((x) => x.disqualificationRisk),
      keeperDecision: f.a.keeperDecision,
      explanation: [] as string[],
    };
  });
  for (const c of candidates) c.explanation = explainKeeper(c, candidates, run.values.info, unit);
  return {
    scope: ctx.scopeInfo,
    asOf: ctx.asOf,
    warnings,
    cautions: [...KEEPER_CAUTIONS],
    weights,
    trait: run.values.info,
    juniors: juniors.length,
    candidates,
  };
}
