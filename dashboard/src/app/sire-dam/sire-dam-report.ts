import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, ElementRef, computed, inject, input, linkedSignal, signal, viewChild } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import type { ECElementEvent } from 'echarts/core';
import { provideEchartsCore } from 'ngx-echarts';
import { map } from 'rxjs';
import type { ParentPlacement, PlacementReport } from '@shared/contracts/analytics';
import { BreedsApi } from '../breeds/breeds-api';
import { CautionsNote } from '../keepers/cautions-note';
import { readChartTheme } from '../keepers/chart-theme';
import { PanelChart } from '../keepers/panel-chart';
import type { SortDirection } from '../keepers/sort-rows';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { editsRecords, rabbitryRoleOf } from '../records/records-access';
import { Session } from '../session/session';
import { LoadError } from '../status/load-error';
import { SireDamApi } from './sire-dam-api';
import { PARENT_WORDS, SMALL_SAMPLE, buildSireDamOptions, isSmall, sireDamChartHeight } from './sire-dam-chart-options';
import { indexText, scoreText, shareText, sireDamCsvColumns, sortParents, type SireDamSortKey } from './sire-dam-table';
import { sireDamViewFrom, sireDamParams, withSireDamFilter, type SireDamView } from './sire-dam-view';

const CHART_ROWS = 30;

@Component({
  selector: 'kl-sire-dam-report',
  templateUrl: './sire-dam-report.html',
  styleUrl: './sire-dam-report.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    RouterLink, MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatInputModule, MatProgressBarModule,
    MatSelectModule, MatSortModule, MatTableModule, CautionsNote, LoadError, PanelChart,
  ],
  providers: [provideEchartsCore({ echarts: () => import('./sire-dam-echarts').then((m) => m.echarts) })],
})
export class SireDamReport {
  private readonly api = inject(SireDamApi);
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);
  private readonly session = inject(Session);
  private readonly host: HTMLElement = inject(ElementRef).nativeElement;
  private readonly chart = viewChild(PanelChart);

  readonly rabbitryId = input.required<string>();

  protected readonly view = toSignal(this.route.queryParams.pipe(map((p) => sireDamViewFrom(p))), {
    initialValue: sireDamViewFrom(this.route.snapshot.queryParams),
  });
  protected readonly report = this.api.placement(this.rabbitryId, this.view);
  protected readonly shown = linkedSignal<PlacementReport | undefined, PlacementReport | undefined>({
    source: () => (this.report.hasValue() ? this.report.value() : undefined),
    computation: (next, previous) => next ?? previous?.value,
  });

  protected readonly breeds = inject(BreedsApi).list();
  protected readonly varieties = computed(() => {
    const breeds = this.breeds.hasValue() ? this.breeds.value() : [];
    const chosen = breeds.filter((b) => this.view().breed === undefined || b.id === this.view().breed);
    return [...new Set(chosen.flatMap((b) => b.varieties))].sort((a, b) => a.localeCompare(b));
  });
  protected readonly canEdit = computed(() => editsRecords(rabbitryRoleOf(this.session.user(), this.rabbitryId())));
  protected readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), { initialValue: false });
  protected readonly showFilters = signal(false);

  private theme: ReturnType<typeof readChartTheme> | null = null;
  protected readonly options = computed(() => {
    const report = this.shown();
    return report ? buildSireDamOptions({ report, theme: (this.theme ??= readChartTheme(this.host)), maxRows: CHART_ROWS }) : {};
  });
  protected readonly chartRows = computed(() => Math.min(this.shown()?.parents.length ?? 0, CHART_ROWS));
  protected readonly chartHeight = computed(() => sireDamChartHeight(this.chartRows()));

  private readonly sort = signal<Sort>({ active: 'rank', direction: '' });
  protected readonly rows = computed(() => sortParents(this.shown()?.parents ?? [], this.sort().active as SireDamSortKey, this.sort().direction as SortDirection));
  protected readonly columns = ['rank', 'earId', 'entries', 'offspring', 'share', 'shrunk', 'index', 'score', 'legs'];

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

  protected dateFilter(key: 'from' | 'to', event: Event): void {
    this.filter(key, (event.target as HTMLInputElement).value || undefined);
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

  protected saveCsv(): void {
    const report = this.shown();
    if (!report) return;
    downloadCsv(csvFileName(PARENT_WORDS[report.parentKind], 'placement', report.asOf), this.rows(), sireDamCsvColumns(report));
  }

  protected savePng(): void {
    const report = this.shown();
    void this.chart()?.savePng(csvFileName(report ? PARENT_WORDS[report.parentKind] : 'parents', 'placement', report?.asOf).replace(/\.csv$/, '.png'));
  }

  private show(view: SireDamView): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: sireDamParams(view), replaceUrl: true });
  }
}
