import { ChangeDetectionStrategy, Component, ElementRef, computed, inject, input, linkedSignal, signal, viewChild } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ActivatedRoute, Router } from '@angular/router';
import type { ECElementEvent } from 'echarts/core';
import { provideEchartsCore } from 'ngx-echarts';
import { map } from 'rxjs';
import type { HeritabilityEstimate, HeritabilityReport } from '@shared/contracts/analytics';
import { BreedsApi } from '../breeds/breeds-api';
import { CautionsNote } from '../keepers/cautions-note';
import { readChartTheme } from '../keepers/chart-theme';
import { PanelChart } from '../keepers/panel-chart';
import { sortRows, type SortDirection } from '../keepers/sort-rows';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { LoadError } from '../status/load-error';
import { METHOD_LABELS, buildEstimatesOptions, buildInheritanceScatterOptions, estimatesOf } from './trait-chart-options';
import { traitChoices } from './trait-choices';
import { estimateCsvColumns, intervalText, pointCsvColumns, sampleText, withinRange } from './trait-table';
import { traitParams, traitViewFrom, type TraitView } from './trait-view';
import { TraitsApi } from './traits-api';

@Component({
  selector: 'kl-trait-inheritance',
  templateUrl: './trait-inheritance.html',
  styleUrl: './trait-inheritance.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    MatButtonModule, MatFormFieldModule, MatProgressBarModule, MatSelectModule, MatSlideToggleModule, MatSortModule, MatTableModule,
    CautionsNote, LoadError, PanelChart,
  ],
  providers: [provideEchartsCore({ echarts: () => import('./trait-echarts').then((m) => m.echarts) })],
})
export class TraitInheritance {
  private readonly api = inject(TraitsApi);
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);
  private readonly host: HTMLElement = inject(ElementRef).nativeElement;
  private readonly scatterChart = viewChild<PanelChart>('scatter');

  readonly rabbitryId = input.required<string>();

  protected readonly view = toSignal(this.route.queryParams.pipe(map((p) => traitViewFrom(p))), {
    initialValue: traitViewFrom(this.route.snapshot.queryParams),
  });
  protected readonly report = this.api.heritability(this.rabbitryId, this.view);
  protected readonly shown = linkedSignal<HeritabilityReport | undefined, HeritabilityReport | undefined>({
    source: () => (this.report.hasValue() ? this.report.value() : undefined),
    computation: (next, previous) => next ?? previous?.value,
  });

  private readonly breeds = inject(BreedsApi).list();
  protected readonly traits = computed(() => traitChoices(this.breeds.hasValue() ? this.breeds.value() : []));

  private theme: ReturnType<typeof readChartTheme> | null = null;
  private readonly chartTheme = () => (this.theme ??= readChartTheme(this.host));
  protected readonly scatterOptions = computed(() => {
    const r = this.shown();
    return r ? buildInheritanceScatterOptions(r, this.chartTheme()) : {};
  });
  protected readonly estimateOptions = computed(() => {
    const r = this.shown();
    return r ? buildEstimatesOptions(r, this.chartTheme()) : {};
  });
  protected readonly estimates = computed(() => (this.shown() ? estimatesOf(this.shown()!) : []));
  protected readonly estimatesHeight = computed(() => 110 + 40 * Math.max(this.estimates().length, 1));

  private readonly sort = signal<Sort>({ active: 'method', direction: '' });
  protected readonly rows = computed(() => {
    const key = this.sort().active as 'method' | 'h2' | 'se' | 'n';
    const value = (e: HeritabilityEstimate) => (key === 'method' ? METHOD_LABELS[e.method] : e[key]);
    return sortRows(this.estimates(), value, this.sort().direction as SortDirection);
  });
  protected readonly columns = ['method', 'h2', 'se', 'interval', 'n', 'slope', 'range'];

  protected readonly methodLabels = METHOD_LABELS;
  protected lowerFirst(text: string): string {
    return text.replace(/\.$/, '').replace(/^./, (c) => c.toLowerCase());
  }
  protected methodOf(e: HeritabilityEstimate): string {
    return METHOD_LABELS[e.method];
  }
  protected readonly sampleText = sampleText;
  protected readonly intervalText = intervalText;
  protected readonly withinRange = withinRange;

  protected chooseTrait(trait: string): void {
    this.show({ ...this.view(), trait });
  }

  protected pool(all: boolean): void {
    this.show({ ...this.view(), scope: all ? 'all' : 'rabbitry' });
  }

  protected sortBy(sort: Sort): void {
    this.sort.set(sort);
  }

  /** A point opens its offspring in its own rabbitry (pooled points come from every rabbitry the caller may see). */
  protected open(event: ECElementEvent): void {
    const r = this.shown();
    if (!r || event.seriesName !== 'Offspring') return;
    const point = r.scatter.points[event.dataIndex];
    if (point) void this.router.navigate(['/r', point.rabbitryId, 'animals', point.animalId]);
  }

  protected saveCsv(): void {
    const r = this.shown();
    if (r) downloadCsv(csvFileName('heritability', r.trait.label, r.asOf), this.rows(), estimateCsvColumns(r));
  }

  protected savePointsCsv(): void {
    const r = this.shown();
    if (r) downloadCsv(csvFileName('offspring and midparent', r.trait.label, r.asOf), r.scatter.points, pointCsvColumns(r));
  }

  protected savePng(): void {
    const r = this.shown();
    void this.scatterChart()?.savePng(csvFileName('offspring and midparent', r?.trait.label, r?.asOf).replace(/\.csv$/, '.png'));
  }

  private show(view: TraitView): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: traitParams(view), replaceUrl: true });
  }
}
