import { ChangeDetectionStrategy, Component, OnInit, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';

const storageKey = (key: string) => `kl.cautions-hidden.${key}`;

function readHidden(key: string): boolean {
  try {
    return localStorage.getItem(storageKey(key)) === '1';
  } catch {
    return false; // storage refused (private window): the note simply shows
  }
}

/**
 * The usual cautions beside breeding advice, in a short note the breeder can put away. Once
 * hidden it stays hidden in this browser for this kind of screen (`key`), with a button to bring
 * it back, so a regular user is not nagged and a new one still reads it first.
 */
@Component({
  selector: 'kl-caution-note',
  template: `
    @if (hidden()) {
      <button mat-button type="button" class="again" (click)="show(true)">Show the breeding cautions</button>
    } @else {
      <aside class="caution" [attr.aria-label]="title()">
        <h2>{{ title() }}</h2>
        <ul>
          @for (caution of cautions(); track caution) {
            <li>{{ caution }}</li>
          }
        </ul>
        <button mat-stroked-button type="button" (click)="show(false)">Hide these cautions</button>
      </aside>
    }
  `,
  styles: `
    :host {
      display: block;
    }
    .caution {
      padding: 0.75rem 1rem;
      border-radius: var(--mat-sys-corner-medium);
      border-inline-start: 4px solid var(--mat-sys-tertiary);
      background: var(--mat-sys-surface-container);
      color: var(--mat-sys-on-surface);
    }
    h2 {
      font: var(--mat-sys-title-small);
    }
    ul {
      margin: 0 0 0.75rem;
      padding-inline-start: 1.25rem;
      font: var(--mat-sys-body-medium);
    }
    li + li {
      margin-top: 0.25rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule],
})
export class CautionNote implements OnInit {
  readonly cautions = input.required<readonly string[]>();
  readonly key = input.required<string>();
  readonly title = input('Before you decide');
  protected readonly hidden = signal(false);

  ngOnInit(): void {
    this.hidden.set(readHidden(this.key()));
  }

  protected show(visible: boolean): void {
    this.hidden.set(!visible);
    try {
      if (visible) localStorage.removeItem(storageKey(this.key()));
      else localStorage.setItem(storageKey(this.key()), '1');
    } catch {
      /* storage refused: hidden for this visit only */
    }
  }
}
