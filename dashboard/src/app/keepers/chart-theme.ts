/**
 * Colours and font of the analysis panels' charts. The series hues are our own, chosen in the
 * manner of the Okabe–Ito set so they stay apart for the common colour-vision deficiencies;
 * meaning never rests on colour alone (legends, labels, patterns and the table carry it too).
 */
export interface ChartTheme {
  font: string;
  text: string;
  muted: string;
  grid: string;
  surface: string;
  /** Series hues, in the order series take them. */
  series: readonly string[];
  /** Marks of a risk (over the breed maximum) and of a reference (ideal weight, herd rate). */
  risk: string;
  reference: string;
}

export const SERIES_HUES = ['#2b6ca3', '#d08a1e', '#19876d', '#c2502b', '#6aa9d8', '#a8628f', '#8a7a1c'] as const;

/** The theme for tests and for anything drawn outside the page (no CSS variables there). */
export const DEFAULT_CHART_THEME: ChartTheme = {
  font: "'IBM Plex Sans', sans-serif",
  text: '#191c1b',
  muted: '#3f4946',
  grid: '#bfc9c5',
  surface: '#f6faf8',
  series: SERIES_HUES,
  risk: '#ba1a1a',
  reference: '#5f4100',
};

/**
 * The page's own colours (Material system variables, light or dark) and font for a chart placed
 * in `element`. Canvas and SVG text do not inherit the page font, so the family is passed on.
 */
export function readChartTheme(element: Element): ChartTheme {
  const style = getComputedStyle(element);
  const v = (name: string, fallback: string) => style.getPropertyValue(name).trim() || fallback;
  return {
    font: DEFAULT_CHART_THEME.font,
    text: v('--mat-sys-on-surface', DEFAULT_CHART_THEME.text),
    muted: v('--mat-sys-on-surface-variant', DEFAULT_CHART_THEME.muted),
    grid: v('--mat-sys-outline-variant', DEFAULT_CHART_THEME.grid),
    surface: v('--mat-sys-surface', DEFAULT_CHART_THEME.surface),
    series: SERIES_HUES,
    risk: v('--mat-sys-error', DEFAULT_CHART_THEME.risk),
    reference: v('--mat-sys-tertiary', DEFAULT_CHART_THEME.reference),
  };
}

/** Axis styling shared by every panel chart: muted labels in the app font, light grid lines. */
export function axisStyle(theme: ChartTheme) {
  return {
    nameTextStyle: { color: theme.muted, fontFamily: theme.font },
    axisLabel: { color: theme.muted, fontFamily: theme.font },
    axisLine: { lineStyle: { color: theme.grid } },
    splitLine: { lineStyle: { color: theme.grid, opacity: 0.6 } },
  };
}

/**
 * Option parts every panel chart starts from: no animation (complete when captured), the app
 * font, a description for screen readers and, for bars, patterns on top of the hues.
 */
export function chartBase(theme: ChartTheme, description: string, patterns = false) {
  return {
    animation: false,
    textStyle: { fontFamily: theme.font, color: theme.text },
    color: [...theme.series],
    aria: { enabled: true, label: { description }, decal: { show: patterns } },
    tooltip: { textStyle: { fontFamily: theme.font }, confine: true },
  };
}
