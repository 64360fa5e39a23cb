import { ChangeDetectionStrategy, Component, computed, effect, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormArray, FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { finalize, startWith } from 'rxjs';
import type { AnimalSummary } from '@shared/contracts/animals';
import type { Litter } from '@shared/contracts/litters';
import type { Sex } from '@shared/domain/terms';
import { showFieldErrors } from '../forms/field-errors';
import { validateAsYouType } from '../forms/validate-as-you-type';
import { describeFailure } from '../status/describe-failure';
import { kitEarIds } from './litter-words';
import { LittersApi } from './litters-api';

export interface AddKitsData {
  rabbitryId: string;
  litter: Litter;
}

/** Records a litter's kits as animals of the herd: ear IDs in a run, one sex per kit. */
@Component({
  selector: 'kl-add-kits',
  // Dialogs hang off the root injector, outside the frame's provider; the chips module brings the default matcher.
  providers: [validateAsYouType],
  templateUrl: './add-kits.html',
  styles: `
    .sexes {
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(9rem, 1fr));
      gap: 0 0.75rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule],
})
export class AddKits {
  private readonly api = inject(LittersApi);
  private readonly dialog = inject<MatDialogRef<AddKits, AnimalSummary[]>>(MatDialogRef);
  protected readonly data = inject<AddKitsData>(MAT_DIALOG_DATA);
  /** Born alive minus kits already recorded, when the litter says how many were born alive. */
  protected readonly room = this.data.litter.bornAlive === null ? 20 : Math.max(0, this.data.litter.bornAlive - this.data.litter.kitsRecorded);

  protected readonly form = new FormGroup({
    count: new FormControl(Math.min(this.room, 20) || 1, { nonNullable: true, validators: [Validators.required, Validators.min(1), Validators.max(Math.min(this.room, 20))] }),
    earIdPrefix: new FormControl(`${this.data.litter.code}-`, { nonNullable: true, validators: [Validators.required, Validators.maxLength(28)] }),
    firstNumber: new FormControl(this.data.litter.kitsRecorded + 1, { nonNullable: true, validators: [Validators.required, Validators.min(0), Validators.max(9999)] }),
    sexes: new FormArray<FormControl<Sex | ''>>([]),
  });
  private readonly value = toSignal(this.form.valueChanges.pipe(startWith(this.form.value)), { initialValue: this.form.value });
  protected readonly earIds = computed(() => {
    const v = this.value();
    return kitEarIds(v.earIdPrefix ?? '', Number(v.firstNumber), Number(v.count));
  });
  protected readonly saving = signal(false);
  protected readonly failure = signal<string | null>(null);

  constructor() {
    // One sex box per kit, kept in step with the count.
    effect(() => {
      const n = this.earIds().length;
      const sexes = this.form.controls.sexes;
      while (sexes.length < n) sexes.push(new FormControl<Sex | ''>('', { nonNullable: true, validators: Validators.required }), { emitEvent: false });
      while (sexes.length > n) sexes.removeAt(sexes.length - 1, { emitEvent: false });
    });
  }

  protected save(): void {
    if (this.saving()) return;
    if (this.form.invalid) {
      this.form.markAllAsDirty();
      return;
    }
    const v = this.form.getRawValue();
    this.saving.set(true);
    this.failure.set(null);
    this.api
      .addKits(this.data.rabbitryId, this.data.litter.id, {
        count: v.count,
        earIdPrefix: v.earIdPrefix.trim(),
        firstNumber: v.firstNumber,
        sexes: v.sexes as Sex[],
      })
      .pipe(finalize(() => this.saving.set(false)))
      .subscribe({
        next: (kits) => this.dialog.close(kits),
        error: (err: unknown) => {
          const failure = describeFailure(err);
          showFieldErrors(this.form, failure.fields);
          this.failure.set(failure.message);
        },
      });
  }
}
