import type { EChartsCoreOption } from 'echarts/core';
import * as echarts from 'echarts/core';
import { CanvasRenderer } from 'echarts/renderers';

// Loaded only when a breeder saves a picture: the panels draw with SVG, the picture needs a canvas.
echarts.use([CanvasRenderer]);

/**
 * A chart as a PNG data address: the same option drawn once more, off-screen, by ECharts' canvas
 * renderer at twice the pixel density, read with `getDataURL`. Canvas text uses the fonts the
 * page has loaded, so the picture keeps the app font. Cost O(size of the chart).
 */
export async function chartPng(option: EChartsCoreOption, width: number, height: number, background: string): Promise<string> {
  await document.fonts?.ready;
  const box = document.createElement('div');
  box.style.cssText = `position:fixed;left:-20000px;top:0;width:${width}px;height:${height}px`;
  document.body.append(box);
  const chart = echarts.init(box, null, { renderer: 'canvas', width, height });
  try {
    chart.setOption(option);
    return chart.getDataURL({ type: 'png', pixelRatio: 2, backgroundColor: background });
  } finally {
    chart.dispose();
    box.remove();
  }
}

/** Saves a data address (a PNG) as a file. */
export function downloadDataUrl(fileName: string, url: string, doc: Document = document): void {
  const link = doc.createElement('a');
  link.href = url;
  link.download = fileName;
  link.style.display = 'none';
  doc.body.append(link);
  link.click();
  link.remove();
}
