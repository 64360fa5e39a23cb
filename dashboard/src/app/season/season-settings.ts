import { ChangeDetectionStrategy, Component, DestroyRef, OnInit, computed, inject, input, output, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormArray, FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSnackBar } from '@angular/material/snack-bar';
import { DEFAULT_POINTS_FORMULA, type PointsFormula, type SeasonSettings } from '@shared/contracts/analytics';
import { AWARD_LABELS, AWARDS, type Award } from '@shared/domain/awards';
import { describeFailure } from '../status/describe-failure';
import { SeasonApi } from './season-api';
import { checkSeasonForm, describeFormula, type FormulaKind, ordinal, seasonFormFrom, type SeasonFormValue } from './season-form';

const MAX_PLACES = 20;

/**
 * The officers' editor of the season dates and the points formula, checked as they type with
 * the API's own schema; the default formula is the common show-rule base.
 */
@Component({
  selector: 'kl-season-settings',
  templateUrl: './season-settings.html',
  styleUrl: './season-settings.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatInputModule],
})
export class SeasonSettingsEditor implements OnInit {
  private readonly api = inject(SeasonApi);
  private readonly snackBar = inject(MatSnackBar);
  private readonly destroyed = inject(DestroyRef);

  readonly clubId = input.required<string>();
  readonly seasonStart = input.required<string | null>();
  readonly seasonEnd = input.required<string | null>();
  /** The club's own formula, or null when it keeps the default. */
  readonly formula = input.required<PointsFormula | null>();
  readonly saved = output<SeasonSettings>();

  protected readonly awards = AWARDS.map((key) => ({ key, label: AWARD_LABELS[key] }));
  protected readonly ordinal = ordinal;
  protected readonly form = new FormGroup({
    seasonStart: new FormControl('', { nonNullable: true }),
    seasonEnd: new FormControl('', { nonNullable: true }),
    kind: new FormControl<FormulaKind>('default', { nonNullable: true }),
    places: new FormArray<FormControl<number | null>>([]),
    bonuses: new FormGroup(Object.fromEntries(AWARDS.map((a) => [a, new FormControl<number | null>(null)])) as Record<Award, FormControl<number | null>>),
  });
  protected readonly kind = signal<FormulaKind>('default');
  protected readonly preview = signal<string[]>(describeFormula(DEFAULT_POINTS_FORMULA));
  protected readonly failure = signal<string | null>(null);
  protected readonly saving = signal(false);
  protected readonly valid = signal(true);
  protected readonly placesError = signal<string | null>(null);
  protected readonly canAddPlace = computed(() => this.kind() !== 'default');

  ngOnInit(): void {
    this.fill(seasonFormFrom({ seasonStart: this.seasonStart(), seasonEnd: this.seasonEnd() }, this.formula()));
    this.form.valueChanges.pipe(takeUntilDestroyed(this.destroyed)).subscribe(() => this.check());
    this.check();
  }

  protected get places(): FormArray<FormControl<number | null>> {
    return this.form.controls.places;
  }

  protected addPlace(): void {
    if (this.places.length >= MAX_PLACES) return;
    this.places.push(new FormControl<number | null>(this.kind() === 'multiplied' ? 0 : null));
    this.form.markAsDirty();
  }

  protected removePlace(): void {
    if (this.places.length > 1) this.places.removeAt(this.places.length - 1);
    this.form.markAsDirty();
  }

  protected error(path: string): string | null {
    const control = this.form.get(path);
    return (control?.errors?.['message'] as string | undefined) ?? null;
  }

  protected save(): void {
    const { request } = checkSeasonForm(this.value());
    if (!request) return;
    this.saving.set(true);
    this.failure.set(null);
    this.api.save(this.clubId(), request).subscribe({
      next: (settings) => {
        this.saving.set(false);
        this.form.markAsPristine();
        this.snackBar.open('Season settings saved; the standings are worked out again.', 'OK', { duration: 5000 });
        this.saved.emit(settings);
      },
      error: (err: unknown) => {
        this.saving.set(false);
        this.failure.set(describeFailure(err).message);
      },
    });
  }

  protected reset(): void {
    this.fill(seasonFormFrom({ seasonStart: this.seasonStart(), seasonEnd: this.seasonEnd() }, this.formula()));
    this.form.markAsPristine();
    this.check();
  }

  /** Puts values in the form, keeping the place controls the inputs are bound to (only their number changes). */
  private fill(value: SeasonFormValue): void {
    while (this.places.length > value.places.length) this.places.removeAt(this.places.length - 1, { emitEvent: false });
    while (this.places.length < value.places.length) this.places.push(new FormControl<number | null>(null), { emitEvent: false });
    this.form.setValue(value, { emitEvent: false });
  }

  private value(): SeasonFormValue {
    return this.form.getRawValue() as SeasonFormValue;
  }

  /** Checks the whole form and files each message on its control (controls have no validators of their own). */
  private check(): void {
    const value = this.value();
    this.kind.set(value.kind);
    // The default's places are shown, not edited.
    if (value.kind === 'default' && this.places.enabled) this.places.disable({ emitEvent: false });
    if (value.kind !== 'default' && this.places.disabled) this.places.enable({ emitEvent: false });
    const { request, errors } = checkSeasonForm(value);
    const controls: [string, FormControl<unknown>][] = [
      ['seasonStart', this.form.controls.seasonStart],
      ['seasonEnd', this.form.controls.seasonEnd],
      ...this.places.controls.map((c, i) => [`places.${i}`, c] as [string, FormControl<unknown>]),
      ...AWARDS.map((a) => [`bonuses.${a}`, this.form.controls.bonuses.controls[a]] as [string, FormControl<unknown>]),
    ];
    for (const [path, control] of controls) {
      const message = errors[path];
      control.setErrors(message ? { message } : null, { emitEvent: false });
    }
    this.placesError.set(errors['places'] ?? errors['form'] ?? null);
    this.valid.set(request !== null);
    if (request) this.preview.set(describeFormula(request.pointsFormula ?? DEFAULT_POINTS_FORMULA));
  }
}
