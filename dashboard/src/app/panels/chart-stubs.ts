import { TestBed } from '@angular/core/testing';
import type { EChartsCoreOption } from 'echarts/core';
import * as echarts from 'echarts/core';

/**
 * What ECharts needs of a browser that jsdom lacks, for component specs: a ResizeObserver
 * (ngx-echarts watches the chart's size) and a 2D canvas context that can measure text (ECharts
 * lays out labels with it even when it draws SVG). Text is measured as 7 px a character. Plain
 * assignments, so the file needs no test-runner types.
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

/**
 * Lets signals, effects, the router and resolved responses run their course. (`whenStable`
 * would wait for requests still open in the testing backend, which a test flushes itself.)
 */
export async function settle(): Promise<void> {
  for (let i = 0; i < 3; i++) {
    TestBed.tick();
    await new Promise((resolve) => setTimeout(resolve, 0));
  }
}
