import { median, quantile } from 'simple-statistics';
import { fitLms } from './fit-lms';
import { GROWTH_CENTILES, type GrowthBand, type GrowthCentile, type GrowthReference } from './growth-reference';
import { lastIndexAtOrBelow } from './last-index-at-or-below';
import type { Lms } from './lms';
import { lmsValue } from './lms-value';
import { localLinearSmooth } from './local-linear-smooth';
import { normalQuantile } from './normal-quantile';
import type { Weighing } from './weight-at-age';

export interface GrowthReferenceOptions {
  /** width of an age band in days (default 7) */
  bandDays?: number;
  /** first band starts here (default 0) */
  fromDays?: number;
  /** last band ends at or after this (default 245, about 8 months) */
  toDays?: number;
  /**
   * band edges in days, ascending (bands may differ in width, e.g. weekly while young and wider
   * among adults, growthBandEdges); when given, bandDays, fromDays and toDays are not used
   */
  edges?: readonly number[];
  /** fewer weights than this in a band: empirical centiles instead of LMS (default 20) */
  minBandSize?: number;
  /** smoothing reach in bands either side (default 1; 0 leaves each band's own fit) */
  smoothingBands?: number;
}

/**
 * Weight-for-age reference from a population's weighings (one breed and sex), by the LMS
 * method (Cole & Green 1992, Stat. Med. 11:1305):
 * 1. weighings are grouped into age bands: of `bandDays` each, or between the given `edges`;
 * 2. within a band, each weight is scaled to the band's mean age along a preliminary median
 *    curve (band medians joined linearly, extended linearly at the ends), y·m(t̄)/m(t), so
 *    fast growth within a band does not widen its spread;
 * 3. each band with at least `minBandSize` weights gets a maximum-likelihood Box-Cox fit
 *    (fitLms) giving L, M, S;
 * 4. L, M and S are smoothed across those bands by local linear regression over the bands'
 *    mean ages (localLinearSmooth, tricube kernel reaching (smoothingBands + 1) × the band's own
 *    width either side, so wide adult bands reach as many neighbours as weekly young ones,
 *    weighted by band size) — a discrete stand-in for Cole & Green's penalised curves;
 * 5. centiles 3/10/25/50/75/90/97 are x = M(1 + L·S·z)^(1/L) at z = Φ⁻¹(p).
 * A band with fewer weights is flagged `fallback: 'empirical'` (with a warning) and its
 * centiles are type-7 sample quantiles (simple-statistics quantile; Hyndman & Fan 1996).
 * Cost: O(N log B + B·g·n̄ + B²) for N weighings in B bands.
 *
 * @throws when there are no weighings in range, a weighing is invalid, or an option is out of range
 */
export function fitGrowthReference(points: readonly Weighing[], options: GrowthReferenceOptions = {}): GrowthReference {
  const { bandDays = 7, fromDays = 0, toDays = 245, minBandSize = 20, smoothingBands = 1 } = options;
  if (!(bandDays > 0) || !(toDays > fromDays) || !(minBandSize >= 3) || !(smoothingBands >= 0)) {
    throw new Error('fitGrowthReference requires bandDays > 0, toDays > fromDays, minBandSize ≥ 3 and smoothingBands ≥ 0');
  }
  const edges = options.edges ?? Array.from({ length: Math.ceil((toDays - fromDays) / bandDays) + 1 }, (_, i) => fromDays + i * bandDays);
  if (edges.length < 2 || edges.some((e, i) => !Number.isFinite(e) || (i > 0 && !(e > edges[i - 1]!)))) {
    throw new Error('fitGrowthReference requires at least 2 ascending, finite band edges');
  }
  const bandCount = edges.length - 1;
  const grouped: { ages: number[]; grams: number[] }[] = Array.from({ length: bandCount }, () => ({ ages: [], grams: [] }));
  let outside = 0;
  for (const { ageDays, grams } of points) {
    if (!Number.isFinite(ageDays) || !(grams > 0) || !Number.isFinite(grams)) {
      throw new Error('fitGrowthReference requires finite ages and positive weights');
    }
    if (!(ageDays >= edges[0]! && ageDays < edges[bandCount]!)) {
      outside++;
      continue;
    }
    const b = lastIndexAtOrBelow(bandCount, (i) => edges[i]!, ageDays);
    grouped[b].ages.push(ageDays);
    grouped[b].grams.push(grams);
  }
  if (outside === points.length) throw new Error('fitGrowthReference requires weighings within the age range');
  const warnings: string[] = [];
  if (outside > 0) warnings.push(`${outside} weighings outside ${edges[0]}–${edges[bandCount]} days were left out`);

  const medianAt = medianCurve(grouped);
  const bands: GrowthBand[] = grouped.map(({ ages, grams }, b) => {
    const from = edges[b]!;
    const to = edges[b + 1]!;
    const band: GrowthBand = {
      fromDays: from,
      toDays: to,
      midDays: ages.length > 0 ? ages.reduce((s, a) => s + a, 0) / ages.length : (from + to) / 2,
      n: grams.length,
      fallback: null,
      raw: null,
      lms: null,
      centiles: null,
      weights: null,
    };
    if (grams.length >= minBandSize) {
      try {
        const centre = medianAt(band.midDays);
        const { L, M, S } = fitLms(grams.map((g, i) => (g * centre) / medianAt(ages[i])));
        band.raw = { L, M, S };
      } catch {
        // identical weights cannot be fitted: handled below as an empirical band
      }
    }
    if (band.raw === null && grams.length > 0) {
      band.fallback = 'empirical';
      band.weights = [...grams].sort((x, y) => x - y);
      warnings.push(`band ${from}–${to} days has ${grams.length} weights: empirical centiles, no LMS fit`);
    }
    return band;
  });

  const fitted = bands.filter((b) => b.raw !== null);
  if (fitted.length > 0) {
    const ages = fitted.map((b) => b.midDays);
    const sizes = fitted.map((b) => b.n);
    const h = fitted.map((b) => (smoothingBands + 1) * (b.toDays - b.fromDays));
    const smooth = (pick: (lms: Lms) => number): number[] => {
      const raw = fitted.map((b) => pick(b.raw!));
      return smoothingBands > 0 ? localLinearSmooth(ages, raw, sizes, h) : raw;
    };
    const [L, M, S] = [smooth((l) => l.L), smooth((l) => l.M), smooth((l) => l.S)];
    fitted.forEach((band, i) => {
      // a smoothed M or S at or below 0 (wild neighbours) keeps the band's own value
      band.lms = { L: L[i], M: M[i] > 0 ? M[i] : band.raw!.M, S: S[i] > 0 ? S[i] : band.raw!.S };
    });
  }

  bands.forEach((band, b) => {
    if (band.lms !== null) {
      try {
        const lms = band.lms;
        band.centiles = centileRecord((p) => lmsValue(normalQuantile(p / 100), lms));
      } catch {
        // extreme L·S puts a centile outside the transform's range: fall back to the data
        band.lms = null;
        band.fallback = 'empirical';
        band.weights = [...grouped[b].grams].sort((x, y) => x - y);
        warnings.push(`band ${band.fromDays}–${band.toDays} days: the LMS curve cannot give every centile; empirical centiles`);
      }
    }
    if (band.weights !== null) {
      const sorted = band.weights;
      band.centiles = centileRecord((p) => quantile(sorted, p / 100));
    }
  });
  return { fromDays: edges[0]!, toDays: edges[bandCount]!, bands, warnings };
}


function centileRecord(at: (percent: number) => number): Record<GrowthCentile, number> {
  return Object.fromEntries(GROWTH_CENTILES.map((p) => [p, at(p)])) as Record<GrowthCentile, number>;
}

/** Band medians joined linearly over the bands' mean ages, extended linearly at the ends. */
function medianCurve(grouped: readonly { ages: number[]; grams: number[] }[]): (ageDays: number) => number {
  const knots = grouped
    .filter((g) => g.grams.length >= 3)
    .map((g) => ({ t: g.ages.reduce((s, a) => s + a, 0) / g.ages.length, m: median(g.grams) }));
  return (t) => {
    if (knots.length < 2) return 1; // nothing to adjust along
    let k = 0;
    while (k < knots.length - 2 && t > knots[k + 1].t) k++;
    const [a, b] = [knots[k], knots[k + 1]];
    const value = b.t === a.t ? a.m : a.m + ((t - a.t) * (b.m - a.m)) / (b.t - a.t);
    return value > 0 ? value : Math.min(a.m, b.m);
  };
}
