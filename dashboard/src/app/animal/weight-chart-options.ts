import type { EChartsCoreOption } from 'echarts/core';
import { daysBetween } from '@shared/domain/calendar-date';
import { formatWeight, GRAMS_PER_POUND, type UnitSetting } from '@shared/units/weight';

export interface ChartTheme {
  font: string;
  text: string;
  muted: string;
  line: string;
  grid: string;
  risk: string;
  ideal: string;
}

export interface WeightChartInput {
  weights: readonly { weighedOn: string; grams: number }[];
  birthDate: string | null;
  unit: UnitSetting;
  /** The breed's senior limits for the animal's sex, drawn as reference lines when known. */
  seniorLimits: { idealGrams: number | null; maxGrams: number | null } | null;
  theme: ChartTheme;
}

/** Grams on the chart's axis: pounds (decimal) for lb-oz users, kilograms otherwise. */
export function axisValue(grams: number, unit: UnitSetting): number {
  return Math.round((unit === 'kg' ? grams / 1000 : grams / GRAMS_PER_POUND) * 1000) / 1000;
}

/**
 * The weights-over-age chart: one line of weighings against age in weeks (against the date when
 * the birth date is unknown), weight in the user's unit, with the breed's senior ideal and maximum
 * as dashed reference lines. Animation off so a printed or captured chart is complete.
 * Cost O(weighings).
 */
export function buildWeightChartOptions(input: WeightChartInput): EChartsCoreOption {
  const { unit, theme, birthDate } = input;
  const byAge = birthDate !== null;
  const unitName = unit === 'kg' ? 'kg' : 'lb';
  const points = [...input.weights]
    .sort((a, b) => a.weighedOn.localeCompare(b.weighedOn))
    .map((w) => ({
      value: [byAge ? Math.round((daysBetween(birthDate, w.weighedOn) / 7) * 10) / 10 : w.weighedOn, axisValue(w.grams, unit)],
      grams: w.grams,
      weighedOn: w.weighedOn,
    }));
  // The maximum's label sits above its line and the ideal's below, so close limits stay readable.
  const reference = (grams: number | null | undefined, label: string, color: string, position: string) =>
    grams
      ? [{ yAxis: axisValue(grams, unit), name: `${label} ${formatWeight(grams, unit)}`, lineStyle: { color, type: 'dashed' }, label: { color, position } }]
      : [];
  const markLines = [
    ...reference(input.seniorLimits?.maxGrams, 'Senior maximum', theme.risk, 'insideStartTop'),
    ...reference(input.seniorLimits?.idealGrams, 'Senior ideal', theme.ideal, 'insideStartBottom'),
  ];
  const axisCommon = {
    nameTextStyle: { color: theme.muted, fontFamily: theme.font },
    axisLabel: { color: theme.muted, fontFamily: theme.font },
    axisLine: { lineStyle: { color: theme.grid } },
    splitLine: { lineStyle: { color: theme.grid, opacity: 0.5 } },
  };
  return {
    animation: false,
    textStyle: { fontFamily: theme.font, color: theme.text },
    grid: { left: 56, right: 24, top: 24, bottom: 48 },
    tooltip: {
      trigger: 'item',
      textStyle: { fontFamily: theme.font },
      formatter: (p: { data: { grams: number; weighedOn: string; value: [number | string, number] } }) =>
        `${p.data.weighedOn}${byAge ? ` · ${p.data.value[0]} weeks` : ''}<br>${formatWeight(p.data.grams, unit)}`,
    },
    xAxis: byAge
      ? { type: 'value', name: 'Age (weeks)', nameLocation: 'middle', nameGap: 30, min: 0, ...axisCommon }
      : { type: 'time', name: 'Date weighed', nameLocation: 'middle', nameGap: 30, ...axisCommon },
    yAxis: { type: 'value', name: `Weight (${unitName})`, nameLocation: 'middle', nameGap: 40, min: 0, ...axisCommon },
    series: [
      {
        type: 'line',
        name: 'Weighings',
        data: points,
        showSymbol: true,
        symbolSize: 6,
        lineStyle: { color: theme.line, width: 2 },
        itemStyle: { color: theme.line },
        ...(markLines.length ? { markLine: { symbol: 'none', silent: true, data: markLines, label: { formatter: '{b}', fontFamily: theme.font } } } : {}),
      },
    ],
  };
}
