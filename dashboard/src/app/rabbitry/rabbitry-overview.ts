import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { ROLE_DESCRIPTIONS } from '@shared/contracts/roles';
import { LoadError } from '../status/load-error';
import { RabbitriesApi } from './rabbitries-api';
import { RabbitrySummary } from './rabbitry-summary';

@Component({
  selector: 'kl-rabbitry-overview',
  template: `
    <section class="kl-page" aria-labelledby="rabbitry-title">
      @if (rabbitry.isLoading() && !rabbitry.hasValue()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading the rabbitry" />
      } @else if (rabbitry.error()) {
        <kl-load-error [error]="rabbitry.error()" what="The rabbitry could not be loaded." (retry)="rabbitry.reload()" />
      } @else if (rabbitry.value(); as r) {
        <h1 id="rabbitry-title">{{ r.name }}</h1>
        @if (r.location) {
          <p class="kl-muted">{{ r.location }}</p>
        }
        <div class="kl-block"><kl-rabbitry-summary [rabbitry]="r" /></div>
        @if (r.role) {
          <p class="kl-note kl-block">
            Your role here: <span class="kl-role">{{ r.role }}</span> {{ roleDescription() }}
          </p>
        }
        <a mat-stroked-button routerLink="access">Who has access</a>
      }
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, MatProgressBarModule, RouterLink, LoadError, RabbitrySummary],
})
export class RabbitryOverview {
  readonly rabbitryId = input.required<string>();
  protected readonly rabbitry = inject(RabbitriesApi).one(this.rabbitryId);
  protected readonly roleDescription = computed(() => {
    const role = this.rabbitry.value()?.role;
    return role ? ROLE_DESCRIPTIONS[role] : '';
  });
}
