import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { FormControl, FormGroup, FormGroupDirective, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { finalize } from 'rxjs';
import type { AnimalProfile } from '@shared/contracts/animals';
import { CreateNoteRequest } from '@shared/contracts/notes';
import { zodValidator } from '../forms/zod-validator';
import { describeFailure } from '../status/describe-failure';
import { AnimalApi } from './animal-api';

/** Notes about the animal; everyone with a role here writes them, mentors included. */
@Component({
  selector: 'kl-notes-panel',
  template: `
    <form [formGroup]="form" (ngSubmit)="add(directive)" #directive="ngForm" novalidate aria-label="Add a note">
      <mat-form-field appearance="outline" class="body">
        <mat-label>Note</mat-label>
        <textarea matInput name="noteBody" formControlName="body" rows="3"></textarea>
        <mat-error>{{ body.errors?.['message'] }}</mat-error>
      </mat-form-field>
      <div role="alert">
        @if (failure(); as message) {
          <p class="kl-form-failure">{{ message }}</p>
        }
      </div>
      <button mat-stroked-button type="submit" [disabled]="saving()">Add note</button>
    </form>
    @if (notes().length) {
      <ul class="notes">
        @for (n of notes(); track n.id) {
          <li>
            <p class="meta">{{ n.authorName }} · {{ n.createdAt | date: 'yyyy-MM-dd HH:mm' }}</p>
            <p class="text">{{ n.body }}</p>
          </li>
        }
      </ul>
    } @else {
      <p class="kl-muted">No notes yet.</p>
    }
  `,
  styles: `
    .body {
      width: 100%;
    }
    .notes {
      list-style: none;
      margin: 1rem 0 0;
      padding: 0;
      display: grid;
      gap: 0.75rem;
    }
    .meta {
      margin: 0;
      font: var(--mat-sys-label-medium);
      color: var(--mat-sys-on-surface-variant);
    }
    .text {
      margin: 0;
      white-space: pre-wrap;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule],
})
export class NotesPanel {
  private readonly api = inject(AnimalApi);
  readonly rabbitryId = input.required<string>();
  readonly animalId = input.required<number>();
  readonly notes = input.required<AnimalProfile['notes']>();
  readonly changed = output<void>();

  protected readonly body = new FormControl('', { nonNullable: true, validators: zodValidator(CreateNoteRequest.shape.body) });
  protected readonly form = new FormGroup({ body: this.body });
  protected readonly saving = signal(false);
  protected readonly failure = signal<string | null>(null);

  protected add(directive: FormGroupDirective): void {
    if (this.saving()) return;
    if (this.body.invalid) {
      this.body.markAsDirty();
      return;
    }
    this.saving.set(true);
    this.failure.set(null);
    this.api
      .addNote(this.rabbitryId(), this.animalId(), this.body.value.trim())
      .pipe(finalize(() => this.saving.set(false)))
      .subscribe({
        next: () => {
          directive.resetForm({ body: '' });
          this.changed.emit();
        },
        error: (err: unknown) => this.failure.set(describeFailure(err).message),
      });
  }
}
