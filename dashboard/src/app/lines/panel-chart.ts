import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import type { ECElementEvent, ECharts, EChartsCoreOption } from 'echarts/core';
import { NGX_ECHARTS_CONFIG, NgxEchartsDirective } from 'ngx-echarts';
import { chartPngDataUrl, downloadDataUrl } from './chart-png';

/**
 * One chart of a panel: the ECharts drawing (SVG renderer, so its words are text in the page)
 * with a button that saves it as a PNG. The panel provides its own echarts build
 * (provideEchartsCore with only the chart types it draws) and binds an option built by a pure
 * function in a computed(), so the chart is set again only when its data changes.
 * `minWidth` lets a wide chart (a big heatmap) scroll sideways on a phone instead of squeezing.
 */
@Component({
  selector: 'kl-panel-chart',
  template: `
    <div class="scroller">
      <div
        echarts
        class="chart"
        role="img"
        [attr.aria-label]="label()"
        [style.height]="height()"
        [style.min-width.px]="minWidth()"
        [options]="options()"
        [initOpts]="initOpts"
        (chartInit)="chart = $event"
        (chartClick)="chartClick.emit($event)"
      ></div>
    </div>
    <div class="tools">
      <button mat-button type="button" (click)="savePng()" [disabled]="saving()">Save chart as PNG</button>
    </div>
  `,
  styles: `
    :host {
      display: block;
    }
    .scroller {
      overflow-x: auto;
    }
    .chart {
      width: 100%;
    }
    .tools {
      display: flex;
      justify-content: flex-end;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [NgxEchartsDirective, MatButtonModule],
})
export class PanelChart {
  readonly options = input.required<EChartsCoreOption>();
  /** What the chart shows, for screen readers; the table beside it holds the same numbers. */
  readonly label = input.required<string>();
  /** File name of the PNG, without extension. */
  readonly fileName = input.required<string>();
  readonly height = input('20rem');
  readonly minWidth = input(0);
  readonly background = input('#ffffff');
  readonly chartClick = output<ECElementEvent>();

  private readonly config = inject(NGX_ECHARTS_CONFIG);
  protected readonly initOpts = { renderer: 'svg' };
  protected chart: ECharts | null = null;
  protected readonly saving = signal(false);

  protected async savePng(): Promise<void> {
    const chart = this.chart;
    if (!chart) return;
    this.saving.set(true);
    try {
      const echarts = typeof this.config.echarts === 'function' ? await this.config.echarts() : this.config.echarts;
      const url = await chartPngDataUrl({
        echarts, option: this.options(), width: chart.getWidth(), height: chart.getHeight(), background: this.background(),
      });
      downloadDataUrl(`${this.fileName()}.png`, url);
    } finally {
      this.saving.set(false);
    }
  }
}
