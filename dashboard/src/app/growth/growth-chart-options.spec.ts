import { DEFAULT_CHART_THEME } from '../panels/chart-theme';
import { buildGrowthOptions, centileText, growthChartWeeks, monthsText, weeksOf } from './growth-chart-options';
import { growthAnimal, reference } from './growth-fixtures';

type Series = { type: string; name: string; stack?: string; data: unknown[]; markLine?: { data: { yAxis?: number; xAxis?: number; name: string }[] } };
const theme = DEFAULT_CHART_THEME;
const build = (unit: 'lb-oz' | 'kg', animals = [growthAnimal(1, 'BF177'), growthAnimal(2, 'BF179')]) =>
  buildGrowthOptions({ reference: reference('doe'), animals, seniorAgeDays: 243, unit, theme });

describe('buildGrowthOptions', () => {
  it('stacks the bands as gaps between centiles, so each area keeps its true edges (kilograms)', () => {
    const series = build('kg')['series'] as Series[];
    const stacked = series.filter((s) => s.stack === 'centiles');
    expect(stacked.map((s) => s.name)).toEqual(['base', '3rd–97th centile', '10th–90th centile', '25th–75th centile', '25th–75th centile', '10th–90th centile', '3rd–97th centile']);
    // base = p3 (0.68 kg at 8.5 weeks); p10 − p3 = 0.72 − 0.68 = 0.04; the empty band is a gap.
    expect(stacked[0]!.data).toEqual([[8.5, 0.68], [9.5, '-'], [12.5, 1.029]]);
    expect(stacked[1]!.data).toEqual([[8.5, 0.04], [9.5, '-'], [12.5, 0.062]]);
    // the six gaps add back up to p97: 0.68 + 0.04 + 0.04 + 0.048 + 0.052 + 0.047 + 0.049 = 0.956
    const top = stacked.reduce((sum, s) => sum + (s.data[0] as [number, number])[1], 0);
    expect(top).toBeCloseTo(0.956, 9);
  });

  it('draws the median with the senior ideal and maximum, in pounds for an lb-oz user', () => {
    const o = build('lb-oz');
    const median = (o['series'] as Series[]).find((s) => s.name === 'Median (50th)')!;
    // 808 g / 453.59237 = 1.781 lb (NIST Handbook 44 App. C); 2041 g = 4.5 lb, 1928 g = 4.251 lb
    expect(median.data[0]).toEqual([8.5, 1.781]);
    expect(median.markLine?.data.map((d) => d.name)).toEqual(['Senior maximum 4 lb 8 oz', 'Senior ideal 4 lb 4 oz', '8 months']);
    expect(median.markLine?.data.map((d) => d.yAxis ?? d.xAxis)).toEqual([4.5, 4.251, 34.7]);
    expect((o['yAxis'] as { name: string }).name).toBe('Weight (lb)');
    expect((o['xAxis'] as { name: string; max: number })).toMatchObject({ name: 'Age (weeks)', max: 36 });
  });

  it('runs as far as the reference reaches, and marks the age the senior weight is projected at', () => {
    const far = { ...reference('doe'), reachesDays: 420 };
    const adult = growthAnimal(1, 'BF177', { projection: { ...growthAnimal(1, 'BF177').projection!, ageDays: 365 } });
    const o = buildGrowthOptions({ reference: far, animals: [adult], seniorAgeDays: 365, unit: 'kg', theme });
    // 420 days is 60 weeks, rounded up to the next 8-week tick.
    expect(growthChartWeeks(far)).toBe(64);
    expect(growthChartWeeks(null)).toBe(36);
    expect(o['xAxis']).toMatchObject({ max: 64, interval: 8 });
    // Two years of weighings: quarter-year ticks, the axis ending on one (104 = 8 × 13).
    expect(growthChartWeeks({ ...far, reachesDays: 714 })).toBe(104);
    expect(growthChartWeeks({ ...far, reachesDays: 700 })).toBe(104);
    const median = (o['series'] as Series[]).find((s) => s.name === 'Median (50th)')!;
    expect(median.markLine?.data.at(-1)).toMatchObject({ name: '12 months', xAxis: 52.1 });
    // The adult weighing at 287 days (41 weeks) is on the chart now.
    expect(((o['series'] as Series[]).find((s) => s.name === 'BF177')!.data as unknown[])).toHaveLength(3);
    expect([183, 243, 365, 548].map(monthsText)).toEqual(['6 months', '8 months', '12 months', '18 months']);
  });

  it('keeps the chosen animals’ lines off the bands’ hue, and shows every legend entry on a phone', () => {
    const series = build('kg')['series'] as (Series & { lineStyle?: { color: string }; areaStyle?: { color: string } })[];
    const bandHue = series.find((s) => s.areaStyle)!.areaStyle!.color;
    expect(series.filter((s) => s.name.startsWith('BF')).map((s) => s.lineStyle!.color)).not.toContain(bandHue);
    const phone = buildGrowthOptions({ reference: reference('doe'), animals: [growthAnimal(1, 'BF177')], seniorAgeDays: 243, unit: 'kg', theme, narrow: true });
    expect(phone['legend']).toMatchObject({ type: 'plain' });
    expect((phone['grid'] as { top: number }).top).toBeGreaterThan((build('kg')['grid'] as { top: number }).top);
  });

  it('puts each chosen animal’s weighings on top, leaving later ones to the table', () => {
    const series = build('kg')['series'] as Series[];
    const bf177 = series.find((s) => s.name === 'BF177')!;
    expect(bf177.type).toBe('line');
    expect((bf177.data as { value: number[] }[]).map((d) => d.value)).toEqual([[8, 0.8], [12, 1.25]]);
  });

  it('sets the projections side by side at 8 months with their 95 % intervals', () => {
    const series = build('kg')['series'] as Series[];
    const projected = series.find((s) => s.name === 'Projected senior weight')!;
    expect((projected.data as { value: number[] }[]).map((d) => d.value)).toEqual([[34.53, 1.9], [34.88, 1.9]]);
    const whiskers = series.find((s) => s.name === '95 % interval')!;
    expect(whiskers.type).toBe('custom');
    expect(whiskers.data).toEqual([[34.53, 1.8, 2], [34.88, 1.8, 2]]);
  });

  it('draws the chosen animals alone when there is no reference, and says centiles in words', () => {
    const o = buildGrowthOptions({ reference: null, animals: [growthAnimal(1, 'BF177', { projection: null })], seniorAgeDays: 243, unit: 'kg', theme });
    expect((o['series'] as Series[]).map((s) => s.name)).toEqual(['BF177']);
    expect(centileText(62.2)).toBe('62nd centile');
    expect(centileText(99.8)).toBe('99th centile');
    expect(centileText(null)).toBe('—');
    expect(weeksOf(243)).toBe(34.7);
  });
});
