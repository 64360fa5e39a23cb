import type { EChartsCoreOption } from 'echarts/core';
import type { HeritabilityEstimate, HeritabilityReport } from '@shared/contracts/analytics';
import { axisStyle, chartBase, legendStyle, tooltipStyle, type ChartTheme } from '../panels/chart-theme';
import { intervalLegend, intervalSeries } from '../panels/interval-series';

export const METHOD_LABELS: Record<HeritabilityEstimate['method'], string> = {
  'sire-offspring': 'Sire–offspring regression',
  'dam-offspring': 'Dam–offspring regression',
  'midparent-offspring': 'Midparent–offspring regression',
  'paternal-half-sib': 'Paternal half-sib ANOVA',
};

/** Short names for the chart's axis (a phone has no room for the full ones; the table has them). */
export const METHOD_SHORT: Record<HeritabilityEstimate['method'], string> = {
  'sire-offspring': 'Sire',
  'dam-offspring': 'Dam',
  'midparent-offspring': 'Midparent',
  'paternal-half-sib': 'Half-sib',
};

/** The report's estimates in a fixed order, leaving out the methods with too few records. */
export function estimatesOf(report: HeritabilityReport): HeritabilityEstimate[] {
  const e = report.estimates;
  return [e.sireOffspring, e.damOffspring, e.midparentOffspring, e.halfSib].filter((x): x is HeritabilityEstimate => x !== null);
}

const r3 = (v: number) => Math.round(v * 1000) / 1000;

/**
 * Offspring against midparent (both in standard deviations within breed and sex) with the
 * midparent regression line drawn across the points' range; its slope estimates h².
 * O(points).
 */
export function buildInheritanceScatterOptions(report: HeritabilityReport, theme: ChartTheme): EChartsCoreOption {
  // The report's axis labels are sentences: the chart names the axes shortly, the page says the rest.
  const { points, line } = report.scatter;
  const xs = points.map((p) => p.x);
  const [lo, hi] = xs.length ? [Math.min(...xs), Math.max(...xs)] : [-1, 1];
  return {
    ...chartBase(theme, `${points.length} offspring of ${report.trait.label.toLowerCase()} against their midparent, with the regression line.`),
    legend: { top: 0, left: 0, ...legendStyle(theme), data: ['Offspring', 'Regression line'] },
    grid: { left: 16, right: 24, top: 44, bottom: 64 },
    tooltip: {
      trigger: 'item',
      ...tooltipStyle(theme),
      formatter: (p: { seriesName: string; value: [number, number]; data: { earId?: string } }) =>
        p.seriesName === 'Offspring'
          ? `<b>${p.data.earId ?? ''}</b><br>Midparent ${p.value[0].toFixed(2)} SD<br>Offspring ${p.value[1].toFixed(2)} SD`
          : 'Midparent regression',
    },
    xAxis: { type: 'value', name: 'Midparent (SD)', nameLocation: 'middle', nameGap: 30, scale: true, ...axisStyle(theme) },
    yAxis: { type: 'value', name: 'Offspring (SD)', nameLocation: 'middle', nameGap: 36, scale: true, ...axisStyle(theme) },
    series: [
      {
        type: 'scatter',
        name: 'Offspring',
        symbolSize: 7,
        itemStyle: { color: theme.series[0], opacity: 0.7 },
        data: points.map((p) => ({ value: [r3(p.x), r3(p.y)], earId: p.earId })),
      },
      {
        type: 'line',
        name: 'Regression line',
        showSymbol: false,
        silent: true,
        lineStyle: { color: theme.series[3], width: 2.5, type: 'dashed' },
        itemStyle: { color: theme.series[3] },
        data: line ? [[r3(lo), r3(line.intercept + line.slope * lo)], [r3(hi), r3(line.intercept + line.slope * hi)]] : [],
      },
    ],
  };
}

/**
 * h² of each method as a point with its 95 % interval (h² ± 1.96 SE, not clipped, so a wild
 * estimate shows as one), over the published range as a shaded band and the 0–1 limits as the
 * axis. O(methods).
 */
export function buildEstimatesOptions(report: HeritabilityReport, theme: ChartTheme): EChartsCoreOption {
  const estimates = estimatesOf(report);
  const labels = estimates.map((e) => `${METHOD_SHORT[e.method]} (n ${e.n})`);
  const ends = estimates.flatMap((e) => [e.lower, e.upper]);
  const range = report.plausibleRange;
  return {
    ...chartBase(theme, `Heritability of ${report.trait.label.toLowerCase()} by ${estimates.length} methods, with 95 % intervals.`),
    legend: { top: 0, left: 0, ...legendStyle(theme), data: ['h²', intervalLegend('95 % interval')] },
    grid: { left: 8, right: 24, top: 40, bottom: 64 },
    tooltip: {
      trigger: 'item',
      ...tooltipStyle(theme),
      formatter: (p: { dataIndex: number }) => {
        const e = estimates[p.dataIndex];
        return e ? `${METHOD_LABELS[e.method]}<br>h² ${e.h2.toFixed(2)} ± ${e.se.toFixed(2)} (95 %: ${e.lower.toFixed(2)} to ${e.upper.toFixed(2)})<br>n ${e.n}` : '';
      },
    },
    xAxis: {
      type: 'value', name: 'Heritability h²', nameLocation: 'middle', nameGap: 44,
      min: Math.min(0, Math.floor(Math.min(...ends, 0) * 10) / 10), max: Math.max(1, Math.ceil(Math.max(...ends, 1) * 10) / 10),
      ...axisStyle(theme),
    },
    yAxis: { type: 'category', inverse: true, data: labels, ...axisStyle(theme), splitLine: { show: false } },
    series: [
      {
        type: 'scatter',
        name: 'h²',
        symbolSize: 12,
        z: 5,
        itemStyle: { color: theme.series[0] },
        data: estimates.map((e, i) => [r3(e.h2), i]),
        ...(range ? {
          markArea: {
            silent: true,
            itemStyle: { color: theme.reference, opacity: 0.14 },
            label: { show: true, position: 'top', distance: 4, color: theme.reference, fontFamily: theme.font, formatter: `Published ${range.lower}–${range.upper}` },
            data: [[{ xAxis: range.lower }, { xAxis: range.upper }]],
          },
        } : {}),
      },
      intervalSeries({ name: '95 % interval', color: theme.text, orientation: 'horizontal', data: estimates.map((e, i) => [r3(e.lower), r3(e.upper), i] as const) }),
    ],
  };
}
