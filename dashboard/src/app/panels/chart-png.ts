import type { EChartsCoreOption } from 'echarts/core';

/** What drawing a PNG needs from the echarts build a panel loaded. */
export interface ChartPngSource {
  echarts: typeof import('echarts/core');
  option: EChartsCoreOption;
  width: number;
  height: number;
  background: string;
}

/**
 * A PNG of a chart. Panels draw with the SVG renderer (text stays in the page, sharp when
 * printed), whose getDataURL gives SVG only; so the same option is drawn once more, off screen,
 * by the canvas renderer — loaded only when a breeder asks for an image — at twice the
 * resolution, and that canvas's getDataURL is the PNG. Canvas text takes the fonts the page has
 * loaded, so the picture waits for them and keeps the app font. Cost: one extra render of the chart.
 */
export async function chartPngDataUrl(source: ChartPngSource): Promise<string> {
  await document.fonts?.ready;
  const { CanvasRenderer } = await import('echarts/renderers');
  source.echarts.use([CanvasRenderer]);
  const host = document.createElement('div');
  const copy = source.echarts.init(host, null, { renderer: 'canvas', width: source.width, height: source.height });
  try {
    copy.setOption({ ...source.option, animation: false });
    return copy.getDataURL({ type: 'png', pixelRatio: 2, backgroundColor: source.background });
  } finally {
    copy.dispose();
  }
}
