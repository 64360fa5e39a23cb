import { DecimalPipe, LowerCasePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, ElementRef, computed, effect, inject, input, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatAutocompleteModule, MatAutocompleteSelectedEvent } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import type { ECElementEvent } from 'echarts/core';
import { provideEchartsCore } from 'ngx-echarts';
import { debounceTime } from 'rxjs';
import type { HerdRow } from '@shared/contracts/animals';
import type { AnimalRef } from '@shared/contracts/analytics';
import { BREEDING_CAUTIONS } from '@shared/domain/cautions';
import { SEX_LABELS } from '@shared/domain/terms';
import { BreedsApi } from '../breeds/breeds-api';
import { CautionsNote } from '../panels/cautions-note';
import { injectChartTheme } from '../panels/chart-theme';
import { mediaMatches } from '../panels/media-query';
import { PanelChart } from '../panels/panel-chart';
import { lastValue, routedView } from '../panels/routed-view';
import { sortRows, type RowOrder } from '../panels/sort-rows';
import { traitChoices } from '../panels/trait-choices';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { describeAge } from '../records/describe-age';
import { LoadError } from '../status/load-error';
import { formatInbreeding, inbreedingBand, INBREEDING_BANDS } from './inbreeding-bands';
import { PairingApi } from './pairing-api';
import { animalLabel, buildPairingHeatmapOptions, heatmapSize, INBREEDING_RAMP } from './pairing-heatmap-options';
import { ancestorsText, CANDIDATE_CSV, CANDIDATE_SORT, formatAccuracy, formatEbv, GRID_CSV, gridCells } from './pairing-table';
import { PAIRING_LIMITS, pairingParams, pairingViewFrom, type PairingView } from './pairing-view';

/**
 * Pairing planner: a doe or buck of the herd, its possible mates ranked by the expected
 * inbreeding of the litter and the breeding values the two bring, and the does × bucks grid of
 * expected inbreeding with the common ancestors behind any cell.
 */
@Component({
  selector: 'kl-pairing-planner',
  templateUrl: './pairing-planner.html',
  styleUrl: './pairing-planner.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    DecimalPipe,
    LowerCasePipe,
    ReactiveFormsModule,
    RouterLink,
    MatAutocompleteModule,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
    MatSortModule,
    MatTableModule,
    CautionsNote,
    LoadError,
    PanelChart,
  ],
  providers: [provideEchartsCore({ echarts: () => import('./pairing-echarts').then((m) => m.echarts) })],
})
export class PairingPlanner {
  private readonly api = inject(PairingApi);
  private readonly host: HTMLElement = inject(ElementRef).nativeElement;

  readonly rabbitryId = input.required<string>();

  private readonly address = routedView(pairingViewFrom, pairingParams);
  protected readonly view = this.address.view;
  protected readonly report = this.api.pairings(this.rabbitryId, this.view);
  protected readonly breeds = inject(BreedsApi).list();

  protected readonly search = new FormControl<string | HerdRow>('', { nonNullable: true });
  private readonly searchText = signal('');
  protected readonly matches = this.api.animalsMatching(this.rabbitryId, this.searchText);

  protected readonly data = lastValue(this.report);
  protected readonly planned = computed(() => this.data()?.animal ?? null);
  protected readonly traits = computed(() =>
    traitChoices(this.breeds.hasValue() ? this.breeds.value() : [], this.planned()?.animal.breedId ?? null),
  );
  protected readonly traitLabel = computed(() => this.data()?.trait.label ?? this.traits().find((t) => t.key === this.view().trait)?.label ?? this.view().trait);
  protected readonly limits = PAIRING_LIMITS;
  protected readonly cautions = BREEDING_CAUTIONS;

  protected readonly order = signal<RowOrder>({ active: 'rank', direction: 'asc' });
  protected readonly candidates = computed(() => sortRows(this.data()?.candidates ?? [], this.order(), CANDIDATE_SORT));
  // The litter's inbreeding and value come right after the mate: on a phone they stay in view.
  protected readonly columns = ['rank', 'mate', 'inbreeding', 'offspringEbv', 'mateEbv', 'mateAccuracy', 'line', 'age', 'ancestors'];
  protected readonly mateWord = computed(() => (this.planned()?.animal.sex === 'buck' ? 'does' : 'bucks'));

  private readonly theme = injectChartTheme();
  private readonly wide = mediaMatches('(min-width: 700px)', true);
  protected readonly heatmap = computed(() => {
    const report = this.data();
    if (!report || report.matrix.does.length === 0 || report.matrix.bucks.length === 0) return null;
    const wide = this.wide();
    const options = buildPairingHeatmapOptions({ matrix: report.matrix, selectedId: report.animal.animal.id, theme: this.theme(), wide });
    return { options, size: heatmapSize(report.matrix.does.length, report.matrix.bucks.length, wide) };
  });
  protected readonly grid = computed(() => (this.data() ? gridCells(this.data()!.matrix) : []));
  protected readonly bandsText = () => INBREEDING_BANDS.map((b) => `${b.label}: ${b.likeness}`).join('; ');
  protected readonly bands = INBREEDING_BANDS.map((b) => ({ ...b, colour: INBREEDING_RAMP[b.index] }));

  /** The heatmap cell asked about, and what the API says of that pair. */
  protected readonly pair = signal<{ doe: AnimalRef; buck: AnimalRef; f: number } | null>(null);
  protected readonly relationship = this.api.relationship(this.rabbitryId, () => {
    const p = this.pair();
    return p ? { a: p.doe.id, b: p.buck.id } : null;
  });

  protected readonly label = animalLabel;
  protected readonly formatF = formatInbreeding;
  protected readonly band = inbreedingBand;
  protected readonly formatEbv = formatEbv;
  protected readonly formatAccuracy = formatAccuracy;
  protected readonly ancestorsText = ancestorsText;
  protected readonly sexLabel = SEX_LABELS;
  protected readonly ageOf = (birthDate: string | null) => describeAge(birthDate, this.data()?.asOf ?? '');

  constructor() {
    this.search.valueChanges
      .pipe(debounceTime(250), takeUntilDestroyed(inject(DestroyRef)))
      .subscribe((v) => this.searchText.set(typeof v === 'string' ? v : ''));
    // The box names the animal planned for, also when the page opens from a shared address.
    effect(() => {
      const a = this.planned()?.animal;
      if (a && typeof this.search.value === 'string' && this.search.value === '') this.search.setValue(animalLabel(a), { emitEvent: false });
    });
    // A new plan closes the cell that was asked about.
    effect(() => {
      this.view();
      this.pair.set(null);
    });
  }

  protected readonly showAnimal = (a: HerdRow | string | null) => (a === null ? '' : typeof a === 'string' ? a : animalLabel(a));

  protected choose(event: MatAutocompleteSelectedEvent): void {
    const a = event.option.value as HerdRow;
    this.show({ ...this.view(), animal: a.id });
  }

  protected planFor(animal: AnimalRef): void {
    this.search.setValue(animalLabel(animal), { emitEvent: false });
    this.show({ ...this.view(), animal: animal.id });
  }

  protected setTrait(trait: string): void {
    this.show({ ...this.view(), trait });
  }

  protected setLimit(limit: number): void {
    this.show({ ...this.view(), limit });
  }

  protected sortBy(sort: Sort): void {
    this.order.set({ active: sort.active, direction: sort.direction });
  }

  protected cellClicked(event: ECElementEvent): void {
    const cell = event.data as { doe?: AnimalRef; buck?: AnimalRef; value?: number[] } | undefined;
    if (cell?.doe && cell.buck && cell.value) this.choosePair(cell.doe, cell.buck, cell.value[2]!);
  }

  protected choosePair(doe: AnimalRef, buck: AnimalRef, f: number): void {
    this.pair.set({ doe, buck, f });
    // Chosen from the table below the grid, the explanation may be out of sight.
    this.host.querySelector('.pair')?.scrollIntoView?.({ block: 'nearest', behavior: 'smooth' });
  }

  protected fileStem(): string {
    return csvFileName(this.planned()?.animal.earId, 'pairings', this.data()?.asOf).replace(/\.csv$/, '');
  }

  protected downloadCandidates(): void {
    downloadCsv(csvFileName(this.planned()?.animal.earId, 'mates', this.data()?.asOf), this.candidates(), CANDIDATE_CSV);
  }

  protected downloadGrid(): void {
    downloadCsv(csvFileName('inbreeding grid', this.data()?.asOf), this.grid(), GRID_CSV);
  }

  private show(view: PairingView): void {
    this.address.show(view, true);
  }
}
