import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { Rabbitry } from '@shared/contracts/rabbitries';
import { Counts } from '../status/counts';

/** A rabbitry's counts, or what to do first when it has no animals yet. */
@Component({
  selector: 'kl-rabbitry-summary',
  template: `
    @if (rabbitry().counts.animals === 0) {
      <p class="kl-muted">No animals yet — import a file or add your first animal.</p>
    } @else {
      <kl-counts [counts]="counts()" />
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [Counts],
})
export class RabbitrySummary {
  readonly rabbitry = input.required<Rabbitry>();
  protected readonly counts = computed(() => [
    { label: 'Animals', value: this.rabbitry().counts.animals },
    { label: 'Litters', value: this.rabbitry().counts.litters },
  ]);
}
