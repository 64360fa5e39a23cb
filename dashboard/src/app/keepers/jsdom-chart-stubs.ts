import { TestBed } from '@angular/core/testing';

/**
 * Test helpers of the panels' component tests. What ECharts needs from a browser that jsdom lacks:
 * ResizeObserver (the directive watches its box) and a canvas context (ECharts measures text
 * with one even when it draws SVG). Plain assignments, so the file needs no test-runner types.
 */
export function stubBrowserForCharts(): void {
  globalThis.ResizeObserver ??= class {
    observe(): void {}
    unobserve(): void {}
    disconnect(): void {}
  } as unknown as typeof ResizeObserver;
  const measure = { measureText: (text: string) => ({ width: 7 * text.length }), font: '' };
  HTMLCanvasElement.prototype.getContext = (() => measure) as unknown as HTMLCanvasElement['getContext'];
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
