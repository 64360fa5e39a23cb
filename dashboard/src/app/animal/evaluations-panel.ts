import { ChangeDetectionStrategy, Component, computed, effect, inject, input, output, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, FormRecord, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSnackBar } from '@angular/material/snack-bar';
import { finalize, startWith } from 'rxjs';
import type { Evaluation } from '@shared/contracts/animals';
import type { EvaluationTrait } from '@shared/domain/breed';
import { showFieldErrors } from '../forms/field-errors';
import { pastDateValidator } from '../records/date-input';
import { localToday } from '../records/describe-age';
import { describeFailure } from '../status/describe-failure';
import { AnimalApi } from './animal-api';
import { scoreText, scoringSheet } from './scoring-sheet';

/** The breeder's own scoring sheet per the breed's template, and a form to score the animal again. */
@Component({
  selector: 'kl-evaluations-panel',
  templateUrl: './evaluations-panel.html',
  styleUrl: './evaluations-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule],
})
export class EvaluationsPanel {
  private readonly api = inject(AnimalApi);
  private readonly snackBar = inject(MatSnackBar);

  readonly rabbitryId = input.required<string>();
  readonly animalId = input.required<number>();
  readonly traits = input.required<readonly EvaluationTrait[]>();
  readonly evaluations = input.required<readonly Evaluation[]>();
  readonly canEdit = input(false);
  readonly changed = output<void>();

  protected readonly sheet = computed(() => scoringSheet(this.traits(), this.evaluations()));
  protected readonly scoreText = scoreText;
  protected readonly adding = signal(false);
  protected readonly saving = signal(false);
  protected readonly failure = signal<string | null>(null);

  protected readonly form = new FormGroup({
    evaluatedOn: new FormControl(localToday(), { nonNullable: true, validators: pastDateValidator(true) }),
    evaluator: new FormControl('', { nonNullable: true, validators: Validators.maxLength(120) }),
    notes: new FormControl('', { nonNullable: true, validators: Validators.maxLength(5000) }),
    scores: new FormRecord<FormControl<number | null>>({}),
  });
  private readonly scoresValue = toSignal(this.form.controls.scores.valueChanges.pipe(startWith({})), { initialValue: {} });
  protected readonly runningTotal = computed(() => {
    this.scoresValue();
    return Object.values(this.form.controls.scores.getRawValue()).reduce<number>((s, v) => s + (typeof v === 'number' ? v : 0), 0);
  });

  constructor() {
    // One score box per trait of the template; the template can change when the breed does.
    effect(() => {
      const scores = this.form.controls.scores;
      for (const key of Object.keys(scores.controls)) scores.removeControl(key, { emitEvent: false });
      for (const t of this.traits()) {
        scores.addControl(t.key, new FormControl<number | null>(null, [Validators.min(0), Validators.max(t.points)]), { emitEvent: false });
      }
      scores.updateValueAndValidity();
    });
  }

  protected save(): void {
    if (this.saving()) return;
    const raw = this.form.getRawValue();
    const scores = Object.fromEntries(Object.entries(raw.scores).filter((e): e is [string, number] => typeof e[1] === 'number'));
    if (this.form.invalid || Object.keys(scores).length === 0) {
      this.form.markAllAsDirty();
      if (Object.keys(scores).length === 0) this.failure.set('Score at least one trait.');
      return;
    }
    this.saving.set(true);
    this.failure.set(null);
    this.api
      .addEvaluation(this.rabbitryId(), this.animalId(), {
        evaluatedOn: raw.evaluatedOn,
        evaluator: raw.evaluator.trim() || null,
        notes: raw.notes.trim() || null,
        scores,
      })
      .pipe(finalize(() => this.saving.set(false)))
      .subscribe({
        next: (saved) => {
          this.form.controls.scores.reset();
          this.form.controls.notes.reset('');
          this.adding.set(false);
          this.snackBar.open(`Evaluation of ${saved.evaluatedOn} saved: ${saved.total} of ${saved.possible} points.`, 'OK', { duration: 5000 });
          this.changed.emit();
        },
        error: (err: unknown) => {
          const failure = describeFailure(err);
          // The API names score fields "scores.<trait>", which is also their path in this form.
          showFieldErrors(this.form, failure.fields);
          this.failure.set(failure.message);
        },
      });
  }
}
