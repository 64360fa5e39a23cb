import type { EChartsCoreOption } from 'echarts/core';
import type { ParentPlacement, PlacementReport } from '@shared/contracts/analytics';
import { axisStyle, chartBase, legendStyle, tooltipStyle, type ChartTheme } from '../panels/chart-theme';
import { intervalLegend, intervalSeries } from '../panels/interval-series';
import { indexText } from './sire-dam-table';

export interface SireDamChartInput {
  report: PlacementReport;
  theme: ChartTheme;
  /** The chart shows this many parents at most; the table lists every one. */
  maxRows?: number;
}

/** Fewer offspring results than this and the rate is marked as a rough guide (as the API says). */
export const SMALL_SAMPLE = 20;
export const PARENT_WORDS = { sire: 'Sires', dam: 'Dams', grandsire: 'Grandsires' } as const;

const pct = (share: number) => Math.round(share * 1000) / 10;
export const isSmall = (p: ParentPlacement) => p.entries < SMALL_SAMPLE;

/** "3. BF092 · n 15*": rank, ear ID, sample size, and a star for a small sample. */
export function parentLabel(p: ParentPlacement): string {
  return `${p.rank}. ${p.parent.earId} · n ${p.entries}${isSmall(p) ? '*' : ''}`;
}

export function sireDamChartHeight(rows: number): number {
  return 130 + 30 * Math.max(rows, 1);
}

function tooltipFor(p: ParentPlacement, k: number): string {
  const name = p.parent.name ? ` ${p.parent.name}` : '';
  const index = p.placementIndex ? `<br>Placement index ${indexText(p)}` : '';
  return `<b>${p.parent.earId}${name}</b><br>Top ${k}: ${p.topK.count} of ${p.topK.n} entries, ${pct(p.topK.share)} % (95 %: ${pct(p.topK.lower)}–${pct(p.topK.upper)} %)`
    + `<br>Shrunk toward the herd: ${pct(p.shrunkenShare)} %${index}<br>${p.offspringShown} offspring shown · ${p.legs} legs`
    + (isSmall(p) ? `<br><i>Fewer than ${SMALL_SAMPLE} results: a rough guide.</i>` : '');
}

/**
 * Parents ranked by their offspring's top-k share (shrunk toward the herd's rate, as the API
 * ranks them): a bar of the observed share, its Wilson 95 % interval as a whisker, the shrunken
 * share as a marker and the herd's rate as a line. Small samples are lighter, patterned and
 * starred in the axis label. O(parents).
 */
export function buildSireDamOptions({ report, theme, maxRows = 30 }: SireDamChartInput): EChartsCoreOption {
  const rows = report.parents.slice(0, maxRows);
  const labels = rows.map(parentLabel);
  const [barHue, intervalHue, shrunkHue] = [theme.series[0]!, theme.text, theme.series[1]!];
  const herd = report.herd.topK;
  const words = PARENT_WORDS[report.parentKind];
  return {
    ...chartBase(theme, `${words} ranked by how often their offspring placed in the top ${report.k}, with 95 % intervals; ${rows.length} of ${report.parents.length} shown.`),
    legend: {
      top: 0, left: 0,
      ...legendStyle(theme),
      data: [`Top-${report.k} share`, intervalLegend('95 % interval'), 'Shrunk toward herd'],
    },
    grid: { left: 8, right: 28, top: 56, bottom: 52 },
    tooltip: {
      trigger: 'item',
      ...tooltipStyle(theme),
      formatter: (p: { dataIndex: number }) => (rows[p.dataIndex] ? tooltipFor(rows[p.dataIndex]!, report.k) : ''),
    },
    xAxis: {
      type: 'value', min: 0, max: 100,
      name: `Offspring entries placed in the top ${report.k} (%)`, nameLocation: 'middle', nameGap: 30,
      ...axisStyle(theme),
    },
    yAxis: { type: 'category', inverse: true, data: labels, ...axisStyle(theme), splitLine: { show: false } },
    series: [
      {
        type: 'bar',
        name: `Top-${report.k} share`,
        barMaxWidth: 18,
        itemStyle: { color: barHue },
        data: rows.map((p) => ({
          value: pct(p.topK.share),
          ...(isSmall(p) ? { itemStyle: { color: barHue, opacity: 0.45, decal: { symbol: 'line', dashArrayX: [1, 0], dashArrayY: [2, 4], rotation: -Math.PI / 4, color: theme.surface } } } : {}),
        })),
        ...(herd ? {
          markLine: {
            symbol: 'none', silent: true,
            lineStyle: { color: theme.reference, type: 'dashed', width: 1.5 },
            // The axis runs top to bottom (best first), so the line's start is at the top, clear of the axis labels.
            label: { formatter: `Herd ${pct(herd.share)} %`, position: 'start', color: theme.reference, fontFamily: theme.font },
            data: [{ xAxis: pct(herd.share) }],
          },
        } : {}),
      },
      intervalSeries({
        name: '95 % interval', color: intervalHue, orientation: 'horizontal',
        data: rows.map((p, i) => [pct(p.topK.lower), pct(p.topK.upper), i] as const),
      }),
      {
        type: 'scatter',
        name: 'Shrunk toward herd',
        symbol: 'diamond',
        symbolSize: 11,
        z: 5,
        itemStyle: { color: shrunkHue, borderColor: theme.surface, borderWidth: 1 },
        data: rows.map((p, i) => [pct(p.shrunkenShare), i]),
      },
    ],
  };
}
