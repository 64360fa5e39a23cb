import type { EChartsCoreOption } from 'echarts/core';
import type { SeasonReport } from '@shared/contracts/analytics';
import { axisStyle, chartBase, legendStyle, tooltipStyle, type ChartTheme } from '../panels/chart-theme';

/** Marker shapes cycled with the hues, so two lines of like colour still differ. */
const SYMBOLS = ['circle', 'rect', 'triangle', 'diamond', 'roundRect', 'pin', 'arrow'];

/** A show date for an axis: '2026-01-17' → 'Jan 17'. Read as a calendar day (no time zone shift). */
export function shortDate(iso: string): string {
  return new Date(`${iso}T00:00:00Z`).toLocaleDateString('en-US', { month: 'short', day: 'numeric', timeZone: 'UTC' });
}

export interface PointsChartInput {
  cumulative: SeasonReport['cumulative'];
  shows: SeasonReport['entries']['shows'];
  top: number;
  who: 'all' | 'members';
  theme: ChartTheme;
  /** A wide screen has room for the legend beside the plot; a narrow one scrolls it above. */
  wide: boolean;
}

export type PointsSeries = SeasonReport['cumulative']['series'][number];

/** The lines drawn: members only if asked, the most points at the end of the season first, at most `top`. O(s log s). */
export function pointsSeriesShown(input: Pick<PointsChartInput, 'cumulative' | 'top' | 'who'>): PointsSeries[] {
  const last = (s: PointsSeries) => s.points.at(-1) ?? 0;
  return input.cumulative.series
    .filter((s) => input.who === 'all' || s.isMember)
    .sort((a, b) => last(b) - last(a) || a.exhibitor.localeCompare(b.exhibitor, 'en'))
    .slice(0, input.top);
}

/**
 * Points over the season: one line per exhibitor of points summed after each show date (the
 * club's formula), the leaders first. Members' lines are solid, other exhibitors' dashed; hues
 * and marker shapes cycle so no two neighbours in the legend look alike. O(series × dates).
 */
export function buildSeasonPointsOptions(input: PointsChartInput): EChartsCoreOption {
  const { cumulative, theme } = input;
  const shown = pointsSeriesShown(input);
  const showsOn = new Map<string, string[]>();
  for (const s of input.shows) showsOn.set(s.date, [...(showsOn.get(s.date) ?? []), s.name]);
  const axis = axisStyle(theme);
  return {
    ...chartBase(theme, `Points summed after each show for ${shown.length} exhibitors, the leaders first.`),
    // Wide: a column beside the plot (scrolling past 25 names). Narrow: every name, wrapped two to a row above it.
    legend: input.wide
      ? { type: 'scroll', orient: 'vertical', right: 0, top: 'middle', ...legendStyle(theme) }
      : { type: 'plain', orient: 'horizontal', left: 0, top: 0, itemGap: 8, ...legendStyle(theme) },
    grid: input.wide ? { left: 8, right: 200, top: 40, bottom: 8 } : { left: 8, right: 16, top: 40 + 24 * Math.ceil(shown.length / 2), bottom: 8 },
    tooltip: {
      trigger: 'axis',
      ...tooltipStyle(theme),
      formatter: (params: { dataIndex: number; seriesName: string; value: number; marker: string }[]) => {
        if (params.length === 0) return '';
        const date = cumulative.dates[params[0]!.dataIndex]!;
        const head = `<b>${date}</b> ${(showsOn.get(date) ?? []).join(', ')}`;
        const rows = [...params].sort((a, b) => b.value - a.value).map((p) => `${p.marker} ${p.seriesName}: ${p.value} points`);
        return [head, ...rows].join('<br>');
      },
    },
    xAxis: {
      type: 'category',
      name: 'Show date',
      nameLocation: 'middle',
      nameGap: 28,
      boundaryGap: false,
      data: cumulative.dates.map(shortDate),
      ...axis,
      splitLine: { show: false },
    },
    yAxis: { type: 'value', name: 'Points so far', ...axis },
    series: shown.map((s, i) => ({
      type: 'line',
      name: s.exhibitor,
      data: s.points,
      symbol: SYMBOLS[i % SYMBOLS.length],
      symbolSize: 7,
      lineStyle: { width: s.isMember ? 2.5 : 1.75, type: s.isMember ? 'solid' : 'dashed' },
      emphasis: { focus: 'series' },
    })),
  };
}

export interface EntriesChartInput {
  entries: SeasonReport['entries'];
  theme: ChartTheme;
  /** A wide screen pages a long legend in one row; a narrow one shows every breed, two to a row. */
  wide: boolean;
}

/**
 * Entries by show and breed as stacked bars: one bar per show (date order), one stack per
 * breed. ECharts' aria decals lay a pattern on each breed's bars as well as its hue, so the
 * stacks read without colour. O(shows × breeds).
 */
export function buildEntriesOptions(input: EntriesChartInput): EChartsCoreOption {
  const { entries, theme } = input;
  const axis = axisStyle(theme);
  return {
    ...chartBase(theme, `Entries at ${entries.shows.length} shows, stacked by breed.`, true),
    legend: input.wide ? { type: 'scroll', top: 0, ...legendStyle(theme) } : { type: 'plain', top: 0, left: 0, itemGap: 8, ...legendStyle(theme) },
    grid: { left: 8, right: 16, top: input.wide ? 56 : 32 + 24 * Math.ceil(entries.breeds.length / 2), bottom: 8 },
    tooltip: {
      trigger: 'axis',
      axisPointer: { type: 'shadow' },
      ...tooltipStyle(theme),
      formatter: (params: { dataIndex: number; seriesName: string; value: number; marker: string }[]) => {
        if (params.length === 0) return '';
        const show = entries.shows[params[0]!.dataIndex]!;
        const total = params.reduce((n, p) => n + p.value, 0);
        return [`<b>${show.name}</b> ${show.date}`, ...params.map((p) => `${p.marker} ${p.seriesName}: ${p.value}`), `Total: ${total} entries`].join('<br>');
      },
    },
    xAxis: {
      type: 'category',
      name: 'Show',
      nameLocation: 'middle',
      nameGap: 28,
      data: entries.shows.map((s) => shortDate(s.date)),
      ...axis,
      splitLine: { show: false },
    },
    yAxis: { type: 'value', name: 'Entries (animals shown)', ...axis },
    series: entries.breeds.map((breed, b) => ({
      type: 'bar',
      name: breed,
      stack: 'entries',
      data: entries.counts.map((row) => row[b] ?? 0),
      emphasis: { focus: 'series' },
    })),
  };
}
