import type { EChartsCoreOption } from 'echarts/core';
import type { GrowthAnimal, GrowthReferenceReport } from '@shared/contracts/analytics';
import { ordinal } from '@shared/domain/ordinal';
import { formatWeight, type UnitSetting } from '@shared/units/weight';
import { axisValue } from '../animal/weight-chart-options';
import { axisStyle, chartBase, legendStyle, tooltipStyle, type ChartTheme } from '../panels/chart-theme';
import { intervalLegend, intervalSeries } from '../panels/interval-series';

export interface GrowthChartInput {
  reference: GrowthReferenceReport | null;
  animals: readonly GrowthAnimal[];
  seniorAgeDays: number;
  unit: UnitSetting;
  theme: ChartTheme;
  /** The x axis ends here (default: growthChartWeeks of the reference); later weighings are in the table only. */
  maxWeeks?: number;
  /** A phone: every legend entry shown, wrapped above the plot, rather than paged. */
  narrow?: boolean;
}

/** The chart spans at least this many weeks, and further where the reference reaches. */
export const GROWTH_MAX_WEEKS = 36;

/**
 * Weeks between the age axis's ticks: 4 on the young chart, 8 up to 80 weeks, then 13 (a quarter
 * year, so 26 and 52 weeks — six months and a year — are ticks). The axis ends on a tick, so
 * no last label crowds the one before it.
 */
export const growthAxisStep = (weeks: number) => (weeks <= GROWTH_MAX_WEEKS ? 4 : weeks <= 80 ? 8 : 13);

/** Weeks the chart spans: to where the reference reaches (senior ages included), at least 36, rounded up to a tick. */
export function growthChartWeeks(reference: GrowthReferenceReport | null): number {
  const weeks = Math.max(GROWTH_MAX_WEEKS, Math.ceil((reference?.reachesDays ?? 0) / 7));
  const step = growthAxisStep(weeks);
  return Math.ceil(weeks / step) * step;
}

/** An age in whole months: 365 → "12 months", 243 → "8 months". */
export const monthsText = (days: number) => `${Math.round(days / (365.25 / 12))} months`;
/** The bands take fern green, a hue no chosen animal's line takes. */
const BAND_HUE = 2;

export const weeksOf = (days: number) => Math.round((days / 7) * 10) / 10;

/** "63rd centile"; the ends read 1st and 99th (a weighing is never below every other). */
export function centileText(percentile: number | null): string {
  return percentile === null ? '—' : `${ordinal(Math.min(99, Math.max(1, Math.round(percentile))))} centile`;
}

/** Bands from outside in: each pair of centiles with the series name the legend shows. */
const BAND_STEPS = [
  ['p3', 'p10', '3rd–97th centile', 0.16],
  ['p10', 'p25', '10th–90th centile', 0.28],
  ['p25', 'p50', '25th–75th centile', 0.42],
  ['p50', 'p75', '25th–75th centile', 0.42],
  ['p75', 'p90', '10th–90th centile', 0.28],
  ['p90', 'p97', '3rd–97th centile', 0.16],
] as const;

/** Hues for the chosen animals: every series hue but the bands' own. */
export function animalHue(theme: ChartTheme, i: number): string {
  const hues = theme.series.filter((_, k) => k !== BAND_HUE);
  return hues[i % hues.length]!;
}

/**
 * Growth curves: the reference's centile bands 3/10/25/50/75/90/97 by week of age as stacked
 * areas (each area the gap between two centiles, so the bands keep their true edges), the median
 * as a line with the breed's senior ideal and maximum as reference lines; on top, each chosen
 * animal's weighings as a line, its projected senior weight as a triangle with its 95 % interval
 * as a whisker (side by side when several animals are projected). Weights in the user's unit
 * (pounds or kilograms on the axis, lb-oz or kg in tooltips). O(bands + weighings).
 */
export function buildGrowthOptions({ reference, animals, seniorAgeDays, unit, theme, maxWeeks = growthChartWeeks(reference), narrow = false }: GrowthChartInput): EChartsCoreOption {
  const y = (grams: number) => axisValue(grams, unit);
  const bands = (reference?.bands ?? []).filter((b) => weeksOf(b.midDays) <= maxWeeks);
  const at = (key: (typeof BAND_STEPS)[number][0]) => bands.map((b) => (b.centiles ? [weeksOf(b.midDays), y(b.centiles[key])] : [weeksOf(b.midDays), '-']));
  const diff = (lo: (typeof BAND_STEPS)[number][0], hi: (typeof BAND_STEPS)[number][1]) =>
    bands.map((b) => [weeksOf(b.midDays), b.centiles ? Math.round((y(b.centiles[hi]) - y(b.centiles[lo])) * 1000) / 1000 : '-']);
  const bandHue = theme.series[BAND_HUE]!;
  const limits = reference?.seniorLimits;
  // Ideal and maximum lie close together: one label above its line, the other below, at the
  // young end where the bands are far below them and no projection sits.
  const limitLine = (grams: number | null | undefined, label: string, color: string, position: string) =>
    grams ? [{ yAxis: y(grams), name: `${label} ${formatWeight(grams, unit)}`, lineStyle: { color, type: 'dashed', width: 1.5 }, label: { color, position } }] : [];
  const projected = animals.map((a, i) => ({ a, i })).filter(({ a }) => a.projection !== null);
  // A reference that stops before 12 months projects at its oldest age: the marker goes there.
  const projectedAt = projected[0]?.a.projection?.ageDays ?? seniorAgeDays;
  const seniorWeeks = weeksOf(projectedAt);
  const offset = (j: number) => Math.round((seniorWeeks + (j - (projected.length - 1) / 2) * 0.35) * 100) / 100;
  const unitName = unit === 'kg' ? 'kg' : 'lb';
  const refName = reference ? `${reference.breed.name} ${reference.sex === 'buck' ? 'bucks' : 'does'}` : 'no reference';

  const bandSeries = reference
    ? [
        { type: 'line', name: 'base', stack: 'centiles', symbol: 'none', silent: true, lineStyle: { opacity: 0 }, tooltip: { show: false }, data: at('p3') },
        ...BAND_STEPS.map(([lo, hi, name, opacity]) => ({
          type: 'line', name, stack: 'centiles', symbol: 'none', silent: true, tooltip: { show: false },
          // The item opacity follows the area's, so the legend tells the three band widths apart.
          lineStyle: { opacity: 0 }, itemStyle: { color: bandHue, opacity: Math.min(1, 2 * opacity) }, areaStyle: { color: bandHue, opacity },
          data: diff(lo, hi),
        })),
        {
          type: 'line', name: 'Median (50th)', symbol: 'none', silent: true, tooltip: { show: false },
          lineStyle: { color: bandHue, width: 2 }, itemStyle: { color: bandHue },
          data: at('p50'),
          markLine: {
            symbol: 'none', silent: true,
            label: { formatter: '{b}', fontFamily: theme.font },
            data: [
              ...limitLine(limits?.maxGrams, 'Senior maximum', theme.risk, 'insideStartTop'),
              ...limitLine(limits?.idealGrams, 'Senior ideal', theme.reference, 'insideStartBottom'),
              { xAxis: seniorWeeks, name: monthsText(projectedAt), lineStyle: { color: theme.grid, type: 'dotted' }, label: { color: theme.muted, position: 'insideStartTop' } },
            ],
          },
        },
      ]
    : [];

  const animalSeries = animals.map((a, i) => ({
    type: 'line', name: a.animal.earId, symbol: 'circle', symbolSize: 6, z: 6,
    lineStyle: { color: animalHue(theme, i), width: 2 }, itemStyle: { color: animalHue(theme, i) },
    data: a.weighings.filter((w) => w.ageDays <= maxWeeks * 7).map((w) => ({
      value: [weeksOf(w.ageDays), y(w.grams)], earId: a.animal.earId, grams: w.grams, weighedOn: w.weighedOn, percentile: w.percentile,
    })),
  }));

  const projectionSeries = projected.length
    ? [
        {
          type: 'scatter', name: 'Projected senior weight', symbol: 'triangle', symbolSize: 13, z: 7,
          itemStyle: { color: theme.text },
          data: projected.map(({ a, i }, j) => ({
            value: [offset(j), y(a.projection!.grams)], itemStyle: { color: animalHue(theme, i), borderColor: theme.text, borderWidth: 1 },
            earId: a.animal.earId, projection: a.projection,
          })),
        },
        intervalSeries({
          name: '95 % interval', color: theme.text, orientation: 'vertical',
          data: projected
            .map(({ a }, j) => [offset(j), a.projection!.lower, a.projection!.upper] as const)
            .filter((d): d is readonly [number, number, number] => d[1] !== null && d[2] !== null)
            .map(([x, lo, hi]) => [x, y(lo), y(hi)] as const),
        }),
      ]
    : [];

  type Item = { seriesName: string; data: { earId?: string; grams?: number; weighedOn?: string; percentile?: number | null; projection?: GrowthAnimal['projection']; value: [number, number] } };
  const tooltip = (p: Item) => {
    const d = p.data;
    if (d.projection) {
      const pr = d.projection;
      const range = pr.lower !== null && pr.upper !== null ? ` (95 %: ${formatWeight(pr.lower, unit)} – ${formatWeight(pr.upper, unit)})` : '';
      return `<b>${d.earId}</b>: projected ${formatWeight(pr.grams, unit)} at ${monthsText(pr.ageDays)}${range}<br>${centileText(pr.percentile)}`;
    }
    if (d.grams !== undefined) return `<b>${d.earId}</b> · ${d.weighedOn}<br>${d.value[0]} weeks · ${formatWeight(d.grams, unit)}<br>${centileText(d.percentile ?? null)}`;
    return '';
  };

  const legendData = [
    ...(reference ? [...['25th–75th centile', '10th–90th centile', '3rd–97th centile'].map((name) => ({ name, icon: 'rect' })), 'Median (50th)'] : []),
    ...animals.map((a) => a.animal.earId),
    ...(projected.length ? ['Projected senior weight', intervalLegend('95 % interval')] : []),
  ];
  // About two entries to a row on a phone.
  const legendRows = narrow ? Math.ceil(legendData.length / 2) : 1;

  return {
    ...chartBase(theme, `Growth centile bands of ${refName} by week of age${animals.length ? `, with ${animals.length} chosen animal${animals.length === 1 ? '' : 's'}` : ''}.`),
    legend: { type: narrow ? 'plain' : 'scroll', top: 0, left: 0, selectedMode: false, ...legendStyle(theme), data: legendData },
    grid: { left: 16, right: 24, top: 24 + 24 * legendRows, bottom: 52 },
    tooltip: { trigger: 'item', ...tooltipStyle(theme), formatter: tooltip },
    xAxis: { type: 'value', min: 0, max: maxWeeks, interval: growthAxisStep(maxWeeks), name: 'Age (weeks)', nameLocation: 'middle', nameGap: 30, ...axisStyle(theme) },
    yAxis: { type: 'value', min: 0, name: `Weight (${unitName})`, nameLocation: 'middle', nameGap: 40, ...axisStyle(theme) },
    series: [...bandSeries, ...animalSeries, ...projectionSeries],
  };
}
