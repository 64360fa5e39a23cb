import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
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
import { RouterLink } from '@angular/router';
import { provideEchartsCore } from 'ngx-echarts';
import type { HerdRow } from '@shared/contracts/animals';
import { GROWTH_CAUTIONS } from '@shared/domain/cautions';
import type { Sex } from '@shared/domain/terms';
import { formatWeight } from '@shared/units/weight';
import { BreedsApi } from '../breeds/breeds-api';
import { LittersApi } from '../litters/litters-api';
import { CautionsNote } from '../panels/cautions-note';
import { injectChartTheme } from '../panels/chart-theme';
import { PHONE_WIDTH, mediaMatches } from '../panels/media-query';
import { PanelChart } from '../panels/panel-chart';
import { lastValue, routedView } from '../panels/routed-view';
import { sortRows, type RowOrder } from '../panels/sort-rows';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { editsRecords, rabbitryRoleOf } from '../records/records-access';
import { Session } from '../session/session';
import { LoadError } from '../status/load-error';
import { GrowthApi } from './growth-api';
import { buildGrowthOptions, growthChartWeeks } from './growth-chart-options';
import {
  WEIGHING_SORT, ageText, bandCsvColumns, centileKeys, centileLabel, centileText, projectionText, weighingCsvColumns, weighingRows,
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
  private readonly session = inject(Session);

  readonly rabbitryId = input.required<string>();

  private readonly address = routedView(growthViewFrom, growthParams);
  protected readonly view = this.address.view;
  protected readonly report = this.api.growth(this.rabbitryId, this.view);
  protected readonly shown = lastValue(this.report);
  protected readonly cautions = GROWTH_CAUTIONS;
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

  private readonly theme = injectChartTheme();
  protected readonly options = computed(() => {
    const r = this.shown();
    return buildGrowthOptions({
      reference: this.reference(), animals: this.animals(), seniorAgeDays: r?.seniorAgeDays ?? 365, unit: this.unit(), maxWeeks: this.maxWeeks(),
      theme: this.theme(),
      narrow: this.isPhone(),
    });
  });
  /** The chart runs as far as the reference reaches (at least 36 weeks). */
  protected readonly maxWeeks = computed(() => growthChartWeeks(this.reference()));
  protected readonly laterWeighings = computed(() => this.animals().reduce((n, a) => n + a.weighings.filter((w) => w.ageDays > this.maxWeeks() * 7).length, 0));

  private readonly sort = signal<RowOrder>({ active: 'earId', direction: '' });
  private readonly allWeighings = computed(() => sortRows(weighingRows(this.animals()), this.sort(), WEIGHING_SORT));
  /** Adult weighings of an old animal would bury the growing ones: they wait behind a button (the CSV has all). */
  protected readonly showLater = signal(false);
  protected readonly weighings = computed(() =>
    this.showLater() ? this.allWeighings() : this.allWeighings().filter((w) => w.ageDays <= this.maxWeeks() * 7),
  );
  protected readonly isPhone = mediaMatches(PHONE_WIDTH, false);
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

  protected readonly fileStem = computed(() => {
    const ref = this.reference();
    return csvFileName('growth curves', ref?.breed.name, ref?.sex).replace(/\.csv$/, '');
  });

  private show(view: GrowthView): void {
    this.address.show(view);
  }
}
