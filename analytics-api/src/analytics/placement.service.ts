import type { ParentPlacement, PlacementQuery, PlacementReport } from '@shared/contracts/analytics';
import type { HerdContext } from './analytics-context';
import { animalRef, herdAnimals } from './herd-data';
import { type OffspringResult, parentPlacements, resultsSummary } from './parent-placements';

const PARENT_WORDS = { sire: 'sires', dam: 'dams', grandsire: 'grandsires' } as const;

/**
 * Sire & dam report: per parent in the herd, its offspring's show results (show_result rows
 * matched to the herd's animals) — entries, offspring shown, top-k share, placement score and
 * index, legs and grand champions among the offspring, and the shrunken top-k share it is
 * ranked by. `grandsire` credits each result to both grandsires (the sire's sire and the
 * dam's sire), once when they are the same animal.
 */
export async function placementReport(ctx: HerdContext, q: PlacementQuery): Promise<PlacementReport> {
  const data = ctx.herd.data;
  const herdIds = new Set(herdAnimals(data, [ctx.rabbitryId]).map((a) => a.id));
  const variety = q.variety?.toLowerCase();
  const counted: (OffspringResult & { showDate: string })[] = [];
  let invalid = 0;
  for (const r of data.results) {
    const a = data.animal.get(r.animalId);
    if (!a || !herdIds.has(a.id)) continue;
    if (q.breed !== undefined && a.breedId !== q.breed) continue;
    if (variety !== undefined && (a.variety ?? '').toLowerCase() !== variety) continue;
    if (q.sex !== undefined && a.sex !== q.sex) continue;
    if ((q.from !== undefined && r.showDate < q.from) || (q.to !== undefined && r.showDate > q.to)) continue;
    if (!(r.placing >= 1 && r.placing <= r.entries)) { invalid++; continue; }
    counted.push({ animalId: r.animalId, placing: r.placing, entries: r.entries, showDate: r.showDate });
  }

  const parentsOf = (animalId: number): number[] => {
    const a = data.animal.get(animalId)!;
    if (q.parent === 'sire') return a.sireId === null ? [] : [a.sireId];
    if (q.parent === 'dam') return a.damId === null ? [] : [a.damId];
    const grand = [a.sireId, a.damId].map((p) => (p === null ? null : (data.animal.get(p)?.sireId ?? null))).filter((g): g is number => g !== null);
    return [...new Set(grand)];
  };
  const groups = new Map<number, OffspringResult[]>();
  let withoutParent = 0;
  for (const r of counted) {
    const parents = parentsOf(r.animalId).filter((p) => data.animal.has(p));
    if (parents.length === 0) withoutParent++;
    for (const p of parents) {
      let list = groups.get(p);
      if (!list) groups.set(p, (list = []));
      list.push(r);
    }
  }

  const records = await ctx.showRecords();
  const inPeriod = (date: string) => (q.from === undefined || date >= q.from) && (q.to === undefined || date <= q.to);
  const stats = parentPlacements([...groups].map(([parent, results]) => ({ parent, results })), q.k);
  const parents: ParentPlacement[] = [];
  for (const s of stats.parents) {
    if (s.entries < q.minEntries) continue;
    const offspring = [...new Set(groups.get(s.parent)!.map((r) => r.animalId))];
    let legs = 0;
    let grandChampions = 0;
    for (const o of offspring) {
      const status = records.get(o)?.status;
      legs += status?.legs.filter((l) => inPeriod(l.showDate)).length ?? 0;
      if (data.animal.get(o)?.grandChampion || status?.isGrandChampion) grandChampions++;
    }
    parents.push({ ...s, parent: animalRef(data, data.animal.get(s.parent)!), legs, grandChampions });
  }

  const warnings = [...stats.warnings];
  const word = PARENT_WORDS[q.parent];
  if (counted.length === 0) {
    warnings.push(herdIds.size === 0
      ? 'This rabbitry has no animals yet: placement rates need animals and their show results.'
      : 'No show results of this herd’s animals match the filters: rates need results matched to the herd’s ear IDs.');
  } else if (groups.size < 5) {
    warnings.push(`Only ${groups.size} ${word} with offspring results: comparisons between them are unreliable (want 5 or more).`);
  }
  if (withoutParent > 0) warnings.push(`${withoutParent} result${withoutParent === 1 ? ' has' : 's have'} no recorded ${q.parent === 'grandsire' ? 'grandsire' : q.parent} and ${withoutParent === 1 ? 'is' : 'are'} left out of the per-parent figures.`);
  if (invalid > 0) warnings.push(`${invalid} result${invalid === 1 ? '' : 's'} with a placing beyond the class size ${invalid === 1 ? 'was' : 'were'} left out.`);
  const listedOut = stats.parents.length - parents.length;
  if (listedOut > 0) warnings.push(`${listedOut} ${word} with fewer than ${q.minEntries} results are not listed.`);

  return {
    scope: ctx.scopeInfo,
    asOf: ctx.asOf,
    warnings,
    parentKind: q.parent,
    k: q.k,
    totals: { results: counted.length, offspringShown: new Set(counted.map((r) => r.animalId)).size, parents: stats.parents.length, parentsListed: parents.length },
    herd: resultsSummary(counted, q.k),
    prior: stats.prior,
    parents,
  };
}
