import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { ClubSummary } from '../club/club-summary';
import { ClubsApi } from '../club/clubs-api';
import { RabbitriesApi } from '../rabbitry/rabbitries-api';
import { RabbitrySummary } from '../rabbitry/rabbitry-summary';
import { Session } from '../session/session';
import { LoadError } from '../status/load-error';

@Component({
  selector: 'kl-home',
  templateUrl: './home.html',
  styleUrl: './home.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, MatCardModule, MatProgressBarModule, RouterLink, LoadError, RabbitrySummary, ClubSummary],
})
export class Home {
  protected readonly user = inject(Session).user;
  protected readonly rabbitries = inject(RabbitriesApi).list();
  protected readonly clubs = inject(ClubsApi).list();
  protected readonly loading = computed(
    () => (this.rabbitries.isLoading() && !this.rabbitries.hasValue()) || (this.clubs.isLoading() && !this.clubs.hasValue()),
  );
  /** Both lists arrived and both are empty: the breeder has been given no access yet. */
  protected readonly belongsNowhere = computed(
    () => this.rabbitries.value()?.length === 0 && this.clubs.value()?.length === 0,
  );
}
