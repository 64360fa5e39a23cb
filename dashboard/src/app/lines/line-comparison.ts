import { ChangeDetectionStrategy, Component, ElementRef, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ActivatedRoute, Router } from '@angular/router';
import { provideEchartsCore } from 'ngx-echarts';
import { map } from 'rxjs';
import { BreedsApi } from '../breeds/breeds-api';
import { CautionNote } from '../pairing/caution-note';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { LoadError } from '../status/load-error';
import { buildLineBoxplotOptions, formatMeasure } from './lines-chart-options';
import { LinesApi } from './lines-api';
import { LINE_SORT, lineCsv, lineRows, medianIntervalText } from './lines-table';
import { linesApiParams, linesParams, linesViewFrom, MIN_N_CHOICES, type LinesView } from './lines-view';
import { PanelChart } from './panel-chart';
import { readPanelTheme, type PanelTheme } from './panel-theme';
import { sortRows, type RowOrder } from './sort-rows';

/** Line comparison: the herd's lines (or the rabbitries the user may see) side by side as box plots of each measure. */
@Component({
  selector: 'kl-line-comparison',
  templateUrl: './line-comparison.html',
  styleUrl: './line-comparison.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    MatButtonModule,
    MatButtonToggleModule,
    MatFormFieldModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
    MatSortModule,
    MatTableModule,
    CautionNote,
    LoadError,
    PanelChart,
  ],
  providers: [provideEchartsCore({ echarts: () => import('./lines-echarts').then((m) => m.echarts) })],
})
export class LineComparison {
  private readonly api = inject(LinesApi);
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);
  private readonly host: HTMLElement = inject(ElementRef).nativeElement;

  readonly rabbitryId = input.required<string>();

  protected readonly view = toSignal(this.route.queryParams.pipe(map((p) => linesViewFrom(p))), {
    initialValue: linesViewFrom(this.route.snapshot.queryParams),
  });
  protected readonly report = this.api.report(this.rabbitryId, () => linesApiParams(this.view()));
  protected readonly data = computed(() => (this.report.hasValue() ? this.report.value() : undefined));
  /** The report's cautions (the API's breeding cautions), kept in view while the next filters load. */
  protected readonly cautions = linkedSignal<readonly string[] | undefined, readonly string[]>({
    source: () => this.data()?.cautions,
    computation: (next, previous) => next ?? previous?.value ?? [],
  });
  protected readonly breeds = inject(BreedsApi).list();
  protected readonly filtersSet = computed(() => ['breed', 'sex', 'from', 'to'].some((k) => this.view()[k] !== undefined));
  protected readonly minNChoices = MIN_N_CHOICES;
  protected readonly format = formatMeasure;
  protected readonly intervalText = medianIntervalText;

  /** The measures shown: the one asked for (when the report has it), else all. */
  protected readonly measures = computed(() => {
    const all = this.data()?.measures ?? [];
    const chosen = all.filter((m) => m.key === this.view().measure);
    return chosen.length ? chosen : all;
  });
  protected readonly single = computed(() => this.measures().length === 1);

  private theme: PanelTheme | null = null;
  private readonly themed = () => (this.theme ??= readPanelTheme(this.host));
  protected readonly background = computed(() => this.themed().surface);
  protected readonly charts = computed(() => {
    const r = this.data();
    if (!r) return [];
    return this.measures().map((measure) => ({
      measure,
      options: buildLineBoxplotOptions({ measure, groups: r.groups, theme: this.themed(), minN: this.view().minN }),
      groupsWithData: measure.groups.filter((g) => g.summary).length,
    }));
  });
  /** Boxes need room: a phone scrolls sideways past four or five groups. */
  protected readonly chartWidth = computed(() => 80 + (this.data()?.groups.length ?? 0) * 64);

  protected readonly order = signal<RowOrder>({ active: '', direction: '' });
  protected readonly rows = computed(() => sortRows(lineRows(this.measures(), this.data()?.groups ?? [], this.view().minN), this.order(), LINE_SORT));
  // One measure shown: its name is the chart's caption, not a column repeated on every row.
  protected readonly columns = computed(() => [...(this.single() ? [] : ['measure']), 'group', 'n', 'q1', 'median', 'medianInterval', 'q3', 'range', 'mean']);
  protected readonly noAnimals = computed(() => (this.data()?.groups.length ?? 0) === 0);

  protected setView(change: Partial<LinesView>): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: linesParams({ ...this.view(), ...change }) });
  }

  protected filter(key: 'breed' | 'sex' | 'from' | 'to', value: string | number | undefined): void {
    this.setView({ [key]: value === '' || value === 0 ? undefined : value });
  }

  protected dateFilter(key: 'from' | 'to', event: Event): void {
    this.filter(key, (event.target as HTMLInputElement).value || undefined);
  }

  protected clearFilters(): void {
    this.setView({ breed: undefined, sex: undefined, from: undefined, to: undefined });
  }

  protected sortBy(sort: Sort): void {
    this.order.set({ active: sort.active, direction: sort.direction });
  }

  protected fileStem(what: string): string {
    const r = this.data();
    return csvFileName(r?.scope.rabbitries[0]?.name, 'lines', what, r?.asOf).replace(/\.csv$/, '');
  }

  protected download(): void {
    downloadCsv(`${this.fileStem(this.view().groupBy === 'line' ? 'by line' : 'by rabbitry')}.csv`, this.rows(), lineCsv(this.view().minN));
  }
}
