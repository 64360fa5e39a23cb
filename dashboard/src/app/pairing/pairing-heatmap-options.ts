import type { EChartsCoreOption } from 'echarts/core';
import type { AnimalRef, PairingsReport } from '@shared/contracts/analytics';
import { axisStyle, chartBase, tooltipStyle, type ChartTheme } from '../panels/chart-theme';
import { formatInbreeding, INBREEDING_BANDS, type InbreedingBand, inbreedingBand } from './inbreeding-bands';

/**
 * The heatmap's sequential ramp, one colour per inbreeding band, light to dark. Lightness falls
 * steadily along it, so the order reads in grey and for every colour-vision deficiency; the
 * cells also carry their numbers (labels on a small grid, tooltips and the table always).
 */
export const INBREEDING_RAMP: readonly string[] = ['#f5f0df', '#d3deb4', '#8dbb9b', '#3d8a8c', '#1b4a6b'];
/** Bands drawn dark enough to need light text on them. */
const DARK_FROM = 3;
/** Up to this many columns and rows the numbers are written in the cells. */
const LABELLED_COLUMNS = 12;
const LABELLED_ROWS = 20;
const CELL = 30;

export interface PairingHeatmapInput {
  matrix: PairingsReport['matrix'];
  /** The animal being planned for: its row or column is outlined and its name marked. */
  selectedId: number | null;
  theme: ChartTheme;
  /** A wide screen keeps the legend beside the grid; a narrow one stacks it below. */
  wide: boolean;
}

/** A band as a visualMap piece: "none" is exactly 0, the next band starts just above it. */
function bounds(b: InbreedingBand): Record<string, number> {
  if (b.index === 0) return { lte: 0 };
  const lower: Record<string, number> = b.index === 1 ? { gt: 0 } : { gte: b.from };
  return b.to === null ? lower : { ...lower, lt: b.to };
}

/** A cell's number: F as a percentage with one decimal, a plain 0 for none. */
const cellText = (f: number) => (f === 0 ? '0' : (f * 100).toFixed(1));

export const animalLabel = (a: Pick<AnimalRef, 'earId' | 'name'>) => (a.name ? `${a.earId} ${a.name}` : a.earId);

/** Room the legend takes: a column of five bands beside the grid, or below it. */
const LEGEND_WIDTH = 140;
const LEGEND_HEIGHT = 120;

/**
 * Height and least width of the chart for a grid of does × bucks, so cells keep a readable size
 * (a wider grid scrolls sideways on a phone). O(1).
 */
export function heatmapSize(does: number, bucks: number, wide: boolean): { height: number; minWidth: number } {
  const grid = { height: 150 + Math.max(does, 1) * CELL, minWidth: 190 + Math.max(bucks, 1) * (CELL + 10) };
  return wide ? { height: grid.height, minWidth: grid.minWidth + LEGEND_WIDTH } : { height: grid.height + LEGEND_HEIGHT, minWidth: grid.minWidth };
}

/**
 * The does × bucks heatmap of expected offspring inbreeding (F = a/2 of each pair): does down
 * (youngest first, as the API sends them), bucks across, each cell coloured by its band of F
 * through a piecewise visualMap whose legend names the bands. Cost O(does × bucks).
 */
export function buildPairingHeatmapOptions(input: PairingHeatmapInput): EChartsCoreOption {
  const { matrix, selectedId, theme } = input;
  const labelled = matrix.bucks.length <= LABELLED_COLUMNS && matrix.does.length <= LABELLED_ROWS;
  const data = matrix.does.flatMap((doe, y) =>
    matrix.bucks.map((buck, x) => {
      const f = matrix.values[y]![x]!;
      const band = inbreedingBand(f);
      const chosen = doe.id === selectedId || buck.id === selectedId;
      return {
        value: [x, y, f],
        doe,
        buck,
        label: { color: band.index >= DARK_FROM ? '#ffffff' : '#1a1a1a' },
        ...(chosen ? { itemStyle: { borderColor: theme.text, borderWidth: 2 } } : {}),
      };
    }),
  );
  // Does are named in full down the side; bucks by ear ID across the top, where width is scarce.
  const axisLabels = (animals: readonly AnimalRef[], name: (a: AnimalRef) => string) => ({
    ...axisStyle(theme).axisLabel,
    width: 120,
    overflow: 'truncate',
    formatter: (_: string, i: number) => {
      const a = animals[i];
      if (!a) return '';
      return a.id === selectedId ? `{chosen|▶ ${name(a)}}` : name(a);
    },
    rich: { chosen: { fontWeight: 600, color: theme.text, fontFamily: theme.font } },
  });
  const axis = axisStyle(theme);
  return {
    ...chartBase(theme, `Expected inbreeding of the offspring of ${matrix.does.length} does and ${matrix.bucks.length} bucks.`),
    grid: { left: 8, right: input.wide ? LEGEND_WIDTH : 16, top: 24, bottom: input.wide ? 8 : LEGEND_HEIGHT },
    tooltip: {
      ...tooltipStyle(theme),
      formatter: (p: { data: (typeof data)[number] }) => {
        const f = p.data.value[2] as number;
        const band = inbreedingBand(f);
        return `Doe ${animalLabel(p.data.doe)} × buck ${animalLabel(p.data.buck)}<br>`
          + `Expected inbreeding <b>${formatInbreeding(f)}</b> — ${band.likeness}`;
      },
    },
    xAxis: {
      type: 'category',
      name: 'Bucks',
      nameLocation: 'middle',
      nameGap: matrix.bucks.length > 6 ? 56 : 28,
      position: 'top',
      data: matrix.bucks.map((b) => animalLabel(b)),
      axisLabel: { ...axisLabels(matrix.bucks, (a) => a.earId), rotate: matrix.bucks.length > 6 ? 45 : 0, interval: 0 },
      axisLine: axis.axisLine,
      nameTextStyle: axis.nameTextStyle,
      splitArea: { show: false },
    },
    yAxis: {
      type: 'category',
      name: 'Does',
      nameLocation: 'middle',
      nameRotate: 90,
      nameGap: 132,
      inverse: true,
      data: matrix.does.map((d) => animalLabel(d)),
      axisLabel: { ...axisLabels(matrix.does, animalLabel), interval: 0 },
      axisLine: axis.axisLine,
      nameTextStyle: axis.nameTextStyle,
    },
    visualMap: {
      type: 'piecewise',
      dimension: 2,
      orient: 'vertical',
      ...(input.wide ? { right: 0, top: 'middle' } : { left: 0, bottom: 0 }),
      itemGap: 6,
      textStyle: { color: theme.text, fontFamily: theme.font },
      pieces: INBREEDING_BANDS.map((b) => ({ ...bounds(b), label: b.label, color: INBREEDING_RAMP[b.index] })),
    },
    series: [
      {
        type: 'heatmap',
        name: 'Expected inbreeding',
        data,
        label: { show: labelled, fontFamily: theme.font, fontSize: 11, formatter: (p: { data: (typeof data)[number] }) => cellText(p.data.value[2] as number) },
        itemStyle: { borderColor: theme.surface, borderWidth: 1 },
        emphasis: { itemStyle: { borderColor: theme.text, borderWidth: 2 } },
      },
    ],
  };
}
