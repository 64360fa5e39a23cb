import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { finalize } from 'rxjs';
import type { AnimalProfile } from '@shared/contracts/animals';
import { ANIMAL_STATUSES, ANIMAL_STATUS_LABELS, type AnimalStatus } from '@shared/domain/terms';
import { showFieldErrors } from '../forms/field-errors';
import { pastDateValidator } from '../records/date-input';
import { localToday } from '../records/describe-age';
import { describeFailure } from '../status/describe-failure';
import { AnimalApi } from './animal-api';

/** Sold, deceased or culled (or back to active), with the date and a note; earlier changes listed. */
@Component({
  selector: 'kl-status-panel',
  template: `
    @if (canEdit()) {
      <form [formGroup]="form" #directive="ngForm" (ngSubmit)="save(directive)" novalidate aria-label="Change the status">
        <div class="kl-form-row">
          <mat-form-field appearance="outline">
            <mat-label>New status</mat-label>
            <mat-select formControlName="status">
              @for (s of statuses; track s) {
                <mat-option [value]="s">{{ labels[s] }}</mat-option>
              }
            </mat-select>
          </mat-form-field>
          <mat-form-field appearance="outline">
            <mat-label>On</mat-label>
            <input matInput type="date" name="changedOn" formControlName="changedOn" />
            <mat-error>{{ form.controls.changedOn.errors?.['message'] }}</mat-error>
          </mat-form-field>
        </div>
        <div class="kl-form-row">
          <mat-form-field appearance="outline">
            <mat-label>Note (buyer, cause…)</mat-label>
            <input matInput name="statusNote" formControlName="note" autocomplete="off" />
            <mat-error>At most 255 characters</mat-error>
          </mat-form-field>
          <button mat-flat-button type="submit" class="kl-form-submit" [disabled]="saving() || form.controls.status.value === current()">
            Record status
          </button>
        </div>
        <div role="alert">
          @if (failure(); as message) {
            <p class="kl-form-failure">{{ message }}</p>
          }
        </div>
      </form>
    }
    @if (history().length) {
      <ol class="history" aria-label="Status history">
        @for (h of history(); track h.id) {
          <li><strong>{{ labels[h.status] }}</strong> on {{ h.changedOn }}@if (h.note) { — {{ h.note }} }</li>
        }
      </ol>
    } @else {
      <p class="kl-muted">No status changes recorded.</p>
    }
  `,
  styles: `
    .history {
      margin: 0;
      padding-left: 1.25rem;
      font: var(--mat-sys-body-medium);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatSelectModule],
})
export class StatusPanel {
  private readonly api = inject(AnimalApi);
  private readonly snackBar = inject(MatSnackBar);

  readonly rabbitryId = input.required<string>();
  readonly animalId = input.required<number>();
  readonly current = input.required<AnimalStatus>();
  readonly history = input.required<AnimalProfile['statusHistory']>();
  readonly canEdit = input(false);
  readonly changed = output<void>();

  protected readonly statuses = ANIMAL_STATUSES;
  protected readonly labels = ANIMAL_STATUS_LABELS;
  protected readonly form = inject(NonNullableFormBuilder).group({
    status: ['sold' as AnimalStatus],
    changedOn: [localToday(), pastDateValidator(true)],
    note: ['', Validators.maxLength(255)],
  });
  protected readonly saving = signal(false);
  protected readonly failure = signal<string | null>(null);

  protected save(directive: FormGroupDirective): void {
    if (this.saving()) return;
    if (this.form.invalid) {
      this.form.markAllAsDirty();
      return;
    }
    const { status, changedOn, note } = this.form.getRawValue();
    this.saving.set(true);
    this.failure.set(null);
    this.api
      .changeStatus(this.rabbitryId(), this.animalId(), { status, changedOn, note: note.trim() || null })
      .pipe(finalize(() => this.saving.set(false)))
      .subscribe({
        next: () => {
          directive.resetForm({ status: 'sold', changedOn: localToday(), note: '' });
          this.snackBar.open(`Status recorded: ${ANIMAL_STATUS_LABELS[status].toLowerCase()} on ${changedOn}.`, 'OK', { duration: 5000 });
          this.changed.emit();
        },
        error: (err: unknown) => {
          const failure = describeFailure(err);
          if (!showFieldErrors(this.form, failure.fields)) this.failure.set(failure.message);
        },
      });
  }
}
