import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal, viewChild } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatPaginator, MatPaginatorModule } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatSort, MatSortModule } from '@angular/material/sort';
import { MatTableDataSource, MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import { filter, map, switchMap } from 'rxjs';
import type { ShowResult } from '@shared/contracts/shows';
import { AWARD_LABELS, type Award } from '@shared/domain/awards';
import { ordinal } from '@shared/domain/ordinal';
import { AGE_CLASSES } from '@shared/domain/terms';
import { clubRoleOf } from '../records/records-access';
import { Session } from '../session/session';
import { confirmWith } from '../status/confirm-dialog';
import { describeFailure } from '../status/describe-failure';
import { LoadError } from '../status/load-error';
import { classLabel, showSummary } from './result-words';
import { ShowsApi } from './shows-api';

const DESKTOP = ['class', 'placing', 'entries', 'exhibitors', 'earId', 'exhibitor', 'awards', 'judge'];
const PHONE = ['class', 'placing', 'exhibitor', 'awards'];

/** One show's results, class by class, with the awards spelled out. */
@Component({
  selector: 'kl-show-results',
  templateUrl: './show-results.html',
  styleUrl: './show-results.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    RouterLink,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatPaginatorModule,
    MatProgressBarModule,
    MatSortModule,
    MatTableModule,
    LoadError,
  ],
})
export class ShowResults {
  private readonly api = inject(ShowsApi);
  private readonly session = inject(Session);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  readonly clubId = input.required<string>();
  readonly showId = input.required<string>();
  protected readonly results = this.api.results(this.clubId, this.showId);
  protected readonly detail = this.api.one(this.clubId, this.showId);
  protected readonly show = computed(() => (this.detail.hasValue() ? this.detail.value() : undefined));
  protected readonly summary = computed(() => {
    const s = this.show();
    return s ? showSummary(s) : null;
  });
  protected readonly isOfficer = computed(() => clubRoleOf(this.session.user(), this.clubId()) === 'officer');
  protected readonly csvUrl = computed(() => this.api.resultsCsvUrl(this.clubId(), this.showId()));
  private readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), { initialValue: false });
  protected readonly columns = computed(() => [...(this.isPhone() ? PHONE : DESKTOP), ...(this.isOfficer() ? ['actions'] : [])]);
  protected readonly filterText = signal('');

  protected readonly table = new MatTableDataSource<ShowResult>([]);
  private readonly sort = viewChild(MatSort);
  private readonly paginator = viewChild(MatPaginator);

  constructor() {
    this.table.filterPredicate = (r, f) => [r.exhibitor, r.earId, r.breed, r.variety, r.judge, ...r.awards].some((v) => v?.toLowerCase().includes(f));
    this.table.sortingDataAccessor = (r, key) => {
      switch (key) {
        // Classes in the order a show runs them: breed, variety, sex, then age class youngest first.
        case 'class': return `${r.breed}|${r.variety ?? ''}|${r.sex}|${AGE_CLASSES.indexOf(r.ageClass)}|${String(r.placing).padStart(4, '0')}`;
        case 'placing': return r.placing;
        case 'entries': return r.entriesInClass;
        case 'exhibitors': return r.exhibitorsInClass;
        case 'earId': return r.earId ?? '';
        case 'awards': return r.awards.length;
        default: return (r as unknown as Record<string, string>)[key] ?? '';
      }
    };
    effect(() => {
      this.table.data = this.results.hasValue() ? this.results.value() : [];
    });
    effect(() => {
      this.table.sort = this.sort() ?? null;
      this.table.paginator = this.paginator() ?? null;
    });
    effect(() => {
      this.table.filter = this.filterText().trim().toLowerCase();
    });
  }

  protected classOf(r: ShowResult): string {
    return classLabel(r);
  }
  protected ordinal(n: number): string {
    return ordinal(n);
  }
  protected awardLabel(a: Award): string {
    return AWARD_LABELS[a];
  }

  protected remove(r: ShowResult): void {
    confirmWith(this.dialog, {
      title: 'Delete this result?',
      message: `${ordinal(r.placing)} of ${r.entriesInClass}, ${classLabel(r)}, ${r.exhibitor}${r.earId ? ` (${r.earId})` : ''}. Legs and points it gave go with it.`,
      confirmLabel: 'Delete result',
    })
      .pipe(filter(Boolean), switchMap(() => this.api.removeResult(this.clubId(), r.showId, r.id)))
      .subscribe({
        next: () => {
          this.snackBar.open('Result deleted.', 'OK', { duration: 5000 });
          this.results.reload();
          this.detail.reload();
        },
        error: (err: unknown) => this.snackBar.open(describeFailure(err).message, 'Dismiss'),
      });
  }
}
