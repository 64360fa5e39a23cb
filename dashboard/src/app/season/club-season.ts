import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import { provideEchartsCore } from 'ngx-echarts';
import { IsoDate } from '@shared/contracts/animals';
import { SHOW_CAUTIONS } from '@shared/domain/cautions';
import { ClubsApi } from '../club/clubs-api';
import { CautionsNote } from '../panels/cautions-note';
import { injectChartTheme } from '../panels/chart-theme';
import { mediaMatches } from '../panels/media-query';
import { PanelChart } from '../panels/panel-chart';
import { lastValue, routedView } from '../panels/routed-view';
import { sortRows, type RowOrder } from '../panels/sort-rows';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { clubRoleOf } from '../records/records-access';
import { Session } from '../session/session';
import { Counts } from '../status/counts';
import { LoadError } from '../status/load-error';
import { buildEntriesOptions, buildSeasonPointsOptions, pointsSeriesShown, shortDate } from './season-chart-options';
import { SeasonApi } from './season-api';
import { formulaSummary } from './season-form';
import { SeasonSettingsEditor } from './season-settings';
import { breedsIn, indexText, LEGS_SORT, percent, SIRE_SORT, STANDING_CSV, STANDING_SORT } from './season-tables';
import { SEASON_TOPS, seasonParams, seasonViewFrom, type SeasonView } from './season-view';

/** Sires with fewer offspring results than this are marked: their shares swing with one result. */
const FEW_ENTRIES = 10;

/**
 * The club's season: standings by the club's points formula, points over the season, entries by
 * breed and show, legs earned and the top sires of members' animals. Every member reads it;
 * officers also set the season dates and the formula here.
 */
@Component({
  selector: 'kl-club-season',
  templateUrl: './club-season.html',
  styleUrl: './club-season.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    DecimalPipe,
    RouterLink,
    MatButtonModule,
    MatButtonToggleModule,
    MatFormFieldModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
    MatSortModule,
    MatTableModule,
    CautionsNote,
    Counts,
    LoadError,
    PanelChart,
    SeasonSettingsEditor,
  ],
  providers: [provideEchartsCore({ echarts: () => import('./season-echarts').then((m) => m.echarts) })],
})
export class ClubSeason {
  private readonly api = inject(SeasonApi);
  private readonly session = inject(Session);

  readonly clubId = input.required<string>();

  private readonly address = routedView(seasonViewFrom, seasonParams);
  protected readonly view = this.address.view;
  protected readonly report = this.api.report(this.clubId, () => ({ from: this.view().from, to: this.view().to }));
  protected readonly club = inject(ClubsApi).one(this.clubId);
  protected readonly isOfficer = computed(() => clubRoleOf(this.session.user(), this.clubId()) === 'officer');
  protected readonly data = lastValue(this.report);
  protected readonly cautions = SHOW_CAUTIONS;
  protected readonly isEmpty = computed(() => this.data()?.totals.results === 0);
  protected readonly showEditor = signal(false);

  protected readonly counts = computed(() => {
    const t = this.data()?.totals;
    return t ? [
      { label: 'Shows', value: t.shows },
      { label: 'Results', value: t.results },
      { label: 'Exhibitors', value: t.exhibitors },
      { label: 'Members’ results', value: t.memberResults },
    ] : [];
  });
  protected readonly formula = computed(() => (this.data() ? formulaSummary(this.data()!.formula) : ''));

  // ---- standings
  // The API's own order to begin with: by rank, and by breed then rank per breed.
  protected readonly standingOrder = signal<RowOrder>({ active: '', direction: '' });
  protected readonly breeds = computed(() => breedsIn(this.data()?.standings.byExhibitorBreed ?? []));
  protected readonly standings = computed(() => {
    const s = this.data()?.standings;
    if (!s) return [];
    const { standings, breed } = this.view();
    const rows = standings === 'exhibitor' ? s.byExhibitor : s.byExhibitorBreed.filter((r) => !breed || r.breed === breed);
    return sortRows(rows, this.standingOrder(), STANDING_SORT);
  });
  protected readonly standingColumns = computed(() =>
    this.view().standings === 'exhibitor'
      ? ['rank', 'exhibitor', 'points', 'results', 'firsts', 'awards']
      : ['rank', 'exhibitor', 'breed', 'points', 'results', 'firsts', 'awards'],
  );

  // ---- charts
  private readonly themed = injectChartTheme();
  protected readonly tops = SEASON_TOPS;
  private readonly wide = mediaMatches('(min-width: 900px)', true);
  protected readonly pointsHeight = computed(() => (this.wide() ? '24rem' : '30rem'));
  protected readonly pointsOptions = computed(() => {
    const r = this.data();
    if (!r) return null;
    const { top, who } = this.view();
    return buildSeasonPointsOptions({ cumulative: r.cumulative, shows: r.entries.shows, top, who, theme: this.themed(), wide: this.wide() });
  });
  protected readonly pointsShown = computed(() => {
    const r = this.data();
    return r ? pointsSeriesShown({ cumulative: r.cumulative, top: this.view().top, who: this.view().who }) : [];
  });
  protected readonly dates = computed(() => this.data()?.cumulative.dates ?? []);
  protected readonly entriesOptions = computed(() => {
    const r = this.data();
    return r && r.entries.shows.length > 0 ? buildEntriesOptions({ entries: r.entries, theme: this.themed(), wide: this.wide() }) : null;
  });

  // ---- legs and sires
  protected readonly legsOrder = signal<RowOrder>({ active: 'legs', direction: 'desc' });
  protected readonly legs = computed(() => sortRows(this.data()?.legs ?? [], this.legsOrder(), LEGS_SORT));
  protected readonly sireOrder = signal<RowOrder>({ active: 'rank', direction: 'asc' });
  protected readonly sires = computed(() => sortRows(this.data()?.topSires ?? [], this.sireOrder(), SIRE_SORT));
  protected readonly fewEntries = FEW_ENTRIES;

  protected readonly shortDate = shortDate;
  protected readonly percent = percent;
  protected readonly indexText = indexText;

  protected setView(change: Partial<SeasonView>): void {
    this.address.show({ ...this.view(), ...change });
  }

  /** A date typed in the range box: a complete date applies at once; an empty box returns to the club's season. */
  protected setDate(key: 'from' | 'to', text: string): void {
    if (text === '') this.setView({ [key]: null });
    else if (IsoDate.safeParse(text).success) this.setView({ [key]: text });
  }

  protected sortStandings(sort: Sort): void {
    this.standingOrder.set({ active: sort.active, direction: sort.direction });
  }

  protected sortLegs(sort: Sort): void {
    this.legsOrder.set({ active: sort.active, direction: sort.direction });
  }

  protected sortSires(sort: Sort): void {
    this.sireOrder.set({ active: sort.active, direction: sort.direction });
  }

  protected fileStem(what: string): string {
    const r = this.data();
    return csvFileName(r?.club.name, what, r?.from, r?.to).replace(/\.csv$/, '');
  }

  protected downloadStandings(): void {
    const by = this.view().standings === 'exhibitor' ? 'standings' : 'standings by breed';
    downloadCsv(`${this.fileStem(by)}.csv`, this.standings(), STANDING_CSV);
  }

  protected settingsSaved(): void {
    this.club.reload();
    this.report.reload();
  }
}
