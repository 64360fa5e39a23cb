import { ChangeDetectionStrategy, Component, DestroyRef, ElementRef, computed, inject, input, linkedSignal, signal, viewChild } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleChange, MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSliderModule } from '@angular/material/slider';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { provideEchartsCore } from 'ngx-echarts';
import { Subject, debounceTime, map } from 'rxjs';
import { KEEPER_COMPONENTS, KEEPER_COMPONENT_LABELS, type KeeperComponent, type KeepersReport } from '@shared/contracts/analytics';
import type { KeeperDecision } from '@shared/contracts/animals';
import { formatWeight } from '@shared/units/weight';
import { AnimalApi } from '../animal/animal-api';
import { BreedsApi } from '../breeds/breeds-api';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { editsRecords, rabbitryRoleOf } from '../records/records-access';
import { Session } from '../session/session';
import { describeFailure } from '../status/describe-failure';
import { LoadError } from '../status/load-error';
import { traitChoices } from '../traits/trait-choices';
import { CautionsNote } from './cautions-note';
import { readChartTheme } from './chart-theme';
import { buildKeeperBoardOptions, keeperChartHeight } from './keeper-chart-options';
import {
  DECISION_LABELS, componentValue, contributionText, keeperCsvColumns, partOf, sortKeeperRows, type KeeperSortKey,
} from './keeper-table';
import { KEEPER_DEFAULTS, KEEPER_WEIGHT_RANGE, keeperParams, keeperViewFrom, type KeeperView } from './keeper-view';
import type { KeeperCandidate } from '@shared/domain/keeper-explanation';
import { KeepersApi } from './keepers-api';
import { PanelChart } from './panel-chart';

@Component({
  selector: 'kl-keeper-board',
  templateUrl: './keeper-board.html',
  styleUrl: './keeper-board.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    RouterLink, MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatProgressBarModule, MatSelectModule,
    MatSliderModule, MatSortModule, MatTableModule, CautionsNote, LoadError, PanelChart,
  ],
  providers: [provideEchartsCore({ echarts: () => import('./keeper-echarts').then((m) => m.echarts) })],
})
export class KeeperBoard {
  private readonly api = inject(KeepersApi);
  private readonly animals = inject(AnimalApi);
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  private readonly session = inject(Session);
  private readonly host: HTMLElement = inject(ElementRef).nativeElement;
  private readonly chart = viewChild(PanelChart);

  readonly rabbitryId = input.required<string>();

  protected readonly view = toSignal(this.route.queryParams.pipe(map((p) => keeperViewFrom(p))), {
    initialValue: keeperViewFrom(this.route.snapshot.queryParams),
  });
  protected readonly report = this.api.ranking(this.rabbitryId, this.view);
  /** The last board received stays in view while the next weights are worked out. */
  protected readonly shown = linkedSignal<KeepersReport | undefined, KeepersReport | undefined>({
    source: () => (this.report.hasValue() ? this.report.value() : undefined),
    computation: (next, previous) => next ?? previous?.value,
  });
  protected readonly candidates = computed(() => this.shown()?.candidates ?? []);

  /** The sliders follow the hand at once; the address (and the board) follow a moment later. */
  protected readonly draft = linkedSignal(() => this.view().weights);
  private readonly moved = new Subject<KeeperView['weights']>();

  private readonly breeds = inject(BreedsApi).list();
  protected readonly traits = computed(() => traitChoices(this.breeds.hasValue() ? this.breeds.value() : []));
  protected readonly canDecide = computed(() => editsRecords(rabbitryRoleOf(this.session.user(), this.rabbitryId())));
  protected readonly unit = computed(() => this.session.user()?.weightUnit ?? 'lb-oz');

  protected readonly components = KEEPER_COMPONENTS;
  protected readonly labels = KEEPER_COMPONENT_LABELS;
  protected readonly range = KEEPER_WEIGHT_RANGE;
  protected readonly decisionLabels = DECISION_LABELS;
  protected readonly decisionChoices: KeeperDecision[] = ['keep', 'sell', 'undecided'];
  protected readonly hints: Record<KeeperComponent, string> = {
    breedingValue: 'Estimated genetic merit for the trait chosen below (animal-model BLUP).',
    ownEvaluation: 'Your latest evaluation, as a share of the breed template’s points.',
    weightOnTarget: 'How close the projected senior weight comes to the breed’s ideal.',
    parentsPlacementIndex: 'How often the sire’s and dam’s offspring placed in the top 3, against chance.',
    inbreeding: 'A penalty: the more inbred, the lower the index.',
  };

  private theme: ReturnType<typeof readChartTheme> | null = null;
  protected readonly options = computed(() => buildKeeperBoardOptions({ candidates: this.candidates(), theme: (this.theme ??= readChartTheme(this.host)) }));
  protected readonly chartHeight = computed(() => keeperChartHeight(this.candidates().length));

  /** Decisions saved from this board since it was loaded (the report is not fetched again for them). */
  private readonly decided = signal<ReadonlyMap<number, KeeperDecision>>(new Map());
  protected decisionOf(c: KeeperCandidate): KeeperDecision | null {
    return this.decided().get(c.animal.id) ?? c.keeperDecision;
  }

  private readonly sort = signal<Sort>({ active: 'rank', direction: '' });
  protected readonly rows = computed(() => sortKeeperRows(this.candidates(), this.sort().active as KeeperSortKey, this.sort().direction));
  /** The API's explanation of each rank, in the user's weight unit. */
  protected readonly explanations = computed(() => new Map(this.candidates().map((c) => [c.animal.id, c.explanation.join(' ')])));
  protected readonly columns = computed(() => [
    // The decision comes early: it is what the breeder came to do, and must not scroll out of view.
    'rank', 'earId', 'total', 'decision', ...KEEPER_COMPONENTS.filter((c) => this.view().weights[c] !== 0), 'projected',
  ]);

  protected readonly componentValue = componentValue;
  protected readonly contributionText = contributionText;
  protected readonly partOf = partOf;
  protected weight(grams: number): string {
    return formatWeight(Math.max(0, grams), this.unit());
  }

  constructor() {
    this.moved.pipe(debounceTime(350), takeUntilDestroyed(inject(DestroyRef))).subscribe((weights) => this.show({ ...this.view(), weights }));
  }

  protected weigh(component: KeeperComponent, value: number): void {
    const weights = { ...this.draft(), [component]: value };
    this.draft.set(weights);
    this.moved.next(weights);
  }

  protected chooseTrait(trait: string): void {
    this.show({ ...this.view(), trait });
  }

  protected reset(): void {
    this.draft.set(KEEPER_DEFAULTS.weights);
    this.show({ ...this.view(), weights: KEEPER_DEFAULTS.weights });
  }

  protected sortBy(sort: Sort): void {
    this.sort.set(sort);
  }

  protected decide(c: KeeperCandidate, change: MatButtonToggleChange): void {
    const decision = change.value as KeeperDecision;
    const before = this.decided();
    this.decided.set(new Map(before).set(c.animal.id, decision));
    this.animals.setKeeperDecision(this.rabbitryId(), c.animal.id, decision).subscribe({
      next: () => this.snackBar.open(`${c.animal.earId}: ${DECISION_LABELS[decision].toLowerCase()} — saved.`, undefined, { duration: 3000 }),
      error: (err: unknown) => {
        this.decided.set(before);
        this.snackBar.open(`${c.animal.earId} was not saved. ${describeFailure(err).message}`, 'Dismiss');
      },
    });
  }

  protected saveCsv(): void {
    const report = this.shown();
    if (!report) return;
    const rabbitry = report.scope.rabbitries.find((r) => String(r.id) === this.rabbitryId())?.name;
    downloadCsv(csvFileName(rabbitry, 'keeper board', report.asOf), this.rows(), keeperCsvColumns(this.unit(), (c) => this.decisionOf(c)));
  }

  protected savePng(): void {
    const report = this.shown();
    void this.chart()?.savePng(csvFileName('keeper board', report?.asOf).replace(/\.csv$/, '.png'));
  }

  private show(view: KeeperView): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: keeperParams(view), replaceUrl: true });
  }
}
