import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { Club } from '@shared/contracts/clubs';
import { Counts } from '../status/counts';

/** A club's season and counts, or a calm note while no results are imported yet. */
@Component({
  selector: 'kl-club-summary',
  template: `
    @if (club().seasonStart && club().seasonEnd) {
      <!-- Season dates are calendar dates: shown as written, never shifted by the viewer's time zone. -->
      <p class="kl-muted">
        Season {{ club().seasonStart | date: 'mediumDate' : 'UTC' }} – {{ club().seasonEnd | date: 'mediumDate' : 'UTC' }}
      </p>
    }
    @if (club().counts.results === 0) {
      <p class="kl-muted">No show results imported for this season yet.</p>
    } @else {
      <kl-counts [counts]="counts()" />
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [Counts, DatePipe],
})
export class ClubSummary {
  readonly club = input.required<Club>();
  protected readonly counts = computed(() => [
    { label: 'Shows', value: this.club().counts.shows },
    { label: 'Results', value: this.club().counts.results },
    { label: 'Members', value: this.club().counts.members },
  ]);
}
