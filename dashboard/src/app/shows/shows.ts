import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatDialog } from '@angular/material/dialog';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import { filter, map, switchMap } from 'rxjs';
import type { Show } from '@shared/contracts/shows';
import type { CsvColumn } from '@shared/csv/to-csv';
import { ClubsApi } from '../club/clubs-api';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { clubRoleOf } from '../records/records-access';
import { Session } from '../session/session';
import { confirmWith } from '../status/confirm-dialog';
import { describeFailure } from '../status/describe-failure';
import { LoadError } from '../status/load-error';
import { showsInSeason } from './season';
import { ShowsApi } from './shows-api';

const SHOW_CSV: readonly CsvColumn<Show>[] = [
  { header: 'Date', value: (s) => s.showDate },
  { header: 'Show', value: (s) => s.name },
  { header: 'Location', value: (s) => s.location },
  { header: 'Host club', value: (s) => s.hostClub },
  { header: 'Judges', value: (s) => s.judges.join('; ') },
  { header: 'Sanction number', value: (s) => s.sanctionNo },
  { header: 'Results', value: (s) => s.results },
];

/** The club's shows of the season with how many results each holds. */
@Component({
  selector: 'kl-shows',
  templateUrl: './shows.html',
  styleUrl: './shows.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatButtonToggleModule, MatProgressBarModule, MatTableModule, LoadError],
})
export class Shows {
  private readonly api = inject(ShowsApi);
  private readonly session = inject(Session);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  readonly clubId = input.required<string>();
  protected readonly shows = this.api.list(this.clubId);
  protected readonly club = inject(ClubsApi).one(this.clubId);
  protected readonly isOfficer = computed(() => clubRoleOf(this.session.user(), this.clubId()) === 'officer');
  protected readonly scope = signal<'season' | 'all'>('season');
  protected readonly season = computed(() => {
    const c = this.club.hasValue() ? this.club.value() : null;
    return c?.seasonStart || c?.seasonEnd ? { start: c.seasonStart, end: c.seasonEnd } : null;
  });
  protected readonly listed = computed(() => {
    const all = this.shows.hasValue() ? this.shows.value() : [];
    const s = this.season();
    return this.scope() === 'season' && s ? showsInSeason(all, s.start, s.end) : all;
  });
  protected readonly totalResults = computed(() => this.listed().reduce((n, s) => n + s.results, 0));
  protected readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), { initialValue: false });
  /** On a phone the date and place go under the show's name. */
  protected readonly columns = computed(() => [
    ...(this.isPhone() ? ['name', 'results'] : ['showDate', 'name', 'location', 'judges', 'results']),
    ...(this.isOfficer() ? ['actions'] : []),
  ]);

  protected download(): void {
    const club = this.club.hasValue() ? this.club.value().name : 'club';
    downloadCsv(csvFileName(club, 'shows'), this.listed(), SHOW_CSV);
  }

  protected remove(show: Show): void {
    confirmWith(this.dialog, {
      title: `Delete ${show.name}?`,
      message: show.results
        ? `The show of ${show.showDate} and its ${show.results} results leave the club’s records, with the legs and points they gave. An import of the results file brings them back.`
        : `The show of ${show.showDate} leaves the club’s records.`,
      confirmLabel: 'Delete show',
    })
      .pipe(filter(Boolean), switchMap(() => this.api.removeShow(this.clubId(), show.id, show.results > 0)))
      .subscribe({
        next: () => {
          this.snackBar.open(`${show.name} deleted.`, 'OK', { duration: 5000 });
          this.shows.reload();
        },
        error: (err: unknown) => this.snackBar.open(describeFailure(err).message, 'Dismiss'),
      });
  }
}
