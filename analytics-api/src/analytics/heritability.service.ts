import { mean } from 'simple-statistics';
import type { HeritabilityEstimate, HeritabilityReport, TraitInfo } from '@shared/contracts/analytics';
import { halfSibHeritability } from '../stats/half-sib-heritability';
import { parentOffspringHeritability, type ParentOffspringPair } from '../stats/parent-offspring-heritability';
import { Z_95 } from '../stats/wilson-interval';
import type { CacheEntry } from './analytics-cache';
import { type HerdContext, sentence, traitOf } from './analytics-context';
import type { HerdData } from './herd-data';

/** At most this many scatter points go to the screen (every n-th when there are more). */
const MAX_SCATTER_POINTS = 2000;

/**
 * Published heritability ranges for rabbit traits, for warnings only (REFERENCES.md:
 * "weight at 8–12 weeks about 0.1–0.45, e.g. Larzul et al. 2005, Genet. Sel. Evol.: 63-day weight 0.22").
 */
const PLAUSIBLE: Record<string, { lower: number; upper: number; source: string }> = {
  weight_8w: { lower: 0.1, upper: 0.45, source: 'Published estimates for weight at 8–12 weeks in rabbits (e.g. Larzul et al. 2005, Genet. Sel. Evol.: 63-day weight 0.22)' },
  weight_12w: { lower: 0.1, upper: 0.45, source: 'Published estimates for weight at 8–12 weeks in rabbits (e.g. Larzul et al. 2005, Genet. Sel. Evol.: 63-day weight 0.22)' },
};

export interface HeritabilityEstimates {
  trait: TraitInfo;
  adjustment: string;
  counts: HeritabilityReport['counts'];
  estimates: HeritabilityReport['estimates'];
  preferred: HeritabilityReport['preferred'];
  scatter: HeritabilityReport['scatter'];
  warnings: string[];
}

function estimate(method: HeritabilityEstimate['method'], h2: number, se: number, n: number, extra: Partial<HeritabilityEstimate>, warnings: string[]): HeritabilityEstimate {
  return {
    method, h2, se, lower: h2 - Z_95 * se, upper: h2 + Z_95 * se, n,
    slope: null, slopeSe: null, anova: null, ...extra, warnings: warnings.map(sentence),
  };
}

function regression(method: 'sire-offspring' | 'dam-offspring' | 'midparent-offspring', pairs: ParentOffspringPair[]): HeritabilityEstimate | null {
  if (pairs.length < 3) return null;
  const first = pairs[0]!.parent;
  if (pairs.every((p) => p.parent === first)) return null;
  const r = parentOffspringHeritability(pairs, method === 'sire-offspring' ? 'sire' : method === 'dam-offspring' ? 'dam' : 'midparent');
  return estimate(method, r.h2, r.se, r.n, { slope: r.b, slopeSe: r.seB }, r.warnings);
}

/**
 * Heritability of a trait in a scope, four ways, from records standardised within breed and
 * sex (trait-values.ts):
 * - sire–, dam– and midparent–offspring regressions on family means (one point per parent or
 *   per mating: offspring families share a litter and are not independent, so one point per
 *   family keeps the standard error honest); h² = 2b, 2b and b (Falconer & Mackay 1996, ch. 10);
 * - paternal half-sib one-way ANOVA over sires with at least 2 offspring records, h² = 4t.
 * The preferred estimate is the one with the smallest standard error. O(animals).
 */
export function heritabilityEstimates(entry: CacheEntry<HerdData>, trait: string): HeritabilityEstimates {
  return entry.memo(`heritability:${trait}`, () => {
    const data = entry.data;
    const values = traitOf(entry, trait);
    const z = values.z;
    const families = (key: (a: { sireId: number | null; damId: number | null }) => string | null, parentValue: (a: { sireId: number | null; damId: number | null }) => number | undefined) => {
      const out = new Map<string, { x: number; ys: number[] }>();
      for (const [id, y] of z) {
        const a = data.animal.get(id)!;
        const k = key(a);
        const x = parentValue(a);
        if (k === null || x === undefined) continue;
        let f = out.get(k);
        if (!f) out.set(k, (f = { x, ys: [] }));
        f.ys.push(y);
      }
      return [...out.values()];
    };
    const sireFamilies = families((a) => (a.sireId === null ? null : String(a.sireId)), (a) => (a.sireId === null ? undefined : z.get(a.sireId)));
    const damFamilies = families((a) => (a.damId === null ? null : String(a.damId)), (a) => (a.damId === null ? undefined : z.get(a.damId)));
    const midFamilies = families(
      (a) => (a.sireId === null || a.damId === null ? null : `${a.sireId}-${a.damId}`),
      (a) => {
        const s = a.sireId === null ? undefined : z.get(a.sireId);
        const d = a.damId === null ? undefined : z.get(a.damId);
        return s === undefined || d === undefined ? undefined : (s + d) / 2;
      },
    );
    const toPairs = (fs: { x: number; ys: number[] }[]) => fs.map((f) => ({ parent: f.x, offspring: mean(f.ys) }));

    const bySire = new Map<number, number[]>();
    for (const [id, y] of z) {
      const s = data.animal.get(id)!.sireId;
      if (s === null) continue;
      let g = bySire.get(s);
      if (!g) bySire.set(s, (g = []));
      g.push(y);
    }
    const halfSibGroups = [...bySire.values()].filter((g) => g.length >= 2);
    let halfSib: HeritabilityEstimate | null = null;
    if (halfSibGroups.length >= 2) {
      const h = halfSibHeritability(halfSibGroups);
      halfSib = estimate('paternal-half-sib', h.h2, h.se, h.n, {
        anova: { sires: h.sires, offspring: h.n, k0: h.k0, msBetween: h.msBetween, msWithin: h.msWithin, f: h.f, t: h.t },
      }, h.warnings);
    }
    const estimates = {
      sireOffspring: regression('sire-offspring', toPairs(sireFamilies)),
      damOffspring: regression('dam-offspring', toPairs(damFamilies)),
      midparentOffspring: regression('midparent-offspring', toPairs(midFamilies)),
      halfSib,
    };

    const warnings: string[] = [];
    const halfSibSires = halfSibGroups.length;
    if (halfSibSires < 20) {
      warnings.push(halfSibSires === 0
        ? 'No sire has two or more offspring with records: no half-sib estimate.'
        : `Only ${halfSibSires} sire${halfSibSires === 1 ? '' : 's'} with offspring records: the half-sib estimate is unreliable (want 20 or more).`);
    }
    if (midFamilies.length < 30) warnings.push(`Only ${midFamilies.length} matings where both parents and offspring have records: the midparent regression is unreliable (want 30 or more).`);
    if (values.unstandardised > 0) warnings.push(`${values.unstandardised} record${values.unstandardised === 1 ? ' was' : 's were'} left out: too few of the same breed and sex to compare.`);
    if (values.info.kind === 'weight' && values.raw.size === 0) warnings.push('No animal has weighings on both sides of the standard age within 10 days: weigh juniors every week or two around it.');

    const candidates = Object.values(estimates).filter((e): e is HeritabilityEstimate => e !== null && Number.isFinite(e.se) && e.se > 0);
    const best = candidates.sort((a, b) => a.se - b.se)[0];
    const preferred = best ? { method: best.method, reason: `Smallest standard error (${best.se.toFixed(2)}) of the ${candidates.length} estimate${candidates.length === 1 ? '' : 's'} available.` } : null;

    const points: HeritabilityReport['scatter']['points'] = [];
    for (const [id, y] of z) {
      const a = data.animal.get(id)!;
      const s = a.sireId === null ? undefined : z.get(a.sireId);
      const d = a.damId === null ? undefined : z.get(a.damId);
      if (s !== undefined && d !== undefined) points.push({ x: (s + d) / 2, y, animalId: id, earId: a.earId, rabbitryId: a.rabbitryId });
    }
    const step = Math.max(1, Math.ceil(points.length / MAX_SCATTER_POINTS));
    const mid = estimates.midparentOffspring;
    const familyPairs = toPairs(midFamilies);
    return {
      trait: values.info,
      adjustment: values.adjustment,
      counts: {
        animalsWithRecord: z.size,
        sires: new Set([...z.keys()].map((id) => data.animal.get(id)!.sireId).filter((s) => s !== null)).size,
        dams: new Set([...z.keys()].map((id) => data.animal.get(id)!.damId).filter((d) => d !== null)).size,
        sireFamilies: sireFamilies.length, damFamilies: damFamilies.length, midparentFamilies: midFamilies.length,
        halfSibSires, halfSibOffspring: halfSibGroups.reduce((s, g) => s + g.length, 0),
      },
      estimates,
      preferred,
      scatter: {
        xLabel: 'Midparent (mean of sire and dam), standard deviations from the breed × sex mean',
        yLabel: 'Offspring, standard deviations from the breed × sex mean',
        points: points.filter((_, i) => i % step === 0),
        total: points.length,
        line: mid ? { slope: mid.slope!, intercept: mean(familyPairs.map((p) => p.offspring)) - mid.slope! * mean(familyPairs.map((p) => p.parent)) } : null,
      },
      warnings,
    };
  });
}

/** Plain words for an estimate: how heritable, and what selection on it does. */
export function heritabilityReading(e: HeritabilityEstimate | null): string {
  if (e === null) return 'Not enough records to say how heritable this trait is.';
  const value = `h² ≈ ${e.h2.toFixed(2)} ± ${e.se.toFixed(2)}`;
  if (e.se > 0.25) return `Too uncertain to say (${value}): more records of parents and offspring are needed.`;
  if (e.h2 < 0.1) return `Lowly heritable (${value}): selection makes slow progress; feeding, housing and management matter more.`;
  if (e.h2 < 0.3) return `Moderately heritable (${value}): selecting on it works, slowly.`;
  return `Highly heritable (${value}): selecting on it works well.`;
}

export function heritabilityReport(ctx: HerdContext, trait: string): HeritabilityReport {
  const est = heritabilityEstimates(ctx.scope, trait);
  const range = PLAUSIBLE[trait] ?? null;
  const preferred = est.preferred ? Object.values(est.estimates).find((e) => e?.method === est.preferred!.method) ?? null : null;
  const warnings = [...est.warnings];
  if (range && preferred && (preferred.upper < range.lower || preferred.lower > range.upper)) {
    warnings.push(`The estimate lies outside the published range ${range.lower}–${range.upper}: check the records (weighing ages, parentage) before relying on it.`);
  }
  return {
    scope: ctx.scopeInfo,
    asOf: ctx.asOf,
    warnings,
    trait: est.trait,
    adjustment: est.adjustment,
    counts: est.counts,
    estimates: est.estimates,
    preferred: est.preferred,
    plausibleRange: range,
    plausibleRangeNote: range
      ? `Published range: ${range.lower}–${range.upper}.`
      : est.trait.kind === 'evaluation'
        ? 'No published range is given for breeder evaluation scores.'
        : trait === 'weight_16w'
          ? 'No published range is given for 16-week weight; for 8–12-week weight it is about 0.1–0.45.'
          : 'No published range is given for this trait.',
    reading: heritabilityReading(preferred),
    scatter: est.scatter,
  };
}
