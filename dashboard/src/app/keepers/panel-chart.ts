import { ChangeDetectionStrategy, Component, ElementRef, inject, input, output } from '@angular/core';
import type { ECElementEvent, ECharts, EChartsCoreOption } from 'echarts/core';
import { NgxEchartsDirective } from 'ngx-echarts';
import { readChartTheme } from './chart-theme';

/**
 * One analysis chart: the ECharts directive (the panel provides its own `provideEchartsCore` with
 * only the chart types it draws) with a fixed height, clicks passed on, and a PNG of it on demand.
 * The option is bound as given: panels hand over a `computed`, so it is rebuilt only when its data changes.
 */
@Component({
  selector: 'kl-panel-chart',
  template: `<div echarts class="chart" role="img" [style.height.px]="height()" [options]="options()" (chartInit)="chart = $event" (chartClick)="pick.emit($event)"></div>`,
  styles: `
    .chart {
      width: 100%;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [NgxEchartsDirective],
})
export class PanelChart {
  readonly options = input.required<EChartsCoreOption>();
  readonly height = input(320);
  readonly pick = output<ECElementEvent>();

  private readonly host: HTMLElement = inject(ElementRef).nativeElement;
  protected chart: ECharts | undefined;

  /** Saves the chart as it is drawn now as a PNG file. */
  async savePng(fileName: string): Promise<void> {
    const { chartPng, downloadDataUrl } = await import('./chart-png');
    const width = Math.max(this.host.clientWidth, 360);
    const url = await chartPng(this.options(), width, this.height(), readChartTheme(this.host).surface);
    downloadDataUrl(fileName, url);
  }
}
