import { BreakpointObserver } from '@angular/cdk/layout';
import { ElementRef, computed, inject, type Signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';

/**
 * The colours and font every chart draws with. Text, grid lines and marks come from the page's
 * Material system colours, resolved to plain colours for the scheme in force; the series hues are
 * Keeperline's own. Meaning never rests on colour alone: legends, labels, dashes, symbols and
 * patterns carry it too, and a table beside each chart holds the same numbers.
 */
export interface ChartTheme {
  font: string;
  text: string;
  muted: string;
  grid: string;
  surface: string;
  /** Categorical hues, in the order series take them. */
  series: readonly string[];
  /** Marks of a risk (over the breed maximum) and of a reference (ideal weight, herd rate, published range). */
  risk: string;
  reference: string;
}

/** Chart text is in the app font: canvas and SVG text do not inherit the page's. */
const FONT = "'IBM Plex Sans', sans-serif";

/**
 * Eight categorical hues in the manner of Okabe & Ito (2008, "Color Universal Design"): they
 * differ in lightness as well as hue, so neighbours stay apart under protan, deutan and tritan
 * vision, and each keeps 3:1 against its scheme's surface (WCAG 1.4.11). The dark scheme's set is
 * lighter, to hold that contrast against a dark surface.
 */
export const SERIES_HUES: readonly string[] = [
  '#1f6aa5', // lake blue
  '#c07400', // harvest orange
  '#1c8f6e', // fern green
  '#c2528f', // heather
  '#d0492b', // rosehip
  '#7f4a12', // chestnut
  '#948300', // mustard
  '#4a4a55', // slate
];
export const DARK_SERIES_HUES: readonly string[] = ['#72b4ea', '#f0a848', '#4cc39e', '#e58cbd', '#f4937a', '#d6995a', '#ddc85a', '#b9b9c7'];

/** The light theme, for specs and for anything drawn outside the page. */
export const DEFAULT_CHART_THEME: ChartTheme = {
  font: FONT,
  text: '#191c1b',
  muted: '#3f4946',
  grid: '#bfc9c5',
  surface: '#f6faf8',
  series: SERIES_HUES,
  risk: '#ba1a1a',
  reference: '#5f4100',
};

const DARK_CHART_THEME: ChartTheme = {
  font: FONT,
  text: '#dfe4e1',
  muted: '#bec9c4',
  grid: '#3f4946',
  surface: '#0f1513',
  series: DARK_SERIES_HUES,
  risk: '#ffb4ab',
  reference: '#f0bf6b',
};

/** The Material system colour each part of the theme takes. */
const SYSTEM_COLOURS = {
  text: '--mat-sys-on-surface',
  muted: '--mat-sys-on-surface-variant',
  grid: '--mat-sys-outline-variant',
  surface: '--mat-sys-surface',
  risk: '--mat-sys-error',
  reference: '--mat-sys-tertiary',
} as const;

/** A colour ECharts can draw with: rgb()/rgba() or hex, never a `light-dark(…)` or `var(…)` expression. */
const CONCRETE = /^(rgba?\(|#[0-9a-f]{3,8}$)/i;

/** Relative luminance (WCAG 2) of an rgb()/hex colour, or null when it is neither. */
export function luminance(colour: string): number | null {
  const hex = /^#([0-9a-f]{6})/i.exec(colour)?.[1];
  const rgb = hex
    ? [0, 2, 4].map((i) => parseInt(hex.slice(i, i + 2), 16))
    : /^rgba?\(\s*(\d+)[\s,]+(\d+)[\s,]+(\d+)/i.exec(colour)?.slice(1, 4).map(Number);
  if (!rgb) return null;
  const [r, g, b] = rgb.map((v) => {
    const c = v / 255;
    return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/**
 * The theme from the page's colours as the browser resolved them (`read` gives a system colour's
 * computed value, or null). A dark surface picks the dark defaults and hues; a value that is not a
 * plain colour falls back to the default of its scheme. O(1).
 */
export function chartThemeFrom(read: (name: string) => string | null): ChartTheme {
  const concrete = (name: string) => {
    const value = read(name)?.trim() ?? '';
    return CONCRETE.test(value) ? value : null;
  };
  const surface = concrete(SYSTEM_COLOURS.surface);
  const base = surface !== null && (luminance(surface) ?? 1) < 0.2 ? DARK_CHART_THEME : DEFAULT_CHART_THEME;
  const pick = (key: keyof typeof SYSTEM_COLOURS) => concrete(SYSTEM_COLOURS[key]) ?? base[key];
  return {
    ...base,
    text: pick('text'),
    muted: pick('muted'),
    grid: pick('grid'),
    surface: pick('surface'),
    risk: pick('risk'),
    reference: pick('reference'),
  };
}

/**
 * The theme of a chart placed in `element`. Material's system colours are `light-dark(…)`
 * expressions, which SVG attributes and an exported PNG's canvas cannot read: the browser resolves
 * each on a hidden probe (only an attached element inherits the variables) to the plain colour in
 * force for the current scheme.
 */
export function readChartTheme(element: Element): ChartTheme {
  const probe = element.ownerDocument.createElement('span');
  probe.style.display = 'none';
  element.append(probe);
  const defined = getComputedStyle(element);
  try {
    return chartThemeFrom((name) => {
      if (!defined.getPropertyValue(name).trim()) return null;
      probe.style.color = `var(${name})`;
      return getComputedStyle(probe).color || null;
    });
  } finally {
    probe.remove();
  }
}

/**
 * The chart theme of the component being built, read when its first chart is drawn (its element
 * is in the page by then) and again whenever the colour scheme or contrast preference changes.
 * Call in an injection context.
 */
export function injectChartTheme(): Signal<ChartTheme> {
  const host: HTMLElement = inject(ElementRef).nativeElement;
  const scheme = toSignal(inject(BreakpointObserver).observe(['(prefers-color-scheme: dark)', '(prefers-contrast: more)']));
  return computed(() => {
    scheme();
    return readChartTheme(host);
  });
}

/** The parts of an axis every chart styles alike: muted labels in the app font, light grid lines. */
export function axisStyle(theme: ChartTheme) {
  return {
    nameTextStyle: { color: theme.muted, fontFamily: theme.font },
    axisLabel: { color: theme.muted, fontFamily: theme.font },
    axisLine: { lineStyle: { color: theme.grid } },
    splitLine: { lineStyle: { color: theme.grid, opacity: 0.6 } },
  };
}

/** Tooltips on the page's own surface, in the app font, kept inside the chart on a phone. */
export function tooltipStyle(theme: ChartTheme) {
  return {
    confine: true,
    backgroundColor: theme.surface,
    borderColor: theme.grid,
    textStyle: { color: theme.text, fontFamily: theme.font },
  };
}

/** A legend's words in the app font, its page counter too when it scrolls. */
export function legendStyle(theme: ChartTheme) {
  return { textStyle: { color: theme.text, fontFamily: theme.font }, pageTextStyle: { color: theme.muted, fontFamily: theme.font } };
}

/**
 * Option parts every chart starts from: no animation (complete when printed or captured), the app
 * font and hues, a description for screen readers and, where asked, patterns over the hues.
 */
export function chartBase(theme: ChartTheme, description: string, patterns = false) {
  return {
    animation: false,
    textStyle: { fontFamily: theme.font, color: theme.text },
    color: [...theme.series],
    aria: { enabled: true, label: { description }, decal: { show: patterns } },
    tooltip: tooltipStyle(theme),
  };
}
