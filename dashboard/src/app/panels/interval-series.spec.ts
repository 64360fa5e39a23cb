import { WHISKER_ICON, intervalLegend, intervalSeries, type IntervalApi } from './interval-series';

/** A stand-in for ECharts' axis mapping: x pixels = 10·x, y pixels = 100 − 10·y. */
function apiFor(item: readonly number[]): IntervalApi {
  return { value: (d) => item[d]!, coord: ([x, y]) => [10 * x, 100 - 10 * y] };
}
type Line = { shape: { x1: number; y1: number; x2: number; y2: number } };
const draw = (s: ReturnType<typeof intervalSeries>, item: readonly number[]) =>
  (s.renderItem(null, apiFor(item)) as { children: Line[] }).children.map((c) => c.shape);

describe('intervalSeries', () => {
  it('draws a horizontal whisker from lower to upper on the item’s category, capped at both ends', () => {
    const s = intervalSeries({ name: '95 %', color: '#000', orientation: 'horizontal', data: [[20, 60, 2]], cap: 4 });
    expect(s.encode).toEqual({ x: [0, 1], y: 2 });
    expect(draw(s, [20, 60, 2])).toEqual([
      { x1: 200, y1: 80, x2: 600, y2: 80 },
      { x1: 200, y1: 76, x2: 200, y2: 84 },
      { x1: 600, y1: 76, x2: 600, y2: 84 },
    ]);
  });

  it('draws a vertical whisker at x from lower to upper', () => {
    const s = intervalSeries({ name: '95 %', color: '#000', orientation: 'vertical', data: [[3, 2, 5]], cap: 4 });
    expect(draw(s, [3, 2, 5])).toEqual([
      { x1: 30, y1: 80, x2: 30, y2: 50 },
      { x1: 26, y1: 80, x2: 34, y2: 80 },
      { x1: 26, y1: 50, x2: 34, y2: 50 },
    ]);
  });

  it('gives the legend a whisker-shaped icon, not the series’ default block', () => {
    expect(intervalLegend('95 % interval')).toEqual({ name: '95 % interval', icon: WHISKER_ICON });
    expect(WHISKER_ICON.startsWith('path://')).toBe(true);
  });
});
