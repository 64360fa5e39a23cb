import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { Router, RouterLink } from '@angular/router';
import type { ECElementEvent } from 'echarts/core';
import { provideEchartsCore } from 'ngx-echarts';
import type { ParentPlacement } from '@shared/contracts/analytics';
import { SELECTION_CAUTIONS } from '@shared/domain/cautions';
import { BreedsApi } from '../breeds/breeds-api';
import { CautionsNote } from '../panels/cautions-note';
import { DateRangeFilter } from '../panels/date-range-filter';
import { injectChartTheme } from '../panels/chart-theme';
import { PHONE_WIDTH, mediaMatches } from '../panels/media-query';
import { PanelChart } from '../panels/panel-chart';
import { lastValue, routedView } from '../panels/routed-view';
import { SexFilter } from '../panels/sex-filter';
import { sortRows, type RowOrder } from '../panels/sort-rows';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { editsRecords, rabbitryRoleOf } from '../records/records-access';
import { Session } from '../session/session';
import { LoadError } from '../status/load-error';
import { SireDamApi } from './sire-dam-api';
import { PARENT_WORDS, SMALL_SAMPLE, buildSireDamOptions, isSmall, sireDamChartHeight } from './sire-dam-chart-options';
import { PARENT_SORT, indexText, scoreText, shareText, sireDamCsvColumns } from './sire-dam-table';
import { sireDamViewFrom, sireDamParams, withSireDamFilter, type SireDamView } from './sire-dam-view';

const CHART_ROWS = 30;

@Component({
  selector: 'kl-sire-dam-report',
  templateUrl: './sire-dam-report.html',
  styleUrl: './sire-dam-report.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    RouterLink, MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatInputModule, MatProgressBarModule,
    MatSelectModule, MatSortModule, MatTableModule, CautionsNote, LoadError, PanelChart, SexFilter, DateRangeFilter,
  ],
  providers: [provideEchartsCore({ echarts: () => import('./sire-dam-echarts').then((m) => m.echarts) })],
})
export class SireDamReport {
  private readonly api = inject(SireDamApi);
  private readonly router = inject(Router);
  private readonly session = inject(Session);

  readonly rabbitryId = input.required<string>();

  private readonly address = routedView(sireDamViewFrom, sireDamParams);
  protected readonly view = this.address.view;
  protected readonly report = this.api.placement(this.rabbitryId, this.view);
  protected readonly shown = lastValue(this.report);
  protected readonly cautions = SELECTION_CAUTIONS;

  protected readonly breeds = inject(BreedsApi).list();
  protected readonly varieties = computed(() => {
    const breeds = this.breeds.hasValue() ? this.breeds.value() : [];
    const chosen = breeds.filter((b) => this.view().breed === undefined || b.id === this.view().breed);
    return [...new Set(chosen.flatMap((b) => b.varieties))].sort((a, b) => a.localeCompare(b));
  });
  protected readonly canEdit = computed(() => editsRecords(rabbitryRoleOf(this.session.user(), this.rabbitryId())));
  protected readonly isPhone = mediaMatches(PHONE_WIDTH, false);
  protected readonly showFilters = signal(false);

  private readonly theme = injectChartTheme();
  protected readonly options = computed(() => {
    const report = this.shown();
    return report ? buildSireDamOptions({ report, theme: this.theme(), maxRows: CHART_ROWS }) : {};
  });
  protected readonly chartRows = computed(() => Math.min(this.shown()?.parents.length ?? 0, CHART_ROWS));
  protected readonly chartHeight = computed(() => sireDamChartHeight(this.chartRows()));

  private readonly sort = signal<RowOrder>({ active: 'rank', direction: '' });
  protected readonly rows = computed(() => sortRows(this.shown()?.parents ?? [], this.sort(), PARENT_SORT));
  // The share placed comes right after the parent: on a phone it stays in view.
  protected readonly columns = ['rank', 'earId', 'share', 'entries', 'offspring', 'shrunk', 'index', 'score', 'legs'];

  protected readonly parentWords = PARENT_WORDS;
  protected readonly smallSample = SMALL_SAMPLE;
  protected readonly chartLimit = CHART_ROWS;
  protected readonly ks = [1, 2, 3, 4, 5];
  protected readonly isSmall = isSmall;
  protected readonly shareText = shareText;
  protected readonly indexText = indexText;
  protected readonly scoreText = scoreText;

  protected filter<K extends keyof SireDamView>(key: K, value: SireDamView[K] | undefined): void {
    this.show(withSireDamFilter(this.view(), key, value));
  }

  protected minEntries(event: Event): void {
    const n = Number((event.target as HTMLInputElement).value);
    this.filter('minEntries', Number.isInteger(n) && n >= 1 ? n : 1);
  }

  protected clearFilters(): void {
    this.show(sireDamViewFrom({ parent: this.view().parent }));
  }

  protected sortBy(sort: Sort): void {
    this.sort.set(sort);
  }

  /** A click on a parent's bar, interval or marker opens that animal. */
  protected open(event: ECElementEvent): void {
    const p = this.shown()?.parents[event.dataIndex];
    if (p) void this.router.navigate(this.animalLink(p));
  }

  protected animalLink(p: ParentPlacement): (string | number)[] {
    return ['/r', p.parent.rabbitryId, 'animals', p.parent.id];
  }

  protected readonly fileStem = computed(() => {
    const report = this.shown();
    return csvFileName(report ? PARENT_WORDS[report.parentKind] : 'parents', 'placement', report?.asOf).replace(/\.csv$/, '');
  });

  protected saveCsv(): void {
    const report = this.shown();
    if (report) downloadCsv(`${this.fileStem()}.csv`, this.rows(), sireDamCsvColumns(report));
  }

  private show(view: SireDamView): void {
    this.address.show(view);
  }
}
