import { ChangeDetectionStrategy, Component, ElementRef, computed, inject, input } from '@angular/core';
import { NgxEchartsDirective, provideEchartsCore } from 'ngx-echarts';
import type { UnitSetting } from '@shared/units/weight';
import { buildWeightChartOptions, type ChartTheme, type WeightChartInput } from './weight-chart-options';

/** The page's theme colours and font, read once from the Material system variables. */
function themeOf(element: HTMLElement): ChartTheme {
  const style = getComputedStyle(element);
  const v = (name: string, fallback: string) => style.getPropertyValue(name).trim() || fallback;
  return {
    font: style.fontFamily || 'sans-serif',
    text: v('--mat-sys-on-surface', '#1b1b1f'),
    muted: v('--mat-sys-on-surface-variant', '#46464f'),
    line: v('--mat-sys-primary', '#34518c'),
    grid: v('--mat-sys-outline-variant', '#c6c5d0'),
    risk: v('--mat-sys-error', '#ba1a1a'),
    ideal: v('--mat-sys-tertiary', '#6b5778'),
  };
}

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

  private readonly host: HTMLElement = inject(ElementRef).nativeElement;
  // Read when the chart is first drawn: only an element in the page inherits the theme's variables.
  private theme: ChartTheme | null = null;
  protected readonly options = computed(() =>
    buildWeightChartOptions({
      weights: this.weights(),
      birthDate: this.birthDate(),
      unit: this.unit(),
      seniorLimits: this.seniorLimits(),
      theme: (this.theme ??= themeOf(this.host)),
    }),
  );
  protected readonly label = computed(() => {
    const n = this.weights().length;
    return `Chart of ${n} weighing${n === 1 ? '' : 's'} against ${this.birthDate() ? 'age' : 'date'}; the table lists the same values.`;
  });
}
