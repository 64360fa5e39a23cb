import { ChangeDetectionStrategy, Component, computed, inject, input, OnInit, output, signal } from '@angular/core';
import { FormArray, FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatChipInputEvent, MatChipsModule } from '@angular/material/chips';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { finalize, startWith } from 'rxjs';
import type { BreedRecord } from '@shared/contracts/breeds';
import { AGE_CLASS_LABELS, AGE_CLASSES, type AgeClass, CLASS_SCHEME_LABELS, CLASS_SCHEMES, type ClassScheme, SEX_LABELS, SEXES, type Sex } from '@shared/domain/terms';
import { showFieldErrors } from '../forms/field-errors';
import { validateAsYouType } from '../forms/validate-as-you-type';
import { Session } from '../session/session';
import { describeFailure } from '../status/describe-failure';
import { weightValidator, example } from '../records/weight-input';
import { breedFormValue, breedFromForm, LIMIT_KEYS, templatePoints, type LimitKey, type TraitValue } from './breed-form';
import { BreedsApi } from './breeds-api';

type LimitGroup = FormGroup<Record<LimitKey, FormControl<string>>>;
type TraitGroup = FormGroup<{ key: FormControl<string>; label: FormControl<string>; points: FormControl<number | null> }>;

/** Edits one breed of the catalogue: class scheme, varieties, weight limits and scoring template. */
@Component({
  selector: 'kl-breed-editor',
  // MatChipsModule provides the default matcher; this form validates as the breeder types like every other.
  providers: [validateAsYouType],
  templateUrl: './breed-editor.html',
  styleUrl: './breed-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButtonModule, MatChipsModule, MatFormFieldModule, MatInputModule, MatRadioModule],
})
export class BreedEditor implements OnInit {
  private readonly api = inject(BreedsApi);
  private readonly session = inject(Session);
  protected readonly unit = computed(() => this.session.user()?.weightUnit ?? 'lb-oz');

  /** null: a new breed. */
  readonly breed = input.required<BreedRecord | null>();
  readonly saved = output<BreedRecord>();
  readonly cancelled = output<void>();

  protected readonly sexes = SEXES;
  protected readonly sexLabels = SEX_LABELS;
  protected readonly classLabels = AGE_CLASS_LABELS;
  protected readonly schemes = CLASS_SCHEMES.map((s) => ({ value: s, label: CLASS_SCHEME_LABELS[s] }));
  protected readonly limitKeys = LIMIT_KEYS;
  protected readonly limitLabels: Record<LimitKey, string> = { minGrams: 'Minimum', idealGrams: 'Ideal', maxGrams: 'Maximum' };

  protected form!: FormGroup<{
    name: FormControl<string>;
    classScheme: FormControl<ClassScheme>;
    source: FormControl<string>;
    varieties: FormControl<string[]>;
    limits: FormGroup<Record<Sex, FormGroup<Record<AgeClass, LimitGroup>>>>;
    traits: FormArray<TraitGroup>;
  }>;
  protected scheme = signal<ClassScheme>('four-class');
  protected readonly classes = computed(() => (this.scheme() === 'six-class' ? AGE_CLASSES : (['junior', 'senior'] as const)));
  protected readonly varieties = signal<string[]>([]);
  protected traitPoints = signal(0);
  protected readonly saving = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly example = computed(() => example(this.unit()));

  ngOnInit(): void {
    const start = breedFormValue(this.breed(), this.unit());
    const weight = () => weightValidator(() => this.unit(), false);
    const limitGroup = (sex: Sex, c: AgeClass): LimitGroup =>
      new FormGroup(Object.fromEntries(LIMIT_KEYS.map((k) => [k, new FormControl(start.limits[sex][c][k], { nonNullable: true, validators: weight() })])) as Record<LimitKey, FormControl<string>>);
    this.form = new FormGroup({
      name: new FormControl(start.name, { nonNullable: true }),
      classScheme: new FormControl(start.classScheme, { nonNullable: true }),
      source: new FormControl(start.source, { nonNullable: true }),
      varieties: new FormControl(start.varieties, { nonNullable: true }),
      limits: new FormGroup(
        Object.fromEntries(SEXES.map((sex) => [sex, new FormGroup(Object.fromEntries(AGE_CLASSES.map((c) => [c, limitGroup(sex, c)])) as Record<AgeClass, LimitGroup>)])) as Record<Sex, FormGroup<Record<AgeClass, LimitGroup>>>,
      ),
      traits: new FormArray(start.traits.map((t) => this.traitGroup(t))),
    });
    this.scheme.set(start.classScheme);
    this.varieties.set(start.varieties);
    this.form.controls.classScheme.valueChanges.subscribe((s) => this.scheme.set(s));
    this.form.controls.traits.valueChanges.pipe(startWith(null)).subscribe(() => this.traitPoints.set(templatePoints(this.form.controls.traits.getRawValue())));
  }

  protected limitControl(sex: Sex, c: AgeClass, k: LimitKey): FormControl<string> {
    return this.form.controls.limits.controls[sex].controls[c].controls[k];
  }

  protected addVariety(event: MatChipInputEvent): void {
    const value = event.value.trim();
    if (value && !this.varieties().some((v) => v.toLowerCase() === value.toLowerCase())) this.setVarieties([...this.varieties(), value]);
    event.chipInput.clear();
  }

  protected removeVariety(variety: string): void {
    this.setVarieties(this.varieties().filter((v) => v !== variety));
  }

  protected addTrait(): void {
    this.form.controls.traits.push(this.traitGroup({ key: '', label: '', points: null }));
  }

  protected removeTrait(index: number): void {
    this.form.controls.traits.removeAt(index);
  }

  protected save(): void {
    if (this.saving()) return;
    const result = breedFromForm(this.form.getRawValue(), this.unit(), this.breed());
    if (!result.ok) {
      const { form: whole, ...fields } = result.errors;
      showFieldErrors(this.form, fields);
      this.form.markAllAsDirty();
      this.failure.set(whole ?? 'Check the fields marked in red.');
      return;
    }
    this.saving.set(true);
    this.failure.set(null);
    const b = this.breed();
    (b ? this.api.update(b.id, result.breed) : this.api.create(result.breed))
      .pipe(finalize(() => this.saving.set(false)))
      .subscribe({
        next: (saved) => this.saved.emit(saved),
        error: (err: unknown) => {
          const failure = describeFailure(err);
          showFieldErrors(this.form, failure.fields);
          this.failure.set(failure.message);
        },
      });
  }

  private setVarieties(list: string[]): void {
    this.varieties.set(list);
    this.form.controls.varieties.setValue(list);
    this.form.controls.varieties.markAsDirty();
  }

  private traitGroup(t: TraitValue): TraitGroup {
    return new FormGroup({
      key: new FormControl(t.key, { nonNullable: true }),
      label: new FormControl(t.label, { nonNullable: true }),
      points: new FormControl<number | null>(t.points),
    });
  }
}
