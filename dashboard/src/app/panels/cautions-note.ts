import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, inject, input, linkedSignal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { map } from 'rxjs';
import { JUDGMENT_REMINDER } from '@shared/domain/cautions';

const storageKey = (panel: string) => `kl-cautions-hidden-${panel}`;

function hiddenFor(panel: string): boolean {
  try {
    return sessionStorage.getItem(storageKey(panel)) === '1';
  } catch {
    return false; // storage refused (a private window): the note simply shows
  }
}

/**
 * The usual cautions beside a panel that touches breeding, handling or showing (the lists live in
 * shared/domain/cautions), led by the reminder that the numbers support the breeder's judgment. A
 * short note: on a phone the list folds under its heading, and the breeder can put the note away
 * for the rest of the visit, per panel, with a button left to bring it back.
 */
@Component({
  selector: 'kl-cautions-note',
  template: `
    @if (hidden()) {
      <button mat-button type="button" class="again" (click)="setHidden(false)">Show the cautions</button>
    } @else {
      <aside class="cautions" aria-label="Cautions">
        <div class="text">
          <p class="reminder"><strong>Before you act on these numbers.</strong> {{ reminder }}</p>
          <details [open]="!isPhone()">
            <summary>{{ cautions().length }} cautions</summary>
            <ul>
              @for (line of cautions(); track line) {
                <li>{{ line }}</li>
              }
            </ul>
          </details>
        </div>
        <button mat-button type="button" (click)="setHidden(true)">Hide cautions</button>
      </aside>
    }
  `,
  styles: `
    :host {
      display: block;
      margin: 0 0 1rem;
    }
    .cautions {
      display: flex;
      flex-wrap: wrap;
      align-items: flex-start;
      justify-content: space-between;
      gap: 0 1rem;
      padding: 0.5rem 0.75rem 0.5rem 1rem;
      border-inline-start: 4px solid var(--mat-sys-tertiary);
      border-radius: var(--mat-sys-corner-small);
      background: var(--mat-sys-surface-container);
      color: var(--mat-sys-on-surface);
      font: var(--mat-sys-body-medium);
    }
    .text {
      flex: 1 1 18rem;
      min-width: 0;
    }
    ul {
      margin: 0.25rem 0 0;
      padding-inline-start: 1.2rem;
      font: var(--mat-sys-body-small);
      columns: 2 22rem;
      column-gap: 2rem;
    }
    li {
      break-inside: avoid;
    }
    summary {
      cursor: pointer;
      color: var(--mat-sys-primary);
    }
    .reminder {
      margin-bottom: 0.25rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule],
})
export class CautionsNote {
  /** Where the choice to hide is remembered for this visit: one key per panel. */
  readonly panel = input.required<string>();
  /** One of the lists of shared/domain/cautions. */
  readonly cautions = input.required<readonly string[]>();

  protected readonly reminder = JUDGMENT_REMINDER;
  protected readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), { initialValue: false });
  protected readonly hidden = linkedSignal(() => hiddenFor(this.panel()));

  protected setHidden(hidden: boolean): void {
    this.hidden.set(hidden);
    try {
      if (hidden) sessionStorage.setItem(storageKey(this.panel()), '1');
      else sessionStorage.removeItem(storageKey(this.panel()));
    } catch {
      /* storage refused: hidden on this page only */
    }
  }
}
