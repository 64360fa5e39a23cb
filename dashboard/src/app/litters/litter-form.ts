import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators, type ValidatorFn } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { finalize } from 'rxjs';
import { EarId } from '@shared/contracts/animals';
import { KINDLING_CAUTION, type Litter } from '@shared/contracts/litters';
import { parseIsoDate } from '@shared/domain/calendar-date';
import { kindlingWindow } from '@shared/domain/gestation';
import type { UnitSetting } from '@shared/units/weight';
import { showFieldErrors } from '../forms/field-errors';
import { validateAsYouType } from '../forms/validate-as-you-type';
import { zodValidator } from '../forms/zod-validator';
import { pastDateValidator } from '../records/date-input';
import { weightEcho, weightValidator } from '../records/weight-input';
import { describeFailure } from '../status/describe-failure';
import { expectedText, rangeText } from './litter-words';
import { litterChange, litterFormValue, newLitterRequest } from './litter-request';
import { LittersApi } from './litters-api';

export interface LitterFormData {
  rabbitryId: string;
  unit: UnitSetting;
  litter?: Litter;
}

const optional = (validator: ValidatorFn): ValidatorFn => (c) => (String(c.value ?? '').trim() === '' ? null : validator(c));
const count = [Validators.min(0), Validators.max(30)];

/** Records a breeding and, later, the kindling and weaning of the litter. */
@Component({
  selector: 'kl-litter-form',
  // Dialogs hang off the root injector, outside the frame's provider; the chips module brings the default matcher.
  providers: [validateAsYouType],
  templateUrl: './litter-form.html',
  styles: '.notes { width: 100%; }',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule],
})
export class LitterForm {
  private readonly api = inject(LittersApi);
  private readonly dialog = inject<MatDialogRef<LitterForm, Litter>>(MatDialogRef);
  protected readonly data = inject<LitterFormData>(MAT_DIALOG_DATA);
  protected readonly caution = KINDLING_CAUTION;

  private readonly start = litterFormValue(this.data.litter ?? null, this.data.unit);
  protected readonly form = inject(NonNullableFormBuilder).group({
    code: [this.start.code, Validators.maxLength(40)],
    sireEarId: [this.start.sireEarId, optional(zodValidator(EarId))],
    damEarId: [this.start.damEarId, optional(zodValidator(EarId))],
    bredOn: [this.start.bredOn, pastDateValidator(false)],
    kindledOn: [this.start.kindledOn, pastDateValidator(false)],
    bornAlive: [this.start.bornAlive, count],
    bornDead: [this.start.bornDead, count],
    weaned: [this.start.weaned, count],
    weight21d: [this.start.weight21d, weightValidator(() => this.data.unit, false)],
    notes: [this.start.notes, Validators.maxLength(5000)],
  });
  private readonly bredOn = toSignal(this.form.controls.bredOn.valueChanges, { initialValue: this.start.bredOn });
  private readonly weightText = toSignal(this.form.controls.weight21d.valueChanges, { initialValue: this.start.weight21d });
  protected readonly window = computed(() => {
    const bred = this.bredOn();
    if (!parseIsoDate(bred)) return null;
    const w = { kindlingWindow: kindlingWindow(bred) };
    return { expected: expectedText(w), range: rangeText(w) };
  });
  protected readonly weightEcho = computed(() => weightEcho(this.weightText(), this.data.unit));
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
    const value = this.form.getRawValue();
    const litter = this.data.litter;
    const request = litter
      ? this.api.update(this.data.rabbitryId, litter.id, litterChange(value, litter, this.data.unit))
      : this.api.create(this.data.rabbitryId, newLitterRequest(value));
    request.pipe(finalize(() => this.saving.set(false))).subscribe({
      next: (saved) => this.dialog.close(saved),
      error: (err: unknown) => {
        const failure = describeFailure(err);
        showFieldErrors(this.form, failure.fields);
        this.failure.set(failure.message);
      },
    });
  }
}
