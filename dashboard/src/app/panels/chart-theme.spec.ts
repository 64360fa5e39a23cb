import { DARK_SERIES_HUES, DEFAULT_CHART_THEME, SERIES_HUES, chartThemeFrom, luminance } from './chart-theme';

/** Computed values as a browser gives them, for the system colours named. */
const page = (values: Record<string, string>) => (name: string) => values[name] ?? null;

describe('chartThemeFrom', () => {
  it('takes the plain colours the browser resolved for the light scheme', () => {
    const theme = chartThemeFrom(page({ '--mat-sys-surface': 'rgb(246, 250, 248)', '--mat-sys-on-surface': 'rgb(25, 28, 27)', '--mat-sys-error': '#ba1a1a' }));
    expect(theme.surface).toBe('rgb(246, 250, 248)');
    expect(theme.text).toBe('rgb(25, 28, 27)');
    expect(theme.risk).toBe('#ba1a1a');
    expect(theme.series).toBe(SERIES_HUES);
  });

  it('never hands ECharts a light-dark() or var() expression: those fall back to plain colours', () => {
    const theme = chartThemeFrom(page({ '--mat-sys-surface': 'light-dark(#f6faf8, #0f1513)', '--mat-sys-on-surface': 'var(--x)' }));
    expect(theme.surface).toBe(DEFAULT_CHART_THEME.surface);
    expect(theme.text).toBe(DEFAULT_CHART_THEME.text);
    for (const value of [theme.text, theme.muted, theme.grid, theme.surface, theme.risk, theme.reference]) expect(value).toMatch(/^(rgb|#)/);
  });

  it('a dark surface takes the lighter hues and dark defaults for what the page does not resolve', () => {
    const theme = chartThemeFrom(page({ '--mat-sys-surface': 'rgb(15, 21, 19)' }));
    expect(theme.series).toBe(DARK_SERIES_HUES);
    expect(luminance(theme.text)!).toBeGreaterThan(0.5);
  });
});

describe('luminance', () => {
  it('follows WCAG 2’s relative luminance: white 1, black 0, #777777 about 0.184', () => {
    expect(luminance('#ffffff')).toBeCloseTo(1, 6);
    expect(luminance('rgb(0, 0, 0)')).toBe(0);
    // WCAG 2.x definition; #777 on white is the well-known 4.48:1 contrast, i.e. L ≈ 0.1845.
    expect(luminance('#777777')).toBeCloseTo(0.1845, 3);
    expect(luminance('light-dark(#fff, #000)')).toBeNull();
  });

  it('keeps every series hue of each scheme at 3:1 or more against its surface (WCAG 1.4.11 for graphics)', () => {
    const contrast = (a: number, b: number) => (Math.max(a, b) + 0.05) / (Math.min(a, b) + 0.05);
    const light = luminance(DEFAULT_CHART_THEME.surface)!;
    const dark = luminance('#0f1513')!;
    const lowLight = SERIES_HUES.filter((h) => contrast(luminance(h)!, light) < 3);
    const lowDark = DARK_SERIES_HUES.filter((h) => contrast(luminance(h)!, dark) < 3);
    expect({ lowLight, lowDark }).toEqual({ lowLight: [], lowDark: [] });
  });
});
