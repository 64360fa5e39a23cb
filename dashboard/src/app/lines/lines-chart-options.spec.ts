import type { LinesReport } from '@shared/contracts/analytics';
import './lines-echarts';
import { renderSvg } from '../panels/chart-stubs';
import { buildLineBoxplotOptions, countLabel, formatMeasure, type LineMeasure } from './lines-chart-options';
import { DEFAULT_CHART_THEME } from '../panels/chart-theme';

const groups: LinesReport['groups'] = [
  { key: 'Ember', label: 'Ember', animals: 146 },
  { key: 'Slate', label: 'Slate', animals: 33 },
  { key: '(no line)', label: '(no line)', animals: 4 },
];
const measure: LineMeasure = {
  key: 'weight_12w_percentile',
  label: 'Weight at 12 weeks (percentile of breed and sex)',
  unit: 'percentile',
  groups: [
    { key: 'Ember', summary: { n: 92, min: 3, q1: 31, median: 52, q3: 74, max: 98, mean: 51.6 }, medianInterval: { lower: 45, upper: 58, lowerRank: 37, upperRank: 56, coverage: 0.9573, n: 92 } },
    { key: 'Slate', summary: { n: 8, min: 12, q1: 20, median: 41, q3: 55, max: 90, mean: 42.2 }, medianInterval: { lower: 12, upper: 90, lowerRank: 1, upperRank: 8, coverage: 0.9922, n: 8 } },
    { key: '(no line)', summary: null, medianInterval: null },
  ],
};
type Box = { data: { value: number[]; itemStyle?: { borderType?: string } }[] };
const options = () => buildLineBoxplotOptions({ measure, groups, theme: DEFAULT_CHART_THEME });

describe('buildLineBoxplotOptions', () => {
  it('draws each group’s five-number summary in ECharts’ boxplot order: min, Q1, median, Q3, max', () => {
    const [box, mean] = options()['series'] as [Box, { data: number[][] }];
    expect(box.data.map((d) => d.value)).toEqual([[3, 31, 52, 74, 98], [12, 20, 41, 55, 90], []]);
    expect(mean.data).toEqual([[0, 51.6], [1, 42.2]]);
  });

  it('writes n under each box, marks small groups and gives them a dashed outline', () => {
    const o = options();
    const axis = o['xAxis'] as { data: string[]; axisLabel: { formatter: (v: string, i: number) => string } };
    expect(axis.data).toEqual(['Ember', 'Slate', '(no line)']);
    expect([0, 1, 2].map((i) => axis.axisLabel.formatter('', i))).toEqual([
      'Ember\n{n|n = 92}', 'Slate\n{small|n = 8 · small}', '(no line)\n{small|no records}',
    ]);
    const [box] = o['series'] as [Box];
    expect(box.data.map((d) => d.itemStyle?.borderType ?? 'solid')).toEqual(['solid', 'dashed', 'solid']);
  });

  it('names the value axis by the unit and keeps percentiles on 0–100', () => {
    expect(options()['yAxis']).toMatchObject({ name: 'percentile', min: 0, max: 100 });
    const f = buildLineBoxplotOptions({ measure: { ...measure, unit: 'F' }, groups, theme: DEFAULT_CHART_THEME });
    expect(f['yAxis']).toMatchObject({ name: 'F', min: 0 });
  });

  it('says every quartile, the mean and n in the tooltip', () => {
    const tooltip = options()['tooltip'] as { formatter: (p: { dataIndex: number }) => string };
    expect(tooltip.formatter({ dataIndex: 1 })).toBe(
      '<b>Slate</b> — n = 8 (small group)<br>Maximum 90<br>Upper quartile 55<br>Median 41 (95 %: 12–90)<br>Lower quartile 20<br>Minimum 12<br>Mean 42 (percentile)',
    );
    expect(tooltip.formatter({ dataIndex: 2 })).toBe('(no line): no records');
  });

  it('draws in the app font with animation off, the labels as text', () => {
    const o = options();
    expect(o['animation']).toBe(false);
    expect((o['textStyle'] as { fontFamily: string }).fontFamily).toContain('IBM Plex Sans');
    const svg = renderSvg(o);
    expect(svg).toContain('n = 92');
    expect(svg).toContain('n = 8 · small');
    expect(svg).toContain('percentile');
  });
});

describe('formatMeasure and countLabel', () => {
  it('writes values in their unit’s precision', () => {
    expect(formatMeasure(0.04375, 'F')).toBe('0.044');
    expect(formatMeasure(7.25, 'kits')).toBe('7.3');
    expect(formatMeasure(0.6667, 'score (0 = last, 1 = won)')).toBe('0.67');
  });

  it('marks under 10 values as small', () => {
    expect(countLabel({ n: 10, min: 0, q1: 0, median: 0, q3: 0, max: 0, mean: 0 })).toBe('n = 10');
    expect(countLabel({ n: 9, min: 0, q1: 0, median: 0, q3: 0, max: 0, mean: 0 })).toBe('n = 9 · small');
  });
});
