import { LINE_MEASURES, type LinesQuery, type LinesReport } from '@shared/contracts/analytics';
import { AppError } from '../http/app-error';
import { SEX_LABELS } from '@shared/domain/terms';
import { distributionSummary } from '../stats/distribution-summary';
import { medianInterval } from '../stats/median-interval';
import { percentileOfWeighing } from '../stats/percentile-of-weighing';
import { placementScore } from '../stats/placement-score';
import { type HerdContext, pedigreeOf, traitOf } from './analytics-context';
import type { AnimalRow } from './analytics.repository';
import { growthReferenceOf } from './growth.service';
import { LINE_CAUTIONS } from './cautions';
import { herdAnimals, type HerdData } from './herd-data';

const NO_LINE = '(no line)';

/** The filters in words: "Mini Rex does born 2025-01-01 to 2025-12-31", or null without filters. */
function filterWords(data: HerdData, q: LinesQuery): string | null {
  const breed = q.breed === undefined ? null : (data.breeds.get(q.breed)?.name ?? `breed ${q.breed}`);
  const who = [breed, q.sex ? SEX_LABELS[q.sex].toLowerCase() + 's' : null].filter(Boolean).join(' ');
  const born = q.from && q.to ? `born ${q.from} to ${q.to}` : q.from ? `born on or after ${q.from}` : q.to ? `born on or before ${q.to}` : null;
  if (!who && !born) return null;
  const text = [who || 'Animals', born].filter(Boolean).join(' ');
  return text[0]!.toUpperCase() + text.slice(1);
}

/**
 * Line comparison: per group (the herd's lines, or the rabbitries the caller may see) the
 * distribution (distributionSummary: n, quartiles by type 7) with a distribution-free 95 %
 * interval for the median (medianInterval: binomial order statistics) of 12-week-weight percentile
 * (against the pooled reference of its breed and sex), placement score per result, each
 * evaluation trait (% of the breed template's points, first evaluation), litter size weaned
 * (litters by the group's does) and inbreeding.
 */
export function linesReport(ctx: HerdContext, q: LinesQuery): LinesReport {
  const byRabbitry = q.groupBy === 'rabbitry';
  const entry = byRabbitry ? ctx.visible : ctx.herd;
  const data = entry.data;
  const inScope = herdAnimals(data, byRabbitry ? data.rabbitryIds : [ctx.rabbitryId]);
  // A cohort: of the breed and sex asked for, born in the range (animals without a birth date only when no range is given).
  const animals = inScope.filter((a) => (q.breed === undefined || a.breedId === q.breed) && (q.sex === undefined || a.sex === q.sex)
    && (q.from === undefined || (a.birthDate !== null && a.birthDate >= q.from)) && (q.to === undefined || (a.birthDate !== null && a.birthDate <= q.to)));
  const groupOf = (a: AnimalRow) => (byRabbitry ? String(a.rabbitryId) : (a.line ?? NO_LINE));
  const labelOf = new Map<string, string>(byRabbitry ? data.rabbitries.map((r) => [String(r.id), r.name]) : []);
  const groups = new Map<string, AnimalRow[]>();
  for (const a of animals) {
    const g = groupOf(a);
    let list = groups.get(g);
    if (!list) groups.set(g, (list = []));
    list.push(a);
  }
  const keys = [...groups.keys()].sort((x, y) => (labelOf.get(x) ?? x).localeCompare(labelOf.get(y) ?? y));

  const traits = new Map<string, { label: string; points: Map<number, number> }>();
  for (const b of data.breeds.values()) {
    for (const t of b.traits) {
      let info = traits.get(t.key);
      if (!info) traits.set(t.key, (info = { label: t.label, points: new Map() }));
      info.points.set(b.id, t.points);
    }
  }
  const known = [...LINE_MEASURES, ...traits.keys()];
  if (q.measure !== undefined && !known.includes(q.measure)) {
    throw new AppError('validation', `Unknown measure ${q.measure}`, 400, { measure: `Choose one of ${known.join(', ')}` });
  }
  const wanted = q.measure === undefined ? known : [q.measure];

  const measure = (key: string, label: string, unit: string, valuesOf: (group: AnimalRow[]) => number[]) => ({
    key, label, unit,
    groups: keys.map((g) => {
      const values = valuesOf(groups.get(g)!);
      return { key: g, summary: values.length > 0 ? distributionSummary(values) : null, medianInterval: medianInterval(values) };
    }),
  });
  const measures: LinesReport['measures'] = [];
  for (const key of wanted) {
    if (key === 'weight_12w_percentile') {
      const w12 = traitOf(entry, 'weight_12w').raw;
      measures.push(measure(key, 'Weight at 12 weeks (percentile of breed and sex)', 'percentile', (list) => list.flatMap((a) => {
        const grams = w12.get(a.id);
        if (grams === undefined || a.breedId === null) return [];
        const reference = growthReferenceOf(ctx.visible, a.breedId, a.sex).reference;
        const p = reference ? percentileOfWeighing(reference, 84, grams) : null;
        return p ? [p.percentile] : [];
      })));
    } else if (key === 'placement_score') {
      measures.push(measure(key, 'Placement score per show result', 'score (0 = last, 1 = won)', (list) => list.flatMap((a) => (data.resultsOf.get(a.id) ?? [])
        .filter((r) => r.placing >= 1 && r.placing <= r.entries).map((r) => placementScore(r.placing, r.entries)).filter((s): s is number => s !== null))));
    } else if (key === 'litter_weaned') {
      const littersOf = new Map<number, number[]>();
      for (const l of data.litters) {
        if (l.damId === null || l.weaned === null) continue;
        let list = littersOf.get(l.damId);
        if (!list) littersOf.set(l.damId, (list = []));
        list.push(l.weaned);
      }
      measures.push(measure(key, 'Litter size weaned (litters of the group’s does)', 'kits', (list) => list.flatMap((a) => littersOf.get(a.id) ?? [])));
    } else if (key === 'inbreeding') {
      const ped = pedigreeOf(entry);
      measures.push(measure(key, 'Inbreeding coefficient', 'F', (list) => list.map((a) => ped.fOf(a.id))));
    } else {
      const t = traits.get(key)!;
      const raw = traitOf(entry, key).raw;
      measures.push(measure(key, `${t.label} (% of the breed’s points)`, '% of points', (list) => list.flatMap((a) => {
        const v = raw.get(a.id);
        const points = a.breedId === null ? undefined : t.points.get(a.breedId);
        return v === undefined || !points ? [] : [(100 * v) / points];
      })));
    }
  }
  const warnings: string[] = [];
  const filtered = filterWords(data, q);
  if (animals.length === 0 && filtered && inScope.length > 0) warnings.push(`No animals match the filters (${filtered.toLowerCase()}).`);
  else if (animals.length === 0) warnings.push(byRabbitry ? 'None of the rabbitries you may see has animals yet.' : 'This rabbitry has no animals yet: lines need animals.');
  else if (keys.length < 2) warnings.push(byRabbitry ? 'Only one rabbitry to compare: a mentor of several herds sees them side by side here.' : 'Only one line in this herd: record each animal’s line to compare lines.');
  const small = keys.filter((g) => groups.get(g)!.length < 10);
  if (small.length > 0) warnings.push(`${small.length} group${small.length === 1 ? ' has' : 's have'} fewer than 10 animals: their quartiles are rough.`);
  const noInterval = measures.reduce((n, m) => n + m.groups.filter((g) => g.summary && !g.medianInterval).length, 0);
  if (noInterval > 0) warnings.push(`${noInterval} median${noInterval === 1 ? '' : 's'} rest${noInterval === 1 ? 's' : ''} on fewer than 6 values: no 95 % interval can be given for ${noInterval === 1 ? 'it' : 'them'}.`);
  return {
    scope: ctx.scopeInfo,
    asOf: ctx.asOf,
    warnings,
    cautions: [...LINE_CAUTIONS],
    filtered,
    groupBy: q.groupBy,
    groups: keys.map((g) => ({ key: g, label: labelOf.get(g) ?? g, animals: groups.get(g)!.length })),
    measures,
  };
}
