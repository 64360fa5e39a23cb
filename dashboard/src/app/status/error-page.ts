import { ChangeDetectionStrategy, Component, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { Router } from '@angular/router';
import { safeReturnUrl } from '../session/return-url';

/** Shown when the API could not be asked at all, so "signed out" is never guessed. */
@Component({
  selector: 'kl-error-page',
  template: `
    <main class="kl-page error-page" aria-labelledby="error-title">
      <h1 id="error-title">Keeperline could not load</h1>
      <p class="kl-lede">
        The server did not answer. Check the connection, then try again;
        if it keeps happening, tell the site’s admin.
      </p>
      <button mat-flat-button type="button" (click)="tryAgain()">Try again</button>
    </main>
  `,
  styles: `
    .error-page {
      padding-top: 15vh;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule],
})
export class ErrorPage {
  private readonly router = inject(Router);
  readonly returnUrl = input<string>();

  protected tryAgain(): void {
    void this.router.navigateByUrl(safeReturnUrl(this.returnUrl()));
  }
}
