import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { NgxEchartsDirective, provideEchartsCore } from 'ngx-echarts';
import type { UnitSetting } from '@shared/units/weight';
import { injectChartTheme } from '../panels/chart-theme';
import { buildWeightChartOptions, type WeightChartInput } from './weight-chart-options';

@Component({
  selector: 'kl-weight-chart',
  template: `<div echarts class="chart" [options]="options()" role="img" [attr.aria-label]="label()"></div>`,
  styles: `
    .chart {
      height: 16rem;
      width: 100%;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [NgxEchartsDirective],
  // ECharts loads with the first chart, inside this lazy chunk, never with the app's first download.
  providers: [provideEchartsCore({ echarts: () => import('./weight-chart-echarts').then((m) => m.echarts) })],
})
export class WeightChart {
  readonly weights = input.required<WeightChartInput['weights']>();
  readonly birthDate = input<string | null>(null);
  readonly unit = input.required<UnitSetting>();
  readonly seniorLimits = input<WeightChartInput['seniorLimits']>(null);

  // The panels' theme: plain colours for the scheme in force, the weighings in the first series hue.
  private readonly theme = injectChartTheme();
  protected readonly options = computed(() => {
    const { font, text, muted, grid, risk, reference, series } = this.theme();
    return buildWeightChartOptions({
      weights: this.weights(),
      birthDate: this.birthDate(),
      unit: this.unit(),
      seniorLimits: this.seniorLimits(),
      theme: { font, text, muted, grid, risk, ideal: reference, line: series[0]! },
    });
  });
  protected readonly label = computed(() => {
    const n = this.weights().length;
    return `Chart of ${n} weighing${n === 1 ? '' : 's'} against ${this.birthDate() ? 'age' : 'date'}; the table lists the same values.`;
  });
}
