import { BreakpointObserver } from '@angular/cdk/layout';
import { DecimalPipe, LowerCasePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, ElementRef, computed, effect, inject, input, signal } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatAutocompleteModule, MatAutocompleteSelectedEvent } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import type { ECElementEvent } from 'echarts/core';
import { provideEchartsCore } from 'ngx-echarts';
import { debounceTime, map } from 'rxjs';
import type { HerdRow } from '@shared/contracts/animals';
import type { AnimalRef } from '@shared/contracts/analytics';
import { SEX_LABELS } from '@shared/domain/terms';
import { BreedsApi } from '../breeds/breeds-api';
import { PanelChart } from '../lines/panel-chart';
import { readPanelTheme, type PanelTheme } from '../lines/panel-theme';
import { sortRows, type RowOrder } from '../lines/sort-rows';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { describeAge } from '../records/describe-age';
import { LoadError } from '../status/load-error';
import { CautionNote } from './caution-note';
import { formatInbreeding, inbreedingBand, INBREEDING_BANDS } from './inbreeding-bands';
import { PairingApi } from './pairing-api';
import { animalLabel, buildPairingHeatmapOptions, heatmapSize, INBREEDING_RAMP } from './pairing-heatmap-options';
import { ancestorsText, CANDIDATE_CSV, CANDIDATE_SORT, formatAccuracy, formatEbv, GRID_CSV, gridCells } from './pairing-table';
import { PAIRING_LIMITS, pairingParams, pairingViewFrom, traitChoices, type PairingView } from './pairing-view';

/** Shown before any report has come, so the note is there from the first look. */
const STANDING_CAUTIONS = [
  'Close breeding tends to bring smaller litters and to make faults stronger as well as virtues.',
  'Breed a doe only once she is old and big enough for her breed; a veterinarian answers health questions.',
  'These figures support your judgment; they do not replace a judge, the official breed standard or a veterinarian.',
];

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
    CautionNote,
    LoadError,
    PanelChart,
  ],
  providers: [provideEchartsCore({ echarts: () => import('./pairing-echarts').then((m) => m.echarts) })],
})
export class PairingPlanner {
  private readonly api = inject(PairingApi);
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);
  private readonly host: HTMLElement = inject(ElementRef).nativeElement;

  readonly rabbitryId = input.required<string>();

  protected readonly view = toSignal(this.route.queryParams.pipe(map((p) => pairingViewFrom(p))), {
    initialValue: pairingViewFrom(this.route.snapshot.queryParams),
  });
  protected readonly report = this.api.pairings(this.rabbitryId, this.view);
  protected readonly breeds = inject(BreedsApi).list();

  protected readonly search = new FormControl<string | HerdRow>('', { nonNullable: true });
  private readonly searchText = signal('');
  protected readonly matches = this.api.animalsMatching(this.rabbitryId, this.searchText);

  protected readonly data = computed(() => (this.report.hasValue() ? this.report.value() : undefined));
  protected readonly planned = computed(() => this.data()?.animal ?? null);
  protected readonly traits = computed(() =>
    traitChoices(this.breeds.hasValue() ? this.breeds.value() : [], this.planned()?.animal.breedId ?? null),
  );
  protected readonly traitLabel = computed(() => this.data()?.trait.label ?? this.traits().find((t) => t.key === this.view().trait)?.label ?? this.view().trait);
  protected readonly limits = PAIRING_LIMITS;
  protected readonly cautions = computed(() => this.data()?.cautions ?? STANDING_CAUTIONS);

  protected readonly order = signal<RowOrder>({ active: 'rank', direction: 'asc' });
  protected readonly candidates = computed(() => sortRows(this.data()?.candidates ?? [], this.order(), CANDIDATE_SORT));
  protected readonly columns = ['rank', 'mate', 'line', 'age', 'inbreeding', 'mateEbv', 'mateAccuracy', 'offspringEbv', 'ancestors'];
  protected readonly mateWord = computed(() => (this.planned()?.animal.sex === 'buck' ? 'does' : 'bucks'));

  // The theme is read when the first chart is drawn: only an element in the page inherits the variables.
  private theme: PanelTheme | null = null;
  private readonly wide = toSignal(inject(BreakpointObserver).observe('(min-width: 700px)').pipe(map((s) => s.matches)), { initialValue: true });
  protected readonly heatmap = computed(() => {
    const report = this.data();
    if (!report || report.matrix.does.length === 0 || report.matrix.bucks.length === 0) return null;
    const wide = this.wide();
    const options = buildPairingHeatmapOptions({ matrix: report.matrix, selectedId: report.animal.animal.id, theme: (this.theme ??= readPanelTheme(this.host)), wide });
    return { options, size: heatmapSize(report.matrix.does.length, report.matrix.bucks.length, wide) };
  });
  protected readonly grid = computed(() => (this.data() ? gridCells(this.data()!.matrix) : []));
  protected readonly bandsText = () => INBREEDING_BANDS.map((b) => `${b.label}: ${b.likeness}`).join('; ');
  protected readonly bands = INBREEDING_BANDS.map((b) => ({ ...b, colour: INBREEDING_RAMP[b.index] }));
  protected readonly background = computed(() => (this.theme ??= readPanelTheme(this.host)).surface);

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
    void this.router.navigate([], { relativeTo: this.route, queryParams: pairingParams(view), replaceUrl: false });
  }
}
