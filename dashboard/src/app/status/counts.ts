import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';

export interface Count {
  label: string;
  value: number;
}

/** Big numbers with small labels, for the overview cards. */
@Component({
  selector: 'kl-counts',
  template: `
    <dl class="counts">
      @for (count of counts(); track count.label) {
        <div>
          <dt>{{ count.label }}</dt>
          <dd>{{ count.value | number }}</dd>
        </div>
      }
    </dl>
  `,
  styles: `
    .counts {
      display: flex;
      flex-wrap: wrap;
      gap: 0.5rem 2rem;
      margin: 0;
    }
    dt {
      font: var(--mat-sys-label-large);
      color: var(--mat-sys-on-surface-variant);
    }
    dd {
      margin: 0;
      font: var(--mat-sys-headline-medium);
      font-variant-numeric: tabular-nums;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DecimalPipe],
})
export class Counts {
  readonly counts = input.required<readonly Count[]>();
}
