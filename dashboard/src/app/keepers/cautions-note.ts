import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, inject, input, linkedSignal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { map } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';

/**
 * The usual cautions wherever a panel touches breeding or handling (common practice, no source).
 * Reports that carry their own (the keeper board's) pass those instead.
 */
export const PANEL_CAUTIONS: readonly string[] = [
  'Inbreeding tends to bring smaller litters and to intensify faults as well as virtues: line-breed with care.',
  'Breed a doe only once she is old and big enough for her breed; a veterinarian answers health questions.',
  'Heat stresses rabbits above about 80 °F (27 °C): avoid breeding, showing and travelling in hot weather.',
  'Support the hindquarters whenever you handle or pose a rabbit.',
  'Contagious disease travels with show stock: keep animals back from shows apart for a while, and follow local rules for sales, licensing and shows.',
];

const REMINDER = 'These numbers support your judgment; they do not replace a judge, the official breed standard or a veterinarian.';

/** A short note of the cautions that the breeder can put away for the rest of the visit; on a phone the list folds away under its heading. */
@Component({
  selector: 'kl-cautions-note',
  template: `
    @if (!dismissed()) {
      <aside class="cautions" aria-label="Cautions">
        <div class="text">
          <p class="reminder"><strong>Before you act on these numbers.</strong> {{ reminder }}</p>
          <details [open]="!isPhone()">
            <summary>{{ shown().length }} cautions for breeding and handling</summary>
            <ul>
              @for (line of shown(); track line) {
                <li>{{ line }}</li>
              }
            </ul>
          </details>
        </div>
        <button mat-button type="button" (click)="dismiss()">Hide cautions</button>
      </aside>
    }
  `,
  styles: `
    .cautions {
      display: flex;
      flex-wrap: wrap;
      align-items: flex-start;
      justify-content: space-between;
      gap: 0 1rem;
      padding: 0.5rem 0.75rem 0.5rem 1rem;
      margin: 0 0 1rem;
      border-left: 4px solid var(--mat-sys-tertiary);
      border-radius: var(--mat-sys-corner-small);
      background: var(--mat-sys-surface-container);
      font: var(--mat-sys-body-medium);
    }
    .text {
      flex: 1 1 20rem;
    }
    ul {
      margin: 0.25rem 0 0;
      padding-left: 1.2rem;
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
  /** Where the dismissal is remembered for this visit, one key per panel. */
  readonly panel = input.required<string>();
  readonly cautions = input<readonly string[] | null>(null);

  protected readonly reminder = REMINDER;
  protected readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), { initialValue: false });
  protected readonly dismissed = linkedSignal(() => sessionStorage.getItem(storageKey(this.panel())) === 'hidden');
  // A report's own cautions may hold the reminder already: it is said once, in bold.
  protected readonly shown = computed(() =>
    (this.cautions() ?? PANEL_CAUTIONS).filter((line) => !/do not replace a judge/.test(line)),
  );

  protected dismiss(): void {
    this.dismissed.set(true);
    sessionStorage.setItem(storageKey(this.panel()), 'hidden');
  }
}

const storageKey = (panel: string) => `kl-cautions-${panel}`;
