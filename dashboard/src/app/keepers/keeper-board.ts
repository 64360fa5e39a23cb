import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleChange, MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSliderModule } from '@angular/material/slider';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { NgTemplateOutlet } from '@angular/common';
import { RouterLink } from '@angular/router';
import { provideEchartsCore } from 'ngx-echarts';
import { Subject, debounceTime } from 'rxjs';
import { KEEPER_COMPONENTS, KEEPER_COMPONENT_LABELS, type KeeperComponent } from '@shared/contracts/analytics';
import type { KeeperDecision } from '@shared/contracts/animals';
import { KEEPER_CAUTIONS } from '@shared/domain/cautions';
import { formatWeight } from '@shared/units/weight';
import { AnimalApi } from '../animal/animal-api';
import { BreedsApi } from '../breeds/breeds-api';
import { CautionsNote } from '../panels/cautions-note';
import { injectChartTheme } from '../panels/chart-theme';
import { PHONE_WIDTH, mediaMatches } from '../panels/media-query';
import { PanelChart } from '../panels/panel-chart';
import { lastValue, routedView } from '../panels/routed-view';
import { sortRows, type RowOrder } from '../panels/sort-rows';
import { traitChoices } from '../panels/trait-choices';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { editsRecords, rabbitryRoleOf } from '../records/records-access';
import { Session } from '../session/session';
import { describeFailure } from '../status/describe-failure';
import { LoadError } from '../status/load-error';
import { buildKeeperBoardOptions, keeperChartHeight } from './keeper-chart-options';
import {
  DECISION_LABELS, KEEPER_SORT, componentValue, contributionText, keeperCsvColumns, partOf,
} from './keeper-table';
import { KEEPER_DEFAULTS, KEEPER_WEIGHT_RANGE, keeperParams, keeperViewFrom, type KeeperView } from './keeper-view';
import type { KeeperCandidate } from '@shared/domain/keeper-explanation';
import { KeepersApi } from './keepers-api';

@Component({
  selector: 'kl-keeper-board',
  templateUrl: './keeper-board.html',
  styleUrl: './keeper-board.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    NgTemplateOutlet, RouterLink, MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatProgressBarModule, MatSelectModule,
    MatSliderModule, MatSortModule, MatTableModule, CautionsNote, LoadError, PanelChart,
  ],
  providers: [provideEchartsCore({ echarts: () => import('./keeper-echarts').then((m) => m.echarts) })],
})
export class KeeperBoard {
  private readonly api = inject(KeepersApi);
  private readonly animals = inject(AnimalApi);
  private readonly snackBar = inject(MatSnackBar);
  private readonly session = inject(Session);

  readonly rabbitryId = input.required<string>();

  private readonly address = routedView(keeperViewFrom, keeperParams);
  protected readonly view = this.address.view;
  protected readonly report = this.api.ranking(this.rabbitryId, this.view);
  /** The last board received stays in view while the next weights are worked out. */
  protected readonly shown = lastValue(this.report);
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
  protected readonly cautions = KEEPER_CAUTIONS;
  protected readonly decisionLabels = DECISION_LABELS;
  protected readonly decisionChoices: KeeperDecision[] = ['keep', 'sell', 'undecided'];
  protected readonly hints: Record<KeeperComponent, string> = {
    breedingValue: 'Estimated genetic merit for the trait chosen below (animal-model BLUP).',
    ownEvaluation: 'Your latest evaluation, as a share of the breed template’s points.',
    weightOnTarget: 'How close the projected senior weight comes to the breed’s ideal.',
    parentsPlacementIndex: 'How often the sire’s and dam’s offspring placed in the top 3, against chance.',
    inbreeding: 'A penalty: the more inbred, the lower the index.',
  };

  private readonly theme = injectChartTheme();
  protected readonly options = computed(() => buildKeeperBoardOptions({ candidates: this.candidates(), theme: this.theme() }));
  protected readonly chartHeight = computed(() => keeperChartHeight(this.candidates().length));

  /** Decisions saved from this board since it was loaded (the report is not fetched again for them). */
  private readonly decided = signal<ReadonlyMap<number, KeeperDecision>>(new Map());
  protected decisionOf(c: KeeperCandidate): KeeperDecision | null {
    return this.decided().get(c.animal.id) ?? c.keeperDecision;
  }

  private readonly sort = signal<RowOrder>({ active: 'rank', direction: '' });
  protected readonly rows = computed(() => sortRows(this.candidates(), this.sort(), KEEPER_SORT));
  /** The API's explanation of each rank, in the user's weight unit. */
  protected readonly explanations = computed(() => new Map(this.candidates().map((c) => [c.animal.id, c.explanation.join(' ')])));
  protected readonly isPhone = mediaMatches(PHONE_WIDTH, false);
  protected readonly columns = computed(() => [
    // The decision comes early: it is what the breeder came to do, and must not scroll out of view
    // (on a phone it moves under each junior's sentence).
    'rank', 'earId', 'total', ...(this.isPhone() ? [] : ['decision']), ...KEEPER_COMPONENTS.filter((c) => this.view().weights[c] !== 0), 'projected',
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

  /** The files' name: rabbitry, board and date. */
  protected readonly fileStem = computed(() => {
    const report = this.shown();
    const rabbitry = report?.scope.rabbitries.find((r) => String(r.id) === this.rabbitryId())?.name;
    return csvFileName(rabbitry, 'keeper board', report?.asOf).replace(/\.csv$/, '');
  });

  protected saveCsv(): void {
    const report = this.shown();
    if (!report) return;
    downloadCsv(`${this.fileStem()}.csv`, this.rows(), keeperCsvColumns(this.unit(), (c) => this.decisionOf(c)));
  }

  private show(view: KeeperView): void {
    this.address.show(view);
  }
}
