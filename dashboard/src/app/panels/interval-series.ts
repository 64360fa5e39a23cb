/** A legend icon in the whisker's shape (filled bars: ECharts fills path icons). */
export const WHISKER_ICON = 'path://M0 4h10v2H0zM0 0h1.5v10H0zM8.5 0H10v10H8.5z';

/** The legend entry of an interval series. */
export const intervalLegend = (name: string) => ({ name, icon: WHISKER_ICON });

/** What ECharts hands a custom series' renderItem (the part an interval needs). */
export interface IntervalApi {
  value(dimension: number): number;
  coord(point: [number, number]): [number, number];
}

export interface IntervalSeriesInput {
  name: string;
  color: string;
  /**
   * 'horizontal': items [lower, upper, category] on a value x axis and a category y axis;
   * 'vertical': items [x, lower, upper] on a value y axis.
   */
  orientation: 'horizontal' | 'vertical';
  data: (readonly [number, number, number])[];
  /** Half the cap's length in pixels. */
  cap?: number;
}

/**
 * An interval as a whisker: a line from the lower to the upper end with a cap at each end, drawn
 * by a custom series so it sits on any cartesian chart. The drawing is a pure function of the
 * item's values and the axis mapping, so it is tested without a chart. O(items).
 */
export function intervalSeries({ name, color, orientation, data, cap = 5 }: IntervalSeriesInput) {
  const horizontal = orientation === 'horizontal';
  const renderItem = (_params: unknown, api: IntervalApi) => {
    const [from, to] = horizontal
      ? [api.coord([api.value(0), api.value(2)]), api.coord([api.value(1), api.value(2)])]
      : [api.coord([api.value(0), api.value(1)]), api.coord([api.value(0), api.value(2)])];
    const style = { stroke: color, lineWidth: 1.5 };
    const capAt = ([x, y]: [number, number]) =>
      horizontal ? { x1: x, y1: y - cap, x2: x, y2: y + cap } : { x1: x - cap, y1: y, x2: x + cap, y2: y };
    return {
      type: 'group',
      children: [
        { type: 'line', shape: { x1: from[0], y1: from[1], x2: to[0], y2: to[1] }, style },
        { type: 'line', shape: capAt(from), style },
        { type: 'line', shape: capAt(to), style },
      ],
    };
  };
  return {
    type: 'custom',
    name,
    renderItem,
    itemStyle: { color },
    z: 4,
    encode: horizontal ? { x: [0, 1], y: 2 } : { x: 0, y: [1, 2] },
    data,
  };
}
