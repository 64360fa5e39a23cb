import { DEFAULT_CHART_THEME } from '../panels/chart-theme';
import { buildKeeperBoardOptions, keeperChartHeight, keeperRowLabel } from './keeper-chart-options';
import { candidate } from './keeper-fixtures';

type Series = { type: string; name: string; stack?: string; data: unknown[] };
const theme = DEFAULT_CHART_THEME;

describe('buildKeeperBoardOptions', () => {
  const first = candidate({ id: 1, earId: 'BF177', rank: 1, z: [1.27, 0, 0.45, -0.45, 0.45] });
  const second = candidate({
    id: 2, earId: 'BF175', rank: 2, z: [-1.48, 0.04, 0.8, 1.79, -1.79], disqualificationRisk: true,
  });
  const options = buildKeeperBoardOptions({ candidates: [first, second], theme });
  const series = options['series'] as Series[];

  it('stacks one bar series per component, in the fixed component order, with the total as a marker', () => {
    expect(series.map((s) => `${s.type}:${s.name}`)).toEqual([
      'bar:Breeding value', 'bar:Own evaluation', 'bar:Weight on target', "bar:Parents' placement index", 'bar:Inbreeding', 'scatter:Index total',
    ]);
    expect(new Set(series.filter((s) => s.type === 'bar').map((s) => s.stack))).toEqual(new Set(['index']));
    // contribution = weight × z (weights 1), rounded to 2 places; the inbreeding penalty pulls BF175 left.
    expect(series[4]!.data).toEqual([0.45, -1.79]);
    // totals by hand: 1.27 + 0 + 0.45 − 0.45 + 0.45 = 1.72; −1.48 + 0.04 + 0.8 + 1.79 − 1.79 = −0.64
    expect(series[5]!.data).toEqual([[1.72, 0], [-0.64, 1]]);
  });

  it('lists the juniors best first on a category axis, marking a disqualification risk in the label', () => {
    const y = options['yAxis'] as { type: string; inverse: boolean; data: string[] };
    expect(y).toMatchObject({ type: 'category', inverse: true, data: ['1. BF177', '2. BF175 ⚠'] });
    expect(keeperRowLabel(second)).toBe('2. BF175 ⚠');
    expect((options['xAxis'] as { name: string }).name).toBe('Contribution to the index (weight × SD)');
  });

  it('leaves out a component the breeder weighted 0 (the report no longer carries it)', () => {
    const without = (c: ReturnType<typeof candidate>) => ({ ...c, components: c.components.filter((p) => p.component !== 'inbreeding') });
    const o = buildKeeperBoardOptions({ candidates: [without(first), without(second)], theme });
    expect((o['series'] as Series[]).map((s) => s.name)).not.toContain('Inbreeding');
    expect((o['legend'] as { data: string[] }).data).toEqual(['Breeding value', 'Own evaluation', 'Weight on target', "Parents' placement index", 'Index total']);
  });

  it('draws in the app font without animation, with patterns on the bars and a description', () => {
    expect(options['animation']).toBe(false);
    expect((options['textStyle'] as { fontFamily: string }).fontFamily).toContain('IBM Plex Sans');
    expect(options['aria']).toMatchObject({ enabled: true, decal: { show: true } });
    expect(keeperChartHeight(5)).toBe(120 + 5 * 34);
  });
});
