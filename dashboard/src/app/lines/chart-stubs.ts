import type { EChartsCoreOption } from 'echarts/core';
import * as echarts from 'echarts/core';

/**
 * What ECharts needs of a browser that jsdom lacks, for component specs: a ResizeObserver
 * (ngx-echarts watches the chart's size) and a 2D canvas context that can measure text (ECharts
 * lays out labels with it even when it draws SVG). Text is measured as 7 px a character.
 */
export function stubChartEnvironment(): void {
  if (!('ResizeObserver' in globalThis)) {
    globalThis.ResizeObserver = class {
      observe(): void {}
      unobserve(): void {}
      disconnect(): void {}
    } as unknown as typeof ResizeObserver;
  }
  const context = {
    measureText: (text: string) => ({ width: text.length * 7, actualBoundingBoxAscent: 9, actualBoundingBoxDescent: 3 }),
    fillText() {}, strokeText() {}, fillRect() {}, clearRect() {}, save() {}, restore() {}, scale() {}, translate() {},
    beginPath() {}, closePath() {}, moveTo() {}, lineTo() {}, arc() {}, rect() {}, fill() {}, stroke() {}, setLineDash() {},
    drawImage() {}, createLinearGradient: () => ({ addColorStop() {} }), createPattern: () => ({}), font: '',
  };
  HTMLCanvasElement.prototype.getContext = (() => context) as unknown as typeof HTMLCanvasElement.prototype.getContext;
}

/**
 * Draws an option with ECharts' server-side SVG renderer (the echarts build must have the chart
 * types registered) and returns the SVG text: a spec checks that the option really draws, and
 * what words it writes. The chart is disposed before returning.
 */
export function renderSvg(option: EChartsCoreOption, width = 640, height = 400): string {
  const chart = echarts.init(null as unknown as HTMLElement, null, { renderer: 'svg', ssr: true, width, height });
  try {
    chart.setOption(option);
    return chart.renderToSVGString();
  } finally {
    chart.dispose();
  }
}
