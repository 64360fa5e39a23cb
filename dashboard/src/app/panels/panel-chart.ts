import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import type { ECElementEvent, ECharts, EChartsCoreOption } from 'echarts/core';
import { NGX_ECHARTS_CONFIG, NgxEchartsDirective } from 'ngx-echarts';
import { downloadUrl } from '../records/csv-download';
import { injectChartTheme } from './chart-theme';

/**
 * One chart of a panel: the ECharts drawing (SVG renderer, so its words are text in the page)
 * with a button that saves it as a PNG. The panel provides its own echarts build
 * (provideEchartsCore with only the chart types it draws) and binds an option built by a pure
 * function in a computed(), so the chart is set again only when its data changes.
 * `minWidth` lets a wide chart (a big heatmap, many boxes) scroll sideways on a phone instead of squeezing.
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
        [style.height]="cssHeight()"
        [style.min-width.px]="minWidth()"
        [options]="options()"
        [initOpts]="initOpts"
        (chartInit)="chartReady($event)"
        (chartClick)="chartClick.emit($event)"
      ></div>
    </div>
    <div class="tools">
      <button mat-button type="button" (click)="savePng()" [disabled]="!drawn() || saving()">Save chart as PNG</button>
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
  /** Pixels, or any CSS length. */
  readonly height = input<number | string>('20rem');
  readonly minWidth = input(0);
  readonly chartClick = output<ECElementEvent>();

  private readonly config = inject(NGX_ECHARTS_CONFIG);
  private readonly theme = injectChartTheme();
  protected readonly cssHeight = computed(() => (typeof this.height() === 'number' ? `${this.height()}px` : String(this.height())));
  protected readonly initOpts = { renderer: 'svg' };
  protected readonly drawn = signal(false);
  protected readonly saving = signal(false);
  private chart: ECharts | null = null;

  protected chartReady(chart: ECharts): void {
    this.chart = chart;
    this.drawn.set(true);
  }

  /** The chart as drawn now, once more off screen by the canvas renderer, at its size on the page. */
  protected async savePng(): Promise<void> {
    const chart = this.chart;
    if (!chart) return;
    this.saving.set(true);
    try {
      const [{ chartPngDataUrl }, echarts] = await Promise.all([
        import('./chart-png'),
        typeof this.config.echarts === 'function' ? this.config.echarts() : this.config.echarts,
      ]);
      const url = await chartPngDataUrl({
        echarts, option: this.options(), width: chart.getWidth(), height: chart.getHeight(), background: this.theme().surface,
      });
      downloadUrl(`${this.fileName()}.png`, url);
    } finally {
      this.saving.set(false);
    }
  }
}
