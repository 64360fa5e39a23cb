import type { EChartsCoreOption } from 'echarts/core';
import { KEEPER_COMPONENTS, KEEPER_COMPONENT_LABELS, type KeeperComponent } from '@shared/contracts/analytics';
import { axisStyle, chartBase, legendStyle, tooltipStyle, type ChartTheme } from '../panels/chart-theme';
import type { KeeperCandidate } from '@shared/domain/keeper-explanation';

export interface KeeperChartInput {
  candidates: readonly KeeperCandidate[];
  theme: ChartTheme;
}

/** Height the board's chart needs for its rows (legend and axis included). */
export function keeperChartHeight(rows: number): number {
  return 120 + 34 * Math.max(rows, 1);
}

const round2 = (v: number) => Math.round(v * 100) / 100;

/** The row's name on the axis: rank, ear ID and a warning sign for a disqualification risk. */
export function keeperRowLabel(c: KeeperCandidate): string {
  return `${c.rank}. ${c.animal.earId}${c.disqualificationRisk ? ' ⚠' : ''}`;
}

/**
 * The keeper board: one horizontal bar per junior, best on top, stacked from its weighted
 * components (contribution = weight × z, so a bar to the left is a component that pulls the junior
 * down), with the index total as a marker. Components appear in a fixed order and hue; those the
 * breeder weighted 0 are absent from the report and so from the chart. O(juniors × components).
 */
export function buildKeeperBoardOptions({ candidates, theme }: KeeperChartInput): EChartsCoreOption {
  const present = KEEPER_COMPONENTS.filter((c) => candidates.some((k) => k.components.some((p) => p.component === c)));
  const hue = (c: KeeperComponent) => theme.series[KEEPER_COMPONENTS.indexOf(c) % theme.series.length]!;
  const bars = present.map((component) => ({
    type: 'bar',
    name: KEEPER_COMPONENT_LABELS[component],
    stack: 'index',
    barMaxWidth: 22,
    itemStyle: { color: hue(component) },
    emphasis: { focus: 'series' },
    data: candidates.map((k) => round2(k.components.find((p) => p.component === component)?.contribution ?? 0)),
  }));
  return {
    ...chartBase(theme, `Keeper index of ${candidates.length} juniors, best first, each bar split into its weighted components.`, true),
    legend: { top: 0, left: 0, ...legendStyle(theme), data: [...present.map((c) => KEEPER_COMPONENT_LABELS[c]), 'Index total'] },
    grid: { left: 8, right: 24, top: 64, bottom: 48 },
    tooltip: {
      trigger: 'axis',
      axisPointer: { type: 'shadow' },
      ...tooltipStyle(theme),
      valueFormatter: (v: number) => (v > 0 ? `+${v.toFixed(2)}` : v.toFixed(2)),
    },
    xAxis: {
      type: 'value',
      name: 'Contribution to the index (weight × SD)',
      nameLocation: 'middle',
      nameGap: 30,
      ...axisStyle(theme),
    },
    yAxis: {
      type: 'category',
      inverse: true,
      data: candidates.map(keeperRowLabel),
      ...axisStyle(theme),
      axisLabel: { ...axisStyle(theme).axisLabel, fontWeight: 500 },
      splitLine: { show: false },
    },
    series: [
      ...bars,
      {
        type: 'scatter',
        name: 'Index total',
        symbol: 'diamond',
        symbolSize: 12,
        z: 5,
        itemStyle: { color: theme.text, borderColor: theme.surface, borderWidth: 1 },
        data: candidates.map((k, i) => [round2(k.total), i]),
      },
    ],
  };
}
