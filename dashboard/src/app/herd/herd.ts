import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, DestroyRef, computed, effect, inject, input, linkedSignal, signal } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatAutocompleteModule } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { MatChipsModule } from '@angular/material/chips';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatPaginatorModule, PageEvent } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { debounceTime, distinctUntilChanged, map } from 'rxjs';
import type { Animal, HerdPage } from '@shared/contracts/animals';
import { AGE_CLASSES, AGE_CLASS_LABELS, ANIMAL_STATUSES, ANIMAL_STATUS_LABELS } from '@shared/domain/terms';
import { BreedsApi } from '../breeds/breeds-api';
import { SexFilter } from '../panels/sex-filter';
import { localToday } from '../records/describe-age';
import { editsRecords, rabbitryRoleOf } from '../records/records-access';
import { Session } from '../session/session';
import { LoadError } from '../status/load-error';
import { AnimalForm, type AnimalFormData } from './animal-form';
import { DESKTOP_COLUMNS, HERD_COLUMNS, PHONE_COLUMNS, headerFor, sortFor } from './herd-columns';
import { HerdApi } from './herd-api';
import { lineCounts, linesMatching } from './herd-lines';
import {
  activeFilters,
  HERD_DEFAULTS,
  HERD_PAGE_SIZES,
  herdCsvUrl,
  herdParams,
  herdViewFrom,
  withFilter,
  type HerdFilterKey,
  type HerdView,
} from './herd-view';

@Component({
  selector: 'kl-herd',
  templateUrl: './herd.html',
  styleUrl: './herd.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatAutocompleteModule,
    MatButtonModule,
    MatChipsModule,
    MatFormFieldModule,
    MatInputModule,
    MatPaginatorModule,
    MatProgressBarModule,
    MatSelectModule,
    MatSortModule,
    MatTableModule,
    LoadError,
    SexFilter,
  ],
})
export class Herd {
  private readonly api = inject(HerdApi);
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly session = inject(Session);

  readonly rabbitryId = input.required<string>();

  protected readonly view = toSignal(this.route.queryParams.pipe(map((p) => herdViewFrom(p))), {
    initialValue: herdViewFrom(this.route.snapshot.queryParams),
  });
  protected readonly page = this.api.page(this.rabbitryId, this.view);
  /** The last page received stays in view while the next one loads. */
  protected readonly shown = linkedSignal<HerdPage | undefined, HerdPage | undefined>({
    source: () => (this.page.hasValue() ? this.page.value() : undefined),
    computation: (next, previous) => next ?? previous?.value,
  });
  protected readonly breeds = inject(BreedsApi).list();

  protected readonly canEdit = computed(() => editsRecords(rabbitryRoleOf(this.session.user(), this.rabbitryId())));
  protected readonly unit = computed(() => this.session.user()?.weightUnit ?? 'lb-oz');
  protected readonly today = signal(localToday());
  protected readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), {
    initialValue: false,
  });
  protected readonly columns = HERD_COLUMNS;
  protected readonly shownColumns = computed(() => (this.isPhone() ? PHONE_COLUMNS : DESKTOP_COLUMNS));
  protected readonly sortHeader = computed(() => headerFor(this.view()));
  protected readonly chips = computed(() => activeFilters(this.view(), this.breeds.hasValue() ? this.breeds.value() : []));
  protected readonly csvUrl = computed(() => herdCsvUrl(this.rabbitryId(), this.view()));
  protected readonly pageSizes = HERD_PAGE_SIZES;
  protected readonly showFilters = signal(false);
  protected readonly isEmptyHerd = computed(() => this.shown()?.total === 0 && this.chips().length === 0);

  protected readonly ageClasses = AGE_CLASSES.map((value) => ({ value, label: AGE_CLASS_LABELS[value] }));
  protected readonly statuses = ANIMAL_STATUSES.map((value) => ({ value, label: ANIMAL_STATUS_LABELS[value] }));
  protected readonly varieties = computed(() => {
    const breeds = this.breeds.hasValue() ? this.breeds.value() : [];
    const chosen = breeds.filter((b) => this.view().breedId === undefined || b.id === this.view().breedId);
    return [...new Set(chosen.flatMap((b) => b.varieties))].sort((a, b) => a.localeCompare(b));
  });

  protected readonly search = new FormControl(this.view().q ?? '', { nonNullable: true });
  protected readonly lineFilter = new FormControl(this.view().line ?? '', { nonNullable: true });
  private readonly lines = this.api.lines(this.rabbitryId);
  private readonly lineTyped = toSignal(this.lineFilter.valueChanges, { initialValue: this.lineFilter.value });
  protected readonly lineChoices = computed(() => linesMatching(this.lines.hasValue() ? this.lines.value() : [], this.lineTyped()));
  protected readonly lineCounts = lineCounts;

  constructor() {
    const destroyed = inject(DestroyRef);
    for (const [control, key] of [[this.search, 'q'], [this.lineFilter, 'line']] as const) {
      control.valueChanges
        .pipe(debounceTime(300), map((v) => v.trim()), distinctUntilChanged(), takeUntilDestroyed(destroyed))
        .subscribe((text) => this.filter(key, text || undefined));
    }
    // A chip removed or an address opened elsewhere: the text boxes follow the view.
    effect(() => {
      const { q, line } = this.view();
      if ((q ?? '') !== this.search.value.trim()) this.search.setValue(q ?? '', { emitEvent: false });
      if ((line ?? '') !== this.lineFilter.value.trim()) this.lineFilter.setValue(line ?? '', { emitEvent: false });
    });
  }

  protected filter<K extends HerdFilterKey>(key: K, value: HerdView[K] | undefined): void {
    this.show(withFilter(this.view(), key, value));
  }

  protected clearFilters(): void {
    this.show({ ...HERD_DEFAULTS, sort: this.view().sort, dir: this.view().dir, pageSize: this.view().pageSize });
  }

  protected sortBy(sort: Sort): void {
    const order = sort.direction ? sortFor(sort.active, sort.direction) : { sort: HERD_DEFAULTS.sort, dir: HERD_DEFAULTS.dir };
    if (order) this.show({ ...this.view(), ...order, page: 1 });
  }

  protected turnPage(event: PageEvent): void {
    this.show({ ...this.view(), page: event.pageIndex + 1, pageSize: event.pageSize });
  }

  protected addAnimal(): void {
    const data: AnimalFormData = { rabbitryId: this.rabbitryId() };
    this.dialog
      .open<AnimalForm, AnimalFormData, Animal>(AnimalForm, { data, width: '44rem', maxWidth: '100vw', autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((animal) => {
        if (!animal) return;
        this.page.reload();
        this.lines.reload();
        this.snackBar
          .open(`${animal.earId} is now in the herd.`, 'Open', { duration: 8000 })
          .onAction()
          .subscribe(() => void this.router.navigate(['/r', this.rabbitryId(), 'animals', animal.id]));
      });
  }

  private show(view: HerdView): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: herdParams(view), replaceUrl: true });
  }
}
