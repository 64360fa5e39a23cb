/**
 * The colours and font a panel's charts draw with. Text and lines come from the page's Material
 * system variables (so light and dark schemes both read); the series hues and the sequential
 * ramp are Keeperline's own, chosen to stay apart for the common colour-vision deficiencies.
 */
export interface PanelTheme {
  font: string;
  text: string;
  muted: string;
  grid: string;
  surface: string;
  /** Categorical hues, in order of use. */
  series: readonly string[];
}

/**
 * Eight categorical hues in the manner of Okabe & Ito (2008, "Color Universal Design"): they differ
 * in lightness as well as hue, so neighbours stay distinct under protan, deutan and tritan vision.
 * Charts add line dashes, symbols or patterns as well, so colour is never the only carrier.
 */
export const SERIES_HUES: readonly string[] = [
  '#1f6aa5', // lake blue
  '#d98b19', // harvest orange
  '#1c8f6e', // fern green
  '#c2528f', // heather
  '#5fb0de', // sky
  '#9d5a16', // chestnut
  '#b9a21c', // mustard
  '#4a4a55', // slate
];

/**
 * Reads the theme once from an element in the page (only an attached element inherits the
 * variables). Material's system colours are `light-dark(…)` expressions, which SVG attributes and
 * the canvas of an exported PNG cannot read: each is resolved to the plain colour in force by
 * letting the browser compute it on a hidden probe.
 */
export function readPanelTheme(element: HTMLElement): PanelTheme {
  const probe = element.ownerDocument.createElement('span');
  probe.style.display = 'none';
  element.append(probe);
  const colour = (name: string, fallback: string) => {
    probe.style.color = `var(${name}, ${fallback})`;
    const computed = getComputedStyle(probe).color;
    return /^(rgb|#)/.test(computed) ? computed : fallback;
  };
  try {
    return {
      // Canvas and exported images do not inherit the page's font: name it.
      font: `'IBM Plex Sans', ${getComputedStyle(element).fontFamily || 'sans-serif'}`,
      text: colour('--mat-sys-on-surface', '#191c1b'),
      muted: colour('--mat-sys-on-surface-variant', '#3f4946'),
      grid: colour('--mat-sys-outline-variant', '#bfc9c5'),
      surface: colour('--mat-sys-surface', '#ffffff'),
      series: SERIES_HUES,
    };
  } finally {
    probe.remove();
  }
}

/** A fixed theme for specs and for code running outside a page. */
export const PLAIN_THEME: PanelTheme = {
  font: "'IBM Plex Sans', sans-serif",
  text: '#191c1b',
  muted: '#3f4946',
  grid: '#bfc9c5',
  surface: '#ffffff',
  series: SERIES_HUES,
};

/** The parts of an axis every panel styles alike. */
export function axisStyle(theme: PanelTheme) {
  return {
    nameTextStyle: { color: theme.muted, fontFamily: theme.font },
    axisLabel: { color: theme.muted, fontFamily: theme.font },
    axisLine: { lineStyle: { color: theme.grid } },
    splitLine: { lineStyle: { color: theme.grid, opacity: 0.6 } },
  };
}

/** Tooltip colours of the page's own surface, in the app font. */
export function tooltipStyle(theme: PanelTheme) {
  return {
    backgroundColor: theme.surface,
    borderColor: theme.grid,
    textStyle: { color: theme.text, fontFamily: theme.font },
  };
}
