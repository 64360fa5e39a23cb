import { DEFAULT_CHART_THEME } from '../panels/chart-theme';
import { buildSireDamOptions, parentLabel, sireDamChartHeight } from './sire-dam-chart-options';
import { parent, placementReport } from './sire-dam-fixtures';

type Series = { type: string; name: string; data: unknown[]; markLine?: { data: { xAxis: number }[]; label: { formatter: string } } };

describe('buildSireDamOptions', () => {
  const report = placementReport([parent(1, 'BF053', 1, 24, 22), parent(2, 'BF092', 2, 15, 15, { parent: { ...parent(2, 'BF092', 2, 15, 15).parent, name: 'Marlow' } })]);
  const options = buildSireDamOptions({ report, theme: DEFAULT_CHART_THEME });
  const series = options['series'] as Series[];

  it('draws the observed share, its interval whisker and the shrunken share, in percent', () => {
    expect(series.map((s) => `${s.type}:${s.name}`)).toEqual(['bar:Top-3 share', 'custom:95 % interval', 'scatter:Shrunk toward herd']);
    // 22/24 = 91.7 %, 15/15 = 100 %
    expect((series[0]!.data as { value: number }[]).map((d) => d.value)).toEqual([91.7, 100]);
    expect(series[1]!.data).toEqual([[76.7, 100, 0], [85, 100, 1]]);
    expect(series[2]!.data).toEqual([[89.3, 0], [96, 1]]);
    expect((options['xAxis'] as { min: number; max: number; name: string })).toMatchObject({ min: 0, max: 100, name: 'Offspring entries placed in the top 3 (%)' });
  });

  it('marks the herd’s rate and stars small samples, making their bars lighter', () => {
    // herd 115/141 = 81.6 %
    expect(series[0]!.markLine?.data).toEqual([{ xAxis: 81.6 }]);
    expect(series[0]!.markLine?.label.formatter).toBe('Herd 81.6 %');
    expect((options['yAxis'] as { data: string[] }).data).toEqual(['1. BF053 · n 24', '2. BF092 · n 15*']);
    const bars = series[0]!.data as { itemStyle?: { opacity: number } }[];
    expect(bars[0]!.itemStyle).toBeUndefined();
    expect(bars[1]!.itemStyle?.opacity).toBe(0.45);
  });

  it('keeps the chart to the first rows and sizes it to them', () => {
    const many = placementReport(Array.from({ length: 40 }, (_, i) => parent(i + 1, `BF${i + 1}`, i + 1, 30, 20)));
    const o = buildSireDamOptions({ report: many, theme: DEFAULT_CHART_THEME, maxRows: 30 });
    expect((o['yAxis'] as { data: string[] }).data).toHaveLength(30);
    expect(parentLabel(many.parents[39]!)).toBe('40. BF40 · n 30');
    expect(sireDamChartHeight(30)).toBe(130 + 30 * 30);
  });

  it('names the parent, its counts and interval in the tooltip', () => {
    const formatter = (options['tooltip'] as { formatter: (p: { dataIndex: number }) => string }).formatter;
    const text = formatter({ dataIndex: 1 });
    expect(text).toContain('<b>BF092 Marlow</b>');
    expect(text).toContain('Top 3: 15 of 15 entries, 100 % (95 %: 85–100 %)');
    expect(text).toContain('a rough guide');
  });
});
