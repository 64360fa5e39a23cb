import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { Router } from '@angular/router';
import type { ECElementEvent } from 'echarts/core';
import { provideEchartsCore } from 'ngx-echarts';
import type { HeritabilityEstimate } from '@shared/contracts/analytics';
import { SELECTION_CAUTIONS } from '@shared/domain/cautions';
import { BreedsApi } from '../breeds/breeds-api';
import { CautionsNote } from '../panels/cautions-note';
import { injectChartTheme } from '../panels/chart-theme';
import { PanelChart } from '../panels/panel-chart';
import { lastValue, routedView } from '../panels/routed-view';
import { sortRows, type RowOrder, type SortKeys } from '../panels/sort-rows';
import { traitChoices } from '../panels/trait-choices';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { LoadError } from '../status/load-error';
import { METHOD_LABELS, buildEstimatesOptions, buildInheritanceScatterOptions, estimatesOf } from './trait-chart-options';
import { estimateCsvColumns, intervalText, pointCsvColumns, sampleText, withinRange } from './trait-table';
import { traitParams, traitViewFrom, type TraitView } from './trait-view';
import { TraitsApi } from './traits-api';

const ESTIMATE_SORT: SortKeys<HeritabilityEstimate> = {
  method: (e) => METHOD_LABELS[e.method],
  h2: (e) => e.h2,
  se: (e) => e.se,
  n: (e) => e.n,
};

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
  private readonly router = inject(Router);

  readonly rabbitryId = input.required<string>();

  private readonly address = routedView(traitViewFrom, traitParams);
  protected readonly view = this.address.view;
  protected readonly report = this.api.heritability(this.rabbitryId, this.view);
  protected readonly shown = lastValue(this.report);
  protected readonly cautions = SELECTION_CAUTIONS;

  private readonly breeds = inject(BreedsApi).list();
  protected readonly traits = computed(() => traitChoices(this.breeds.hasValue() ? this.breeds.value() : []));

  private readonly chartTheme = injectChartTheme();
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

  private readonly sort = signal<RowOrder>({ active: 'method', direction: '' });
  protected readonly rows = computed(() => sortRows(this.estimates(), this.sort(), ESTIMATE_SORT));
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
    if (r) downloadCsv(`${this.fileStem('heritability')}.csv`, this.rows(), estimateCsvColumns(r));
  }

  protected savePointsCsv(): void {
    const r = this.shown();
    if (r) downloadCsv(`${this.fileStem('offspring and midparent')}.csv`, r.scatter.points, pointCsvColumns(r));
  }

  protected fileStem(what: string): string {
    const r = this.shown();
    return csvFileName(what, r?.trait.label, r?.asOf).replace(/\.csv$/, '');
  }

  private show(view: TraitView): void {
    this.address.show(view);
  }
}
