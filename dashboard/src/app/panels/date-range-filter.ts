import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

/**
 * A filter's pair of dates (ISO, as the date inputs give them), under the panel's own labels
 * ("Born from", "Shows from"). Each end reports its own change; a cleared end reports undefined.
 */
@Component({
  selector: 'kl-date-range-filter',
  template: `
    <mat-form-field appearance="outline" subscriptSizing="dynamic">
      <mat-label>{{ fromLabel() }}</mat-label>
      <input matInput type="date" name="from" [value]="from() ?? ''" (change)="fromChange.emit(dateOf($event))" />
    </mat-form-field>
    <mat-form-field appearance="outline" subscriptSizing="dynamic">
      <mat-label>{{ toLabel() }}</mat-label>
      <input matInput type="date" name="to" [value]="to() ?? ''" (change)="toChange.emit(dateOf($event))" />
    </mat-form-field>
  `,
  styleUrl: './filter-field.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatFormFieldModule, MatInputModule],
})
export class DateRangeFilter {
  readonly fromLabel = input.required<string>();
  readonly toLabel = input.required<string>();
  readonly from = input<string | undefined>();
  readonly to = input<string | undefined>();
  readonly fromChange = output<string | undefined>();
  readonly toChange = output<string | undefined>();

  protected dateOf(event: Event): string | undefined {
    return (event.target as HTMLInputElement).value || undefined;
  }
}
