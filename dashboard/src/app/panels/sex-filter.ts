import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import type { Sex } from '@shared/domain/terms';

/** A filter's choice of bucks, does or both, under the panel's own label ("Animals", "Offspring"). */
@Component({
  selector: 'kl-sex-filter',
  template: `
    <mat-form-field appearance="outline" subscriptSizing="dynamic">
      <mat-label>{{ label() }}</mat-label>
      <mat-select [value]="value() ?? ''" (selectionChange)="valueChange.emit($event.value || undefined)">
        <mat-option value="">Bucks and does</mat-option>
        <mat-option value="buck">Bucks</mat-option>
        <mat-option value="doe">Does</mat-option>
      </mat-select>
    </mat-form-field>
  `,
  styleUrl: './filter-field.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatFormFieldModule, MatSelectModule],
})
export class SexFilter {
  readonly label = input.required<string>();
  /** The sex chosen; none means bucks and does. */
  readonly value = input<Sex | undefined>();
  /** The new choice; undefined for bucks and does. */
  readonly valueChange = output<Sex | undefined>();
}
