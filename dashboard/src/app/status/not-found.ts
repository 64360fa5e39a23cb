import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';

@Component({
  selector: 'kl-not-found',
  template: `
    <section class="kl-page" aria-labelledby="not-found-title">
      <h1 id="not-found-title">Nothing here</h1>
      <p class="kl-lede">
        This page does not exist, or it belongs to a rabbitry or club you have no access to.
        Access is granted by people: a rabbitry’s owner adds partners and mentors, a club officer adds members.
      </p>
      <a mat-flat-button routerLink="/">Back to your overview</a>
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, RouterLink],
})
export class NotFound {}
