import type { AnimalRef, PairingsReport } from '@shared/contracts/analytics';
import { renderSvg } from '../panels/chart-stubs';
import { DEFAULT_CHART_THEME } from '../panels/chart-theme';
import './pairing-echarts';
import { buildPairingHeatmapOptions, heatmapSize, INBREEDING_RAMP } from './pairing-heatmap-options';

const animal = (id: number, earId: string, sex: 'buck' | 'doe', name: string | null = null): AnimalRef => ({
  id, rabbitryId: 1, earId, name, sex, breedId: 1, breed: 'Mini Rex', variety: 'Blue', line: 'Ember', birthDate: '2025-01-04', status: 'active', isStub: false,
});
// Expected offspring F of familiar matings (Falconer & Mackay 1996, ch. 5, from memory):
// unrelated 0, first cousins 1/16, half sibs 1/8, full sibs 1/4.
const matrix: PairingsReport['matrix'] = {
  does: [animal(1, 'BF100', 'doe', 'Lark'), animal(2, 'BF101', 'doe')],
  bucks: [animal(3, 'BF143', 'buck', 'Ivy II'), animal(4, 'BF118', 'buck')],
  values: [[0, 1 / 16], [1 / 8, 1 / 4]],
  totalDoes: 2, totalBucks: 2, truncated: false,
};
type Cell = { value: [number, number, number]; itemStyle?: { borderWidth: number }; label: { color: string } };
const build = (selectedId: number | null = 1, wide = true) => buildPairingHeatmapOptions({ matrix, selectedId, theme: DEFAULT_CHART_THEME, wide });
const cells = (o: ReturnType<typeof build>) => (o['series'] as { data: Cell[] }[])[0]!.data;

describe('buildPairingHeatmapOptions', () => {
  it('puts bucks across and does down with one cell per pair holding its F', () => {
    const o = build();
    expect((o['xAxis'] as { data: string[]; name: string })).toMatchObject({ name: 'Bucks', data: ['BF143 Ivy II', 'BF118'] });
    expect((o['yAxis'] as { data: string[]; name: string; inverse: boolean })).toMatchObject({ name: 'Does', data: ['BF100 Lark', 'BF101'], inverse: true });
    expect(cells(o).map((c) => c.value)).toEqual([[0, 0, 0], [1, 0, 1 / 16], [0, 1, 1 / 8], [1, 1, 1 / 4]]);
  });

  it('colours by band through a piecewise visualMap whose pieces cut at 0, 1/16, 1/8 and 1/4', () => {
    const vm = build()['visualMap'] as { type: string; dimension: number; pieces: Record<string, unknown>[] };
    expect(vm.type).toBe('piecewise');
    expect(vm.dimension).toBe(2);
    expect(vm.pieces).toEqual([
      { lte: 0, label: 'None', color: INBREEDING_RAMP[0] },
      { gt: 0, lt: 1 / 16, label: 'Under 6.25 %', color: INBREEDING_RAMP[1] },
      { gte: 1 / 16, lt: 1 / 8, label: '6.25–12.5 %', color: INBREEDING_RAMP[2] },
      { gte: 1 / 8, lt: 1 / 4, label: '12.5–25 %', color: INBREEDING_RAMP[3] },
      { gte: 1 / 4, label: '25 % and over', color: INBREEDING_RAMP[4] },
    ]);
  });

  it('outlines the planned animal’s row and marks its name', () => {
    const o = build(1);
    expect(cells(o).map((c) => c.itemStyle?.borderWidth ?? 0)).toEqual([2, 2, 0, 0]);
    const y = (o['yAxis'] as { axisLabel: { formatter: (v: string, i: number) => string } }).axisLabel;
    expect(y.formatter('', 0)).toBe('{chosen|▶ BF100 Lark}');
    expect(y.formatter('', 1)).toBe('BF101');
    // Bucks go by ear ID across the top, where width is short.
    const x = (build(3)['xAxis'] as { axisLabel: { formatter: (v: string, i: number) => string } }).axisLabel;
    expect([x.formatter('', 0), x.formatter('', 1)]).toEqual(['{chosen|▶ BF143}', 'BF118']);
  });

  it('writes light numbers on the dark bands, dark on the light ones, and F as % in tooltips', () => {
    const o = build();
    expect(cells(o).map((c) => c.label.color)).toEqual(['#1a1a1a', '#1a1a1a', '#ffffff', '#ffffff']);
    const tooltip = o['tooltip'] as { formatter: (p: { data: unknown }) => string };
    expect(tooltip.formatter({ data: cells(o)[3] })).toBe('Doe BF101 × buck BF118<br>Expected inbreeding <b>25.0 %</b> — as close as full sibs or parent × offspring');
  });

  it('draws as SVG with the legend’s band names and the numbers in the cells', () => {
    const svg = renderSvg(build(), 640, heatmapSize(2, 2, true).height);
    for (const text of ['Bucks', 'Does', 'None', '25 % and over', '12.5', '6.3']) expect(svg).toContain(text);
  });

  it('keeps the legend beside a wide grid and below a narrow one', () => {
    expect(build(1, true)['visualMap']).toMatchObject({ orient: 'vertical', right: 0 });
    expect(build(1, false)['visualMap']).toMatchObject({ orient: 'vertical', left: 0, bottom: 0 });
    expect(heatmapSize(8, 3, true)).toEqual({ height: 390, minWidth: 450 });
    expect(heatmapSize(8, 3, false)).toEqual({ height: 510, minWidth: 310 });
  });

  it('leaves the numbers out of a large grid, where the tooltip and the table give them', () => {
    const big = { ...matrix, bucks: Array.from({ length: 13 }, (_, i) => animal(10 + i, `B${i}`, 'buck')), values: [new Array(13).fill(0.1), new Array(13).fill(0.2)] };
    const o = buildPairingHeatmapOptions({ matrix: big, selectedId: null, theme: DEFAULT_CHART_THEME, wide: true });
    expect((o['series'] as { label: { show: boolean } }[])[0]!.label.show).toBe(false);
  });
});
