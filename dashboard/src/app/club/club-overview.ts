import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { ROLE_DESCRIPTIONS } from '@shared/contracts/roles';
import { LoadError } from '../status/load-error';
import { ClubSummary } from './club-summary';
import { ClubsApi } from './clubs-api';

@Component({
  selector: 'kl-club-overview',
  template: `
    <section class="kl-page" aria-labelledby="club-title">
      @if (club.isLoading() && !club.hasValue()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading the club" />
      } @else if (club.error()) {
        <kl-load-error [error]="club.error()" what="The club could not be loaded." (retry)="club.reload()" />
      } @else if (club.value(); as c) {
        <h1 id="club-title">{{ c.name }}</h1>
        @if (c.region) {
          <p class="kl-muted">{{ c.region }}</p>
        }
        <div class="kl-block"><kl-club-summary [club]="c" /></div>
        @if (c.role) {
          <p class="kl-note kl-block">
            Your role here: <span class="kl-role">{{ c.role }}</span> {{ roleDescription() }}
          </p>
        }
        <a mat-stroked-button routerLink="members">Members</a>
      }
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, MatProgressBarModule, RouterLink, LoadError, ClubSummary],
})
export class ClubOverview {
  readonly clubId = input.required<string>();
  protected readonly club = inject(ClubsApi).one(this.clubId);
  protected readonly roleDescription = computed(() => {
    const role = this.club.value()?.role;
    return role ? ROLE_DESCRIPTIONS[role] : '';
  });
}
