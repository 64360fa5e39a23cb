import { DEFAULT_CHART_THEME } from '../panels/chart-theme';
import { buildEstimatesOptions, buildInheritanceScatterOptions, estimatesOf } from './trait-chart-options';
import { heritabilityReport } from './trait-fixtures';

type Series = { type: string; name: string; data: unknown[]; markArea?: { data: { xAxis: number }[][] } };

describe('trait inheritance charts', () => {
  const report = heritabilityReport();

  it('plots offspring against midparent with the regression line across the points’ range', () => {
    const o = buildInheritanceScatterOptions(report, DEFAULT_CHART_THEME);
    const [points, line] = o['series'] as Series[];
    expect(points!.data).toEqual([{ value: [-1, -0.5], earId: 'BF135' }, { value: [0.5, 0.4], earId: 'BF136' }, { value: [2, 0.1], earId: 'BF137' }]);
    const tooltip = (o['tooltip'] as { formatter: (p: object) => string }).formatter;
    expect(tooltip({ seriesName: 'Offspring', value: [0.5, 0.4], data: points!.data[1] })).toBe('<b>BF136</b><br>Midparent 0.50 SD<br>Offspring 0.40 SD');
    // y = 0.16 + 0.23x at x = −1 and x = 2: −0.07 and 0.62
    expect(line!.data).toEqual([[-1, -0.07], [2, 0.62]]);
    expect((o['xAxis'] as { name: string }).name).toBe('Midparent (SD)');
    expect((o['yAxis'] as { name: string }).name).toBe('Offspring (SD)');
  });

  it('draws no line when the report has none', () => {
    const o = buildInheritanceScatterOptions(heritabilityReport({ scatter: { ...report.scatter, line: null } }), DEFAULT_CHART_THEME);
    expect((o['series'] as Series[])[1]!.data).toEqual([]);
  });

  it('shows each available method’s h² with its interval over the published range', () => {
    expect(estimatesOf(report).map((e) => e.method)).toEqual(['sire-offspring', 'midparent-offspring', 'paternal-half-sib']);
    const o = buildEstimatesOptions(report, DEFAULT_CHART_THEME);
    const [points, whiskers] = o['series'] as Series[];
    expect(points!.data).toEqual([[0.2, 0], [0.23, 1], [0.37, 2]]);
    // 0.2 ± 1.96 × 0.56 = −0.898 to 1.298: the axis widens past 0–1 so the wild interval shows whole.
    expect(whiskers!.data[0]).toEqual([-0.898, 1.298, 0]);
    expect(o['xAxis']).toMatchObject({ min: -0.9, max: 1.3, name: 'Heritability h²' });
    expect(points!.markArea?.data).toEqual([[{ xAxis: 0.1 }, { xAxis: 0.45 }]]);
    expect((o['yAxis'] as { data: string[] }).data).toEqual(['Sire (n 8)', 'Midparent (n 22)', 'Half-sib (n 109)']);
  });
});
