import type { SeasonReport } from '@shared/contracts/analytics';
import { renderSvg } from '../panels/chart-stubs';
import { DEFAULT_CHART_THEME } from '../panels/chart-theme';
import { buildEntriesOptions, buildSeasonPointsOptions, pointsSeriesShown, shortDate } from './season-chart-options';
import './season-echarts';

const cumulative: SeasonReport['cumulative'] = {
  dates: ['2026-01-17', '2026-02-14', '2026-03-14'],
  series: [
    { exhibitor: 'Ottersley Warren', isMember: false, points: [299, 377, 427] },
    { exhibitor: 'Brackenfold Rabbitry', isMember: true, points: [120, 310, 505] },
    { exhibitor: 'Tinderbrook Hollow', isMember: true, points: [80, 90, 140] },
  ],
  totalExhibitors: 14,
};
const shows = [
  { id: 1, name: 'Winter Show', date: '2026-01-17' },
  { id: 2, name: 'February Open', date: '2026-02-14' },
  { id: 3, name: 'Spring Fancy', date: '2026-03-14' },
];
type Line = { name: string; data: number[]; lineStyle: { type: string }; symbol: string };

describe('buildSeasonPointsOptions', () => {
  const build = (top = 8, who: 'all' | 'members' = 'all') => buildSeasonPointsOptions({ cumulative, shows, top, who, theme: DEFAULT_CHART_THEME, wide: true });

  it('draws one line per exhibitor, most points at the end first, members solid and others dashed', () => {
    const series = build()['series'] as Line[];
    expect(series.map((s) => s.name)).toEqual(['Brackenfold Rabbitry', 'Ottersley Warren', 'Tinderbrook Hollow']);
    expect(series.map((s) => s.lineStyle.type)).toEqual(['solid', 'dashed', 'solid']);
    expect(series[0]!.data).toEqual([120, 310, 505]);
    expect(new Set(series.map((s) => s.symbol)).size).toBe(3);
  });

  it('keeps the top N and, if asked, members only', () => {
    expect((build(2)['series'] as Line[]).map((s) => s.name)).toEqual(['Brackenfold Rabbitry', 'Ottersley Warren']);
    expect(pointsSeriesShown({ cumulative, top: 8, who: 'members' }).map((s) => s.exhibitor)).toEqual(['Brackenfold Rabbitry', 'Tinderbrook Hollow']);
  });

  it('labels the axes with the show dates and the points unit, with a legend beside a wide chart and above a narrow one', () => {
    const o = build();
    expect(o['xAxis']).toMatchObject({ name: 'Show date', data: ['Jan 17', 'Feb 14', 'Mar 14'] });
    expect(o['yAxis']).toMatchObject({ name: 'Points so far' });
    expect(o['legend']).toMatchObject({ type: 'scroll', orient: 'vertical', right: 0 });
    const narrow = buildSeasonPointsOptions({ cumulative, shows, top: 8, who: 'all', theme: DEFAULT_CHART_THEME, wide: false });
    expect(narrow['legend']).toMatchObject({ type: 'plain', orient: 'horizontal', top: 0 });
    expect((narrow['grid'] as { top: number }).top).toBeGreaterThan((o['grid'] as { top: number }).top);
  });

  it('names the show and each exhibitor’s points so far in the tooltip, highest first', () => {
    const tooltip = build()['tooltip'] as { formatter: (p: unknown[]) => string };
    expect(tooltip.formatter([
      { dataIndex: 1, seriesName: 'Ottersley Warren', value: 377, marker: '•' },
      { dataIndex: 1, seriesName: 'Brackenfold Rabbitry', value: 310, marker: '•' },
    ])).toBe('<b>2026-02-14</b> February Open<br>• Ottersley Warren: 377 points<br>• Brackenfold Rabbitry: 310 points');
  });

  it('draws as SVG with the legend names and axis labels', () => {
    const svg = renderSvg(build());
    for (const text of ['Brackenfold Rabbitry', 'Ottersley Warren', 'Points so far', 'Feb 14']) expect(svg).toContain(text);
  });
});

describe('buildEntriesOptions', () => {
  const entries: SeasonReport['entries'] = {
    shows: shows.slice(0, 2),
    breeds: ['Californian', 'Mini Rex'],
    counts: [[37, 72], [41, 47]],
    byBreed: [{ breed: 'Californian', entries: 78 }, { breed: 'Mini Rex', entries: 119 }],
  };
  const build = (wide = true) => buildEntriesOptions({ entries, theme: DEFAULT_CHART_THEME, wide });

  it('stacks one bar series per breed over the shows', () => {
    const series = build()['series'] as { name: string; stack: string; data: number[] }[];
    expect(series.map((s) => [s.name, s.stack, s.data])).toEqual([['Californian', 'entries', [37, 41]], ['Mini Rex', 'entries', [72, 47]]]);
    expect(build()['yAxis']).toMatchObject({ name: 'Entries (animals shown)' });
  });

  it('lays patterns on the bars as well as hues, and totals a show in the tooltip', () => {
    expect(build()['aria']).toMatchObject({ enabled: true, decal: { show: true } });
    const tooltip = build()['tooltip'] as { formatter: (p: unknown[]) => string };
    expect(tooltip.formatter([
      { dataIndex: 0, seriesName: 'Californian', value: 37, marker: '•' },
      { dataIndex: 0, seriesName: 'Mini Rex', value: 72, marker: '•' },
    ])).toBe('<b>Winter Show</b> 2026-01-17<br>• Californian: 37<br>• Mini Rex: 72<br>Total: 109 entries');
  });

  it('pages the legend on a wide screen and shows every breed above the bars on a narrow one', () => {
    expect(build()['legend']).toMatchObject({ type: 'scroll' });
    expect(build(false)['legend']).toMatchObject({ type: 'plain' });
    expect((build(false)['grid'] as { top: number }).top).toBeGreaterThanOrEqual(56);
  });

  it('draws as SVG with the breeds in the legend', () => {
    const svg = renderSvg(build());
    for (const text of ['Californian', 'Mini Rex', 'Jan 17']) expect(svg).toContain(text);
  });
});

describe('shortDate', () => {
  it('writes a calendar day without shifting it by the time zone', () => {
    expect(shortDate('2026-01-01')).toBe('Jan 1');
    expect(shortDate('2026-12-31')).toBe('Dec 31');
  });
});
