import { axisValue, buildWeightChartOptions, type ChartTheme, type WeightChartInput } from './weight-chart-options';

const theme: ChartTheme = { font: 'IBM Plex Sans', text: '#111', muted: '#555', line: '#246', grid: '#ccc', risk: '#b00', ideal: '#080' };
const input = (over: Partial<WeightChartInput> = {}): WeightChartInput => ({
  weights: [{ weighedOn: '2026-07-15', grams: 1361 }, { weighedOn: '2026-06-15', grams: 680 }],
  birthDate: '2026-05-15', unit: 'lb-oz', seniorLimits: { idealGrams: 1814, maxGrams: 2041 }, theme, ...over,
});
type Series = { data: { value: [number | string, number]; grams: number }[]; markLine?: { data: { yAxis: number; name: string }[] } };
const series = (o: ReturnType<typeof buildWeightChartOptions>) => (o['series'] as Series[])[0];

describe('buildWeightChartOptions', () => {
  // 1 lb = 453.59237 g exactly (NIST Handbook 44, Appendix C): 1361 g = 3.0005 lb, 680 g = 1.499 lb, 2041 g = 4.4996 lb.
  it('plots each weighing at its age in weeks, in pounds for an lb-oz user, oldest first', () => {
    const s = series(buildWeightChartOptions(input()));
    expect(s.data.map((p) => p.value)).toEqual([[4.4, 1.499], [8.7, 3]]);
    expect(axisValue(2041, 'lb-oz')).toBe(4.5);
    expect(axisValue(2608, 'kg')).toBe(2.608);
  });

  it('names the axes with their units and draws the senior ideal and maximum', () => {
    const o = buildWeightChartOptions(input());
    expect((o['xAxis'] as { name: string }).name).toBe('Age (weeks)');
    expect((o['yAxis'] as { name: string }).name).toBe('Weight (lb)');
    expect(series(o).markLine?.data.map((l) => l.name)).toEqual(['Senior maximum 4 lb 8 oz', 'Senior ideal 4 lb 0 oz']);
    expect(o['animation']).toBe(false);
    expect((o['textStyle'] as { fontFamily: string }).fontFamily).toBe('IBM Plex Sans');
  });

  it('falls back to dates without a birth date and leaves out unknown limits', () => {
    const o = buildWeightChartOptions(input({ birthDate: null, unit: 'kg', seniorLimits: null }));
    expect((o['xAxis'] as { type: string }).type).toBe('time');
    expect(series(o).data[0].value).toEqual(['2026-06-15', 0.68]);
    expect(series(o).markLine).toBeUndefined();
    expect((o['yAxis'] as { name: string }).name).toBe('Weight (kg)');
  });

  it('says the date, age and weight in the tooltip', () => {
    const o = buildWeightChartOptions(input());
    const formatter = (o['tooltip'] as { formatter: (p: unknown) => string }).formatter;
    expect(formatter({ data: series(o).data[1] })).toBe('2026-07-15 · 8.7 weeks<br>3 lb 0 oz');
  });
});
