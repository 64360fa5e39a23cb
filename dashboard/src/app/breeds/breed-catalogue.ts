import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import { filter, map, switchMap } from 'rxjs';
import type { BreedRecord } from '@shared/contracts/breeds';
import type { CsvColumn } from '@shared/csv/to-csv';
import { CLASS_SCHEME_LABELS } from '@shared/domain/terms';
import { formatWeight } from '@shared/units/weight';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { Session } from '../session/session';
import { confirmWith } from '../status/confirm-dialog';
import { describeFailure } from '../status/describe-failure';
import { LoadError } from '../status/load-error';
import { BreedEditor } from './breed-editor';
import { BreedsApi } from './breeds-api';

/** The site's breed catalogue, edited by administrators. */
@Component({
  selector: 'kl-breed-catalogue',
  templateUrl: './breed-catalogue.html',
  styleUrl: './breed-catalogue.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, MatProgressBarModule, MatTableModule, LoadError, BreedEditor],
})
export class BreedCatalogue {
  private readonly api = inject(BreedsApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly session = inject(Session);

  protected readonly breeds = this.api.list();
  protected readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), { initialValue: false });
  protected readonly columns = computed(() =>
    this.isPhone() ? ['name', 'seniorLimits', 'actions'] : ['name', 'classScheme', 'varieties', 'seniorLimits', 'traits', 'animals', 'actions'],
  );
  /** The breed being edited: a record, 'new', or nothing. */
  protected readonly editing = signal<BreedRecord | 'new' | null>(null);
  protected readonly editedBreed = computed(() => {
    const e = this.editing();
    return e === 'new' ? null : e;
  });
  private readonly unit = computed(() => this.session.user()?.weightUnit ?? 'lb-oz');

  protected schemeLabel(b: BreedRecord): string {
    return CLASS_SCHEME_LABELS[b.classScheme];
  }

  /** "3 lb 0 oz – 4 lb 8 oz" ("up to 4 lb 8 oz" without a minimum): the senior range, the limits that decide a disqualification. */
  protected senior(b: BreedRecord, sex: 'buck' | 'doe'): string {
    const { minGrams: min, maxGrams: max } = b.weightLimits[sex].senior;
    // No line break inside one weight: "4 lb 8 oz" stays whole when the cell wraps on a phone.
    const w = (g: number) => formatWeight(g, this.unit()).replace(/ /g, '\u00a0');
    if (min !== null && max !== null) return `${w(min)} – ${w(max)}`;
    if (max !== null) return `up to ${w(max)}`;
    return min !== null ? `at least ${w(min)}` : 'no limits';
  }

  protected saved(breed: BreedRecord): void {
    this.editing.set(null);
    this.snackBar.open(`${breed.name} saved.`, 'OK', { duration: 5000 });
    this.breeds.reload();
  }

  protected remove(breed: BreedRecord): void {
    confirmWith(this.dialog, {
      title: `Delete ${breed.name}?`,
      message: `${breed.name} leaves the catalogue. Breeds recorded for animals cannot be deleted.`,
      confirmLabel: 'Delete breed',
    })
      .pipe(filter(Boolean), switchMap(() => this.api.remove(breed.id)))
      .subscribe({
        next: () => {
          this.snackBar.open(`${breed.name} deleted.`, 'OK', { duration: 5000 });
          this.breeds.reload();
        },
        error: (err: unknown) => this.snackBar.open(describeFailure(err).message, 'Dismiss'),
      });
  }

  protected download(): void {
    const unit = this.unit();
    const w = (g: number | null) => (g === null ? null : formatWeight(g, unit));
    const columns: CsvColumn<BreedRecord>[] = [
      { header: 'Breed', value: (b) => b.name },
      { header: 'Class scheme', value: (b) => b.classScheme },
      { header: 'Varieties', value: (b) => b.varieties.join('; ') },
      ...(['buck', 'doe'] as const).flatMap((sex) =>
        (['junior', 'intermediate', 'senior'] as const).flatMap((c) =>
          (['minGrams', 'idealGrams', 'maxGrams'] as const).map((k): CsvColumn<BreedRecord> => ({
            header: `${sex} ${c} ${k.replace('Grams', '')} (${unit})`,
            value: (b) => w(b.weightLimits[sex][c]?.[k] ?? null),
          })),
        ),
      ),
      { header: 'Evaluation traits', value: (b) => b.evaluationTemplate.traits.map((t) => `${t.label} ${t.points}`).join('; ') },
      { header: 'Source', value: (b) => b.source },
      { header: 'Animals', value: (b) => b.animals },
    ];
    downloadCsv(csvFileName('breed catalogue'), this.breeds.hasValue() ? this.breeds.value() : [], columns);
  }
}
