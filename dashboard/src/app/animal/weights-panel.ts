import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import { filter, finalize, map, switchMap } from 'rxjs';
import type { AnimalProfile, Weight } from '@shared/contracts/animals';
import { daysBetween } from '@shared/domain/calendar-date';
import type { UnitSetting } from '@shared/units/weight';
import { showFieldErrors } from '../forms/field-errors';
import { pastDateValidator } from '../records/date-input';
import { localToday } from '../records/describe-age';
import { example, weightEcho, weightValidator } from '../records/weight-input';
import { confirmWith } from '../status/confirm-dialog';
import { Session } from '../session/session';
import { describeFailure } from '../status/describe-failure';
import { AnimalApi } from './animal-api';
import { WeightChart } from './weight-chart';
import { weightFlag } from './weight-flag';

/** The animal's weighings: the flag against the breed's limits, a chart, the table and a way to add one. */
@Component({
  selector: 'kl-weights-panel',
  templateUrl: './weights-panel.html',
  styleUrl: './weights-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatTableModule, WeightChart],
})
export class WeightsPanel {
  private readonly api = inject(AnimalApi);
  private readonly snackBar = inject(MatSnackBar);
  private readonly dialog = inject(MatDialog);
  private readonly session = inject(Session);
  /** The user's own unit: weights are typed and shown in it (and the validator runs before any input is set). */
  protected readonly unit = computed<UnitSetting>(() => this.session.user()?.weightUnit ?? 'lb-oz');

  readonly rabbitryId = input.required<string>();
  readonly animalId = input.required<number>();
  readonly weights = input.required<readonly Weight[]>();
  readonly birthDate = input<string | null>(null);
  readonly weightCheck = input<AnimalProfile['weightCheck']>(null);
  readonly seniorLimits = input<{ idealGrams: number | null; maxGrams: number | null } | null>(null);
  readonly canEdit = input(false);
  readonly changed = output<void>();

  protected readonly flag = computed(() => {
    const check = this.weightCheck();
    return check ? weightFlag(check, this.unit()) : null;
  });
  protected readonly newestFirst = computed(() => [...this.weights()].sort((a, b) => b.weighedOn.localeCompare(a.weighedOn)));
  private readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), { initialValue: false });
  /** On a phone a weighing's note goes under its date, leaving room for the delete button. */
  protected readonly columns = computed(() => [
    'weighedOn', 'age', 'weight', ...(this.isPhone() ? [] : ['notes']), ...(this.canEdit() ? ['actions'] : []),
  ]);
  protected readonly notesUnderDate = this.isPhone;

  protected readonly form = inject(NonNullableFormBuilder).group({
    weighedOn: [localToday(), pastDateValidator(true)],
    weight: ['', weightValidator(() => this.unit())],
    notes: ['', Validators.maxLength(255)],
  });
  private readonly typed = toSignal(this.form.controls.weight.valueChanges, { initialValue: '' });
  protected readonly echo = computed(() => weightEcho(this.typed(), this.unit()));
  protected readonly example = computed(() => example(this.unit()));
  protected readonly saving = signal(false);
  protected readonly failure = signal<string | null>(null);

  protected ageAt(date: string): string {
    const born = this.birthDate();
    if (!born || date < born) return '';
    const days = daysBetween(born, date);
    return days < 14 ? `${days} d` : `${Math.floor(days / 7)} wk`;
  }

  protected add(directive: FormGroupDirective): void {
    if (this.saving()) return;
    if (this.form.invalid) {
      this.form.markAllAsDirty();
      return;
    }
    const { weighedOn, weight, notes } = this.form.getRawValue();
    this.saving.set(true);
    this.failure.set(null);
    this.api
      .addWeight(this.rabbitryId(), this.animalId(), { weighedOn, weight, notes: notes.trim() || null })
      .pipe(finalize(() => this.saving.set(false)))
      .subscribe({
        next: (saved) => {
          directive.resetForm({ weighedOn, weight: '', notes: '' });
          this.snackBar.open(`Weighing of ${saved.display} on ${saved.weighedOn} recorded.`, 'OK', { duration: 5000 });
          this.changed.emit();
        },
        error: (err: unknown) => {
          const failure = describeFailure(err);
          if (!showFieldErrors(this.form, failure.fields)) this.failure.set(failure.message);
        },
      });
  }

  protected remove(weight: Weight): void {
    confirmWith(this.dialog, {
      title: `Delete the weighing of ${weight.weighedOn}?`,
      message: `${weight.display} on ${weight.weighedOn} will be removed from this animal's record.`,
      confirmLabel: 'Delete weighing',
    })
      .pipe(filter(Boolean), switchMap(() => this.api.removeWeight(this.rabbitryId(), weight.id)))
      .subscribe({
      next: () => {
        this.snackBar.open(`Weighing of ${weight.weighedOn} deleted.`, 'OK', { duration: 5000 });
        this.changed.emit();
      },
      error: (err: unknown) => this.snackBar.open(describeFailure(err).message, 'Dismiss'),
    });
  }
}
