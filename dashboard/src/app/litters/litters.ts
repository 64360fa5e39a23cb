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
import { ActivatedRoute, RouterLink } from '@angular/router';
import { map } from 'rxjs';
import type { AnimalSummary } from '@shared/contracts/animals';
import type { Litter } from '@shared/contracts/litters';
import { localToday } from '../records/describe-age';
import { editsRecords, rabbitryRoleOf } from '../records/records-access';
import { Session } from '../session/session';
import { LoadError } from '../status/load-error';
import { AddKits, type AddKitsData } from './add-kits';
import { BREEDING_AGE_CAUTION, expectedText, litterState, rangeText, weight21dText } from './litter-words';
import { LitterForm, type LitterFormData } from './litter-form';
import { littersUrl, LittersApi } from './litters-api';

const DESKTOP = ['code', 'bredOn', 'kindledOn', 'weaned', 'weight21d', 'kits', 'actions'];
const PHONE = ['code', 'bredOn', 'actions'];

@Component({
  selector: 'kl-litters',
  templateUrl: './litters.html',
  styleUrl: './litters.scss',
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
export class Litters {
  private readonly api = inject(LittersApi);
  private readonly session = inject(Session);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  readonly rabbitryId = input.required<string>();
  protected readonly litters = this.api.list(this.rabbitryId);
  protected readonly canEdit = computed(() => editsRecords(rabbitryRoleOf(this.session.user(), this.rabbitryId())));
  protected readonly unit = computed(() => this.session.user()?.weightUnit ?? 'lb-oz');
  protected readonly today = localToday();
  protected readonly caution = BREEDING_AGE_CAUTION;
  protected readonly csvUrl = computed(() => `${littersUrl(this.rabbitryId())}?format=csv`);
  protected readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), { initialValue: false });
  protected readonly columns = computed(() => (this.isPhone() ? PHONE : DESKTOP));

  protected readonly table = new MatTableDataSource<Litter>([]);
  private readonly sort = viewChild(MatSort);
  private readonly paginator = viewChild(MatPaginator);
  protected readonly filterText = signal(inject(ActivatedRoute).snapshot.queryParamMap.get('litter') ?? '');

  protected readonly expectedText = expectedText;
  protected readonly rangeText = rangeText;

  constructor() {
    this.table.filterPredicate = (l, filter) =>
      [l.code, l.sireEarId, l.damEarId, l.notes].some((v) => v?.toLowerCase().includes(filter));
    this.table.sortingDataAccessor = (l, key) => {
      const value: Record<string, string | number | null> = {
        // A litter recorded only at kindling sorts by that date among the breedings.
        code: l.code, bredOn: l.bredOn ?? l.kindledOn,
        kindledOn: l.kindledOn, weaned: l.weaned, weight21d: l.weight21dGrams, kits: l.kitsRecorded,
      };
      return value[key] ?? '';
    };
    effect(() => {
      this.table.data = this.litters.hasValue() ? this.litters.value().litters : [];
    });
    effect(() => {
      this.table.sort = this.sort() ?? null;
      this.table.paginator = this.paginator() ?? null;
    });
    effect(() => {
      this.table.filter = this.filterText().trim().toLowerCase();
    });
  }

  protected state(l: Litter): string {
    return litterState(l, this.today);
  }

  protected weight(l: Litter): string {
    return weight21dText(l, this.unit());
  }

  protected edit(litter?: Litter): void {
    const data: LitterFormData = { rabbitryId: this.rabbitryId(), unit: this.unit(), litter };
    this.dialog
      .open<LitterForm, LitterFormData, Litter>(LitterForm, { data, width: '42rem', maxWidth: '100vw' })
      .afterClosed()
      .subscribe((saved) => {
        if (!saved) return;
        this.snackBar.open(`Litter ${saved.code} saved.`, 'OK', { duration: 5000 });
        this.litters.reload();
      });
  }

  protected addKits(litter: Litter): void {
    const data: AddKitsData = { rabbitryId: this.rabbitryId(), litter };
    this.dialog
      .open<AddKits, AddKitsData, AnimalSummary[]>(AddKits, { data, width: '38rem', maxWidth: '100vw' })
      .afterClosed()
      .subscribe((kits) => {
        if (!kits?.length) return;
        this.snackBar.open(`${kits.length} kit${kits.length === 1 ? '' : 's'} added to the herd: ${kits.map((k) => k.earId).join(', ')}.`, 'OK', { duration: 8000 });
        this.litters.reload();
      });
  }
}
