import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { MatSnackBar } from '@angular/material/snack-bar';
import { finalize } from 'rxjs';
import * as z from 'zod';
import { DateOrder, UpdatePreferencesRequest, WeightUnit } from '@shared/contracts/session';
import { showFieldErrors } from '../forms/field-errors';
import { zodValidator } from '../forms/zod-validator';
import { Session } from '../session/session';
import { describeFailure } from '../status/describe-failure';

type Unit = z.infer<typeof WeightUnit>;
type Order = z.infer<typeof DateOrder>;

@Component({
  selector: 'kl-preferences',
  templateUrl: './preferences.html',
  styleUrl: './preferences.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatRadioModule],
})
export class Preferences {
  private readonly session = inject(Session);
  private readonly snackBar = inject(MatSnackBar);
  private readonly user = this.session.user();

  protected readonly form = inject(NonNullableFormBuilder).group({
    displayName: [this.user?.displayName ?? '', zodValidator(UpdatePreferencesRequest.shape.displayName.unwrap())],
    weightUnit: [this.user?.weightUnit ?? ('lb-oz' as Unit), zodValidator(WeightUnit)],
    dateOrder: [this.user?.dateOrder ?? ('iso' as Order), zodValidator(DateOrder)],
  });
  protected readonly saving = signal(false);
  protected readonly failure = signal<string | null>(null);

  protected save(): void {
    if (this.saving()) return;
    if (this.form.invalid) {
      this.form.markAllAsDirty();
      return;
    }
    this.saving.set(true);
    this.failure.set(null);
    this.session
      .updatePreferences(UpdatePreferencesRequest.parse(this.form.getRawValue()))
      .pipe(finalize(() => this.saving.set(false)))
      .subscribe({
        next: (user) => {
          this.form.reset({ displayName: user.displayName, weightUnit: user.weightUnit, dateOrder: user.dateOrder });
          this.snackBar.open('Preferences saved.', 'OK', { duration: 4000 });
        },
        error: (err: unknown) => {
          const failure = describeFailure(err);
          if (!showFieldErrors(this.form, failure.fields)) this.failure.set(failure.message);
        },
      });
  }
}
