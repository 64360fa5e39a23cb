import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { provideEchartsCore } from 'ngx-echarts';
import { LINE_CAUTIONS } from '@shared/domain/cautions';
import { BreedsApi } from '../breeds/breeds-api';
import { CautionsNote } from '../panels/cautions-note';
import { DateRangeFilter } from '../panels/date-range-filter';
import { injectChartTheme } from '../panels/chart-theme';
import { PanelChart } from '../panels/panel-chart';
import { lastValue, routedView } from '../panels/routed-view';
import { SexFilter } from '../panels/sex-filter';
import { sortRows, type RowOrder } from '../panels/sort-rows';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { LoadError } from '../status/load-error';
import { buildLineBoxplotOptions, formatMeasure } from './lines-chart-options';
import { LinesApi } from './lines-api';
import { LINE_SORT, lineCsv, lineRows, medianIntervalText } from './lines-table';
import { linesApiParams, linesParams, linesViewFrom, MIN_N_CHOICES, type LinesView } from './lines-view';

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
    MatProgressBarModule,
    MatSelectModule,
    MatSortModule,
    MatTableModule,
    CautionsNote,
    LoadError,
    PanelChart,
    SexFilter,
    DateRangeFilter,
  ],
  providers: [provideEchartsCore({ echarts: () => import('./lines-echarts').then((m) => m.echarts) })],
})
export class LineComparison {
  private readonly api = inject(LinesApi);

  readonly rabbitryId = input.required<string>();

  private readonly address = routedView(linesViewFrom, linesParams);
  protected readonly view = this.address.view;
  protected readonly report = this.api.report(this.rabbitryId, () => linesApiParams(this.view()));
  protected readonly data = lastValue(this.report);
  protected readonly cautions = LINE_CAUTIONS;
  protected readonly breeds = inject(BreedsApi).list();
  protected readonly filtersSet = computed(() => (['breed', 'sex', 'from', 'to'] as const).some((k) => this.view()[k] !== undefined));
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

  private readonly themed = injectChartTheme();
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
    this.address.show({ ...this.view(), ...change });
  }

  protected filter(key: 'breed' | 'sex' | 'from' | 'to', value: string | number | undefined): void {
    this.setView({ [key]: value === '' || value === 0 ? undefined : value });
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
