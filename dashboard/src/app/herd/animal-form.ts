import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators, type ValidatorFn } from '@angular/forms';
import { MatAutocompleteModule } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { debounceTime, finalize } from 'rxjs';
import { Animal, EarId } from '@shared/contracts/animals';
import { showFieldErrors } from '../forms/field-errors';
import { validateAsYouType } from '../forms/validate-as-you-type';
import { zodValidator } from '../forms/zod-validator';
import { BreedsApi } from '../breeds/breeds-api';
import { pastDateValidator } from '../records/date-input';
import { describeFailure } from '../status/describe-failure';
import { animalChange, animalFormValue, newAnimalRequest, type EditedAnimal } from './animal-request';
import { HerdApi } from './herd-api';
import { lineCounts, linesMatching } from './herd-lines';

export interface AnimalFormData {
  rabbitryId: string;
  /** Absent for a new animal. */
  animal?: EditedAnimal;
}

const optional = (validator: ValidatorFn): ValidatorFn => (control) =>
  String(control.value ?? '').trim() === '' ? null : validator(control);

/** Adds an animal to the herd or edits one; closes with the saved record. */
@Component({
  selector: 'kl-animal-form',
  // Dialogs hang off the root injector, outside the frame's provider; the chips module brings the default matcher.
  providers: [validateAsYouType],
  templateUrl: './animal-form.html',
  styleUrl: './animal-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatAutocompleteModule,
    MatButtonModule,
    MatCheckboxModule,
    MatDialogModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
  ],
})
export class AnimalForm {
  private readonly api = inject(HerdApi);
  private readonly dialog = inject<MatDialogRef<AnimalForm, Animal>>(MatDialogRef);
  protected readonly data = inject<AnimalFormData>(MAT_DIALOG_DATA);
  protected readonly editing = !!this.data.animal;
  protected readonly breeds = inject(BreedsApi).list();

  private readonly start = animalFormValue(this.data.animal ?? null);
  protected readonly form = inject(NonNullableFormBuilder).group({
    earId: [this.start.earId, zodValidator(EarId)],
    sex: [this.start.sex, Validators.required],
    name: [this.start.name, Validators.maxLength(120)],
    breedId: [this.start.breedId as number | null],
    variety: [this.start.variety, Validators.maxLength(80)],
    birthDate: [this.start.birthDate, pastDateValidator(false)],
    sireEarId: [this.start.sireEarId, optional(zodValidator(EarId))],
    damEarId: [this.start.damEarId, optional(zodValidator(EarId))],
    createStubs: [false],
    line: [this.start.line, Validators.maxLength(80)],
    registrationNo: [this.start.registrationNo, Validators.maxLength(40)],
    notes: [this.start.notes, Validators.maxLength(5000)],
  });

  private readonly breedId = toSignal(this.form.controls.breedId.valueChanges, { initialValue: this.start.breedId });
  protected readonly varieties = computed(() => {
    const breed = this.breeds.value()?.find((b) => b.id === this.breedId());
    return breed?.varieties ?? [];
  });
  private readonly typed = (name: 'sireEarId' | 'damEarId') =>
    toSignal(this.form.controls[name].valueChanges.pipe(debounceTime(250)), { initialValue: '' });
  protected readonly sires = this.api.parentsMatching(() => this.data.rabbitryId, 'buck', this.typed('sireEarId'));
  protected readonly dams = this.api.parentsMatching(() => this.data.rabbitryId, 'doe', this.typed('damEarId'));

  private readonly lines = this.api.lines(() => this.data.rabbitryId);
  private readonly lineTyped = toSignal(this.form.controls.line.valueChanges, { initialValue: this.start.line });
  protected readonly lineChoices = computed(() => linesMatching(this.lines.hasValue() ? this.lines.value() : [], this.lineTyped()));
  protected readonly lineCounts = lineCounts;

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
    const request = this.data.animal
      ? this.api.update(this.data.rabbitryId, this.data.animal.id, animalChange(value, this.data.animal))
      : this.api.create(this.data.rabbitryId, newAnimalRequest(value));
    request.pipe(finalize(() => this.saving.set(false))).subscribe({
      next: (animal) => this.dialog.close(animal),
      error: (err: unknown) => {
        const failure = describeFailure(err);
        // The message stays in view too: a field's note alone may sit below the fold on a phone.
        showFieldErrors(this.form, failure.fields);
        this.failure.set(failure.message);
      },
    });
  }
}
