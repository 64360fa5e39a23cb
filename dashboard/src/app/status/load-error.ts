import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { describeFailure } from './describe-failure';

/** The error state every screen shows when a read fails, with a way to try again. */
@Component({
  selector: 'kl-load-error',
  template: `
    <div class="load-error" role="alert">
      <p><strong>{{ what() }}</strong> {{ failure().message }}</p>
      <button mat-stroked-button type="button" (click)="retry.emit()">Try again</button>
    </div>
  `,
  styles: `
    .load-error {
      padding: 1rem;
      border-radius: var(--mat-sys-corner-medium);
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule],
})
export class LoadError {
  readonly error = input.required<unknown>();
  readonly what = input('This could not be loaded.');
  readonly retry = output<void>();
  protected readonly failure = computed(() => describeFailure(this.error()));
}
