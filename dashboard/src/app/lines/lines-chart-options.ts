import type { EChartsCoreOption } from 'echarts/core';
import type { DistributionSummary, LinesReport } from '@shared/contracts/analytics';
import { axisStyle, chartBase, tooltipStyle, type ChartTheme } from '../panels/chart-theme';

/** By default groups with fewer values than this are marked small: their quartiles move with a few animals (the API warns below 10 too). */
export const SMALL_GROUP = 10;

export type LineMeasure = LinesReport['measures'][number];
export type LineGroup = LinesReport['groups'][number];

/** Decimals a measure's values are written with, by its unit. */
const DIGITS: Record<string, number> = { F: 3, percentile: 0, kits: 1, '% of points': 1 };

/** A value in its measure's precision: F 0.04375 → "0.044", percentile 47.6 → "48". */
export function formatMeasure(value: number, unit: string): string {
  return value.toFixed(DIGITS[unit] ?? 2);
}

/** Axis range of measures with a natural scale, so boxes of different views compare by eye. */
function axisRange(unit: string): { min?: number; max?: number } {
  if (unit === 'percentile') return { min: 0, max: 100 };
  if (unit.startsWith('score')) return { min: 0, max: 1 };
  if (unit === '% of points') return { max: 100 };
  return { min: 0 };
}

export interface BoxplotInput {
  measure: LineMeasure;
  groups: readonly LineGroup[];
  theme: ChartTheme;
  /** Groups with fewer values are marked small. */
  minN?: number;
}

/** The n under a box, marked when small. */
export function countLabel(summary: DistributionSummary | null, minN = SMALL_GROUP): string {
  if (!summary) return 'no records';
  return summary.n < minN ? `n = ${summary.n} · small` : `n = ${summary.n}`;
}

/**
 * One measure's distributions side by side: per group a box from Q1 to Q3 with the median,
 * whiskers to the minimum and maximum (the API's quartiles, type 7), a diamond at the mean, and
 * the group's n written under its name. Small groups are drawn hollow with a dashed outline
 * (and "small" under them), groups without records are named with no box. O(groups).
 */
export function buildLineBoxplotOptions(input: BoxplotInput): EChartsCoreOption {
  const { measure, theme } = input;
  const minN = input.minN ?? SMALL_GROUP;
  const labelOf = new Map(input.groups.map((g) => [g.key, g.label]));
  const hue = theme.series[0]!;
  const rows = measure.groups.map((g) => ({ key: g.key, label: labelOf.get(g.key) ?? g.key, summary: g.summary, interval: g.medianInterval }));
  const axis = axisStyle(theme);
  return {
    ...chartBase(theme, `Box plots of ${measure.label.toLowerCase()} for ${rows.length} groups.`),
    grid: { left: 8, right: 16, top: 36, bottom: 8 },
    tooltip: {
      trigger: 'item',
      ...tooltipStyle(theme),
      formatter: (p: { dataIndex: number; seriesType: string }) => {
        const row = rows[p.dataIndex];
        if (!row?.summary) return row ? `${row.label}: no records` : '';
        const s = row.summary;
        const f = (v: number) => formatMeasure(v, measure.unit);
        return [
          `<b>${row.label}</b> — n = ${s.n}${s.n < minN ? ' (small group)' : ''}`,
          `Maximum ${f(s.max)}`, `Upper quartile ${f(s.q3)}`,
          `Median ${f(s.median)}${row.interval ? ` (95 %: ${f(row.interval.lower)}–${f(row.interval.upper)})` : ''}`,
          `Lower quartile ${f(s.q1)}`, `Minimum ${f(s.min)}`,
          `Mean ${f(s.mean)} (${measure.unit})`,
        ].join('<br>');
      },
    },
    xAxis: {
      type: 'category',
      data: rows.map((r) => r.label),
      ...axis,
      splitLine: { show: false },
      axisLabel: {
        ...axis.axisLabel,
        interval: 0,
        formatter: (_: string, i: number) => {
          const r = rows[i];
          if (!r) return '';
          const small = !r.summary || r.summary.n < minN;
          return `${r.label}\n{${small ? 'small' : 'n'}|${countLabel(r.summary, minN)}}`;
        },
        rich: {
          n: { color: theme.muted, fontFamily: theme.font, fontSize: 11, padding: [4, 0, 0, 0] },
          small: { color: theme.text, fontFamily: theme.font, fontSize: 11, fontWeight: 600, padding: [4, 0, 0, 0] },
        },
      },
    },
    yAxis: { type: 'value', name: measure.unit, scale: false, ...axisRange(measure.unit), ...axis },
    series: [
      {
        type: 'boxplot',
        name: measure.label,
        boxWidth: [12, 48],
        data: rows.map((r) => {
          if (!r.summary) return { value: [] };
          const s = r.summary;
          const small = s.n < minN;
          return {
            value: [s.min, s.q1, s.median, s.q3, s.max],
            itemStyle: small
              ? { color: 'transparent', borderColor: hue, borderType: 'dashed', borderWidth: 1.5 }
              : { color: `${hue}33`, borderColor: hue, borderWidth: 1.5 },
          };
        }),
      },
      {
        type: 'scatter',
        name: 'Mean',
        symbol: 'diamond',
        symbolSize: 9,
        itemStyle: { color: theme.text },
        data: rows.flatMap((r, i) => (r.summary ? [[i, r.summary.mean]] : [])),
        tooltip: { show: false },
        z: 3,
      },
    ],
  };
}
