import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, ElementRef, computed, inject, input, linkedSignal, signal, viewChild } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatAutocompleteModule, type MatAutocompleteSelectedEvent } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { MatChipsModule } from '@angular/material/chips';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { provideEchartsCore } from 'ngx-echarts';
import { map } from 'rxjs';
import type { GrowthReport } from '@shared/contracts/analytics';
import type { HerdRow } from '@shared/contracts/animals';
import type { Sex } from '@shared/domain/terms';
import { formatWeight } from '@shared/units/weight';
import { BreedsApi } from '../breeds/breeds-api';
import { CautionsNote } from '../keepers/cautions-note';
import { readChartTheme } from '../keepers/chart-theme';
import { PanelChart } from '../keepers/panel-chart';
import type { SortDirection } from '../keepers/sort-rows';
import { LittersApi } from '../litters/litters-api';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { editsRecords, rabbitryRoleOf } from '../records/records-access';
import { Session } from '../session/session';
import { LoadError } from '../status/load-error';
import { GrowthApi } from './growth-api';
import { buildGrowthOptions, growthChartWeeks } from './growth-chart-options';
import {
  ageText, bandCsvColumns, centileKeys, centileLabel, centileText, projectionText, sortWeighings, weighingCsvColumns, weighingRows, type WeighingSortKey,
} from './growth-table';
import { MAX_CHOSEN, growthParams, growthViewFrom, referenceFor, withAnimal, withoutAnimal, type GrowthView } from './growth-view';

@Component({
  selector: 'kl-growth-curves',
  templateUrl: './growth-curves.html',
  styleUrl: './growth-curves.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    RouterLink, MatAutocompleteModule, MatButtonModule, MatChipsModule, MatFormFieldModule, MatInputModule, MatProgressBarModule,
    MatSelectModule, MatSlideToggleModule, MatSortModule, MatTableModule, CautionsNote, LoadError, PanelChart,
  ],
  providers: [provideEchartsCore({ echarts: () => import('./growth-echarts').then((m) => m.echarts) })],
})
export class GrowthCurves {
  private readonly api = inject(GrowthApi);
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);
  private readonly session = inject(Session);
  private readonly host: HTMLElement = inject(ElementRef).nativeElement;
  private readonly chart = viewChild(PanelChart);

  readonly rabbitryId = input.required<string>();

  protected readonly view = toSignal(this.route.queryParams.pipe(map((p) => growthViewFrom(p))), {
    initialValue: growthViewFrom(this.route.snapshot.queryParams),
  });
  protected readonly report = this.api.growth(this.rabbitryId, this.view);
  protected readonly shown = linkedSignal<GrowthReport | undefined, GrowthReport | undefined>({
    source: () => (this.report.hasValue() ? this.report.value() : undefined),
    computation: (next, previous) => next ?? previous?.value,
  });
  protected readonly unit = computed(() => this.session.user()?.weightUnit ?? 'lb-oz');
  protected readonly canEdit = computed(() => editsRecords(rabbitryRoleOf(this.session.user(), this.rabbitryId())));

  protected readonly breeds = inject(BreedsApi).list();
  private readonly litterList = inject(LittersApi).list(this.rabbitryId);
  protected readonly litters = computed(() =>
    (this.litterList.hasValue() ? this.litterList.value().litters : [])
      .filter((l) => l.kitsRecorded > 0)
      .sort((a, b) => (b.kindledOn ?? b.bredOn ?? '').localeCompare(a.kindledOn ?? a.bredOn ?? '')),
  );

  protected readonly search = signal('');
  protected readonly matches = this.api.animalsMatching(this.rabbitryId, this.search);

  protected readonly reference = computed(() => {
    const r = this.shown();
    return r ? referenceFor(r, this.view()) : null;
  });
  protected readonly animals = computed(() => this.shown()?.animals ?? []);

  private theme: ReturnType<typeof readChartTheme> | null = null;
  protected readonly options = computed(() => {
    const r = this.shown();
    return buildGrowthOptions({
      reference: this.reference(), animals: this.animals(), seniorAgeDays: r?.seniorAgeDays ?? 365, unit: this.unit(), maxWeeks: this.maxWeeks(),
      theme: (this.theme ??= readChartTheme(this.host)),
    });
  });
  /** The chart runs as far as the reference reaches (at least 36 weeks). */
  protected readonly maxWeeks = computed(() => growthChartWeeks(this.reference()));
  protected readonly laterWeighings = computed(() => this.animals().reduce((n, a) => n + a.weighings.filter((w) => w.ageDays > this.maxWeeks() * 7).length, 0));

  private readonly sort = signal<Sort>({ active: 'earId', direction: '' });
  private readonly allWeighings = computed(() => sortWeighings(weighingRows(this.animals()), this.sort().active as WeighingSortKey, this.sort().direction as SortDirection));
  /** Adult weighings of an old animal would bury the growing ones: they wait behind a button (the CSV has all). */
  protected readonly showLater = signal(false);
  protected readonly weighings = computed(() =>
    this.showLater() ? this.allWeighings() : this.allWeighings().filter((w) => w.ageDays <= this.maxWeeks() * 7),
  );
  protected readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), { initialValue: false });
  protected readonly showFilters = signal(false);
  protected readonly weighingColumns = ['earId', 'weighedOn', 'ageDays', 'grams', 'percentile'];
  protected readonly bandColumns = ['weeks', 'n', ...centileKeys];
  protected readonly shownBands = computed(() => (this.reference()?.bands ?? []).filter((b) => b.centiles !== null));

  protected readonly maxChosen = MAX_CHOSEN;
  protected readonly centileKeys = centileKeys;
  protected readonly centileLabel = centileLabel;
  protected readonly ageText = ageText;
  protected readonly centileText = centileText;
  protected readonly projectionText = projectionText;
  protected weight(grams: number | null): string {
    return grams === null ? '—' : formatWeight(Math.max(0, grams), this.unit());
  }

  /**
   * Bands are always of one breed and sex: both go to the API together, so it adds that
   * reference even when chosen animals are of another.
   */
  protected drawBands(breed: number | undefined, sex: Sex | undefined): void {
    this.show({ ...this.view(), breed, sex });
  }

  protected filter<K extends keyof GrowthView>(key: K, value: GrowthView[K] | undefined): void {
    this.show({ ...this.view(), [key]: value ?? undefined });
  }

  protected add(event: MatAutocompleteSelectedEvent): void {
    const row = event.option.value as HerdRow;
    this.search.set('');
    this.show(withAnimal(this.view(), row.id));
  }

  protected remove(id: number): void {
    this.show(withoutAnimal(this.view(), id));
  }

  protected clearAnimals(): void {
    this.show({ ...this.view(), animals: undefined, litter: undefined });
  }

  protected typed(event: Event): void {
    this.search.set((event.target as HTMLInputElement).value);
  }

  protected sortBy(sort: Sort): void {
    this.sort.set(sort);
  }

  protected saveCsv(): void {
    const r = this.shown();
    if (r) downloadCsv(csvFileName('weighings with centiles', r.asOf), this.allWeighings(), weighingCsvColumns(this.unit()));
  }

  protected saveBandsCsv(): void {
    const ref = this.reference();
    if (ref) downloadCsv(csvFileName('growth bands', ref.breed.name, ref.sex), ref.bands, bandCsvColumns(ref));
  }

  protected savePng(): void {
    const ref = this.reference();
    void this.chart()?.savePng(csvFileName('growth curves', ref?.breed.name, ref?.sex).replace(/\.csv$/, '.png'));
  }

  private show(view: GrowthView): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: growthParams(view), replaceUrl: true });
  }
}
