import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatTableModule } from '@angular/material/table';
import { map } from 'rxjs';
import type { AnimalProfile } from '@shared/contracts/animals';
import { AWARD_LABELS, type Award } from '@shared/domain/awards';
import { AGE_CLASS_LABELS } from '@shared/domain/terms';
import { awardsText, classLabel, placingText } from '../shows/result-words';

type ShowRecord = AnimalProfile['showRecord'];

const BASIS: Record<string, string> = { 'first-in-class': 'first in class' };

/** Placings at shows, the legs they earned toward grand champion and what is still missing. */
@Component({
  selector: 'kl-show-record-panel',
  template: `
    <p class="gc" [class.done]="grandChampion()">
      @if (record().grandChampion.earned) {
        <strong>Grand champion by the legs on record</strong>
        @if (record().grandChampion.completedOn) {
          (completed {{ record().grandChampion.completedOn }}).
        }
      } @else if (record().grandChampion.recorded) {
        <strong>Recorded as grand champion.</strong>
      } @else {
        <strong>{{ record().legs.length }} leg{{ record().legs.length === 1 ? '' : 's' }}</strong> toward grand champion.
      }
    </p>
    @if (!record().grandChampion.earned && record().grandChampion.missing.length) {
      <ul class="missing">
        @for (m of record().grandChampion.missing; track m) {
          <li>{{ m }}</li>
        }
      </ul>
    }
    @if (record().legs.length) {
      <ul class="legs" aria-label="Legs">
        @for (leg of record().legs; track leg.showId + leg.basis) {
          <li>{{ leg.showDate }} · {{ basis(leg.basis) }} as {{ ageClass(leg.ageClass) }} · judge {{ leg.judge }} · {{ leg.entries }} animals from {{ leg.exhibitors }} exhibitors</li>
        }
      </ul>
    }
    <p class="kl-muted rule">Legs follow the common rule (first in class, or a best of variety or breed award, or best in show, in a competition of at least 5 animals from 3 exhibitors; 3 legs under 2 judges, one as intermediate or senior). The sanctioning body’s current rules decide.</p>

    @if (record().results.length === 0) {
      <p class="kl-muted">No show results recorded for this animal.</p>
    } @else {
      <div class="kl-table-wrap">
        <table mat-table [dataSource]="record().results" aria-label="Show results">
          <ng-container matColumnDef="date">
            <th mat-header-cell *matHeaderCellDef>Date</th>
            <td mat-cell *matCellDef="let r" class="nowrap">{{ r.showDate }}</td>
          </ng-container>
          <ng-container matColumnDef="show">
            <th mat-header-cell *matHeaderCellDef>Show</th>
            <td mat-cell *matCellDef="let r">
              {{ r.showName }}
              <span class="kl-person-detail">{{ isPhone() ? r.showDate + ' · ' + classOf(r) : r.judge ? 'judge ' + r.judge : '' }}</span>
            </td>
          </ng-container>
          <ng-container matColumnDef="class">
            <th mat-header-cell *matHeaderCellDef>Class</th>
            <td mat-cell *matCellDef="let r">
              {{ classOf(r) }}
              @if (r.ageClassMismatch) {
                <span class="mismatch">By the birth date: {{ ageClass(r.computedAgeClass) }}</span>
              }
            </td>
          </ng-container>
          <ng-container matColumnDef="placing">
            <th mat-header-cell *matHeaderCellDef>Placing</th>
            <td mat-cell *matCellDef="let r" class="nowrap">
              {{ placing(r) }} <span class="kl-person-detail">{{ r.exhibitorsInClass }} exhibitors</span>
              @if (isPhone()) {
                @for (a of r.awards; track a) {
                  <abbr class="kl-role" [title]="label(a)">{{ a }}</abbr>{{ $last ? '' : ' ' }}
                }
              }
            </td>
          </ng-container>
          <ng-container matColumnDef="awards">
            <th mat-header-cell *matHeaderCellDef>Awards</th>
            <td mat-cell *matCellDef="let r" [title]="awardWords(r.awards)">
              @for (a of r.awards; track a) {
                <abbr class="kl-role" [title]="label(a)">{{ a }}</abbr>{{ $last ? '' : ' ' }}
              }
            </td>
          </ng-container>
          <tr mat-header-row *matHeaderRowDef="columns()"></tr>
          <tr mat-row *matRowDef="let row; columns: columns()"></tr>
        </table>
      </div>
    }
  `,
  styles: `
    .gc {
      margin: 0 0 0.5rem;
    }
    .gc.done strong {
      color: var(--mat-sys-primary);
    }
    .missing,
    .legs {
      margin: 0 0 0.5rem;
      padding-left: 1.25rem;
      font: var(--mat-sys-body-medium);
    }
    .rule {
      font: var(--mat-sys-body-small);
    }
    .mismatch {
      display: block;
      color: var(--mat-sys-error);
      font: var(--mat-sys-body-small);
    }
    abbr {
      text-decoration: none;
    }
    .nowrap {
      white-space: nowrap;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule],
})
export class ShowRecordPanel {
  readonly record = input.required<ShowRecord>();
  protected readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), { initialValue: false });
  /** On a phone the date and class go under the show's name and the awards under the placing. */
  protected readonly columns = computed(() => (this.isPhone() ? ['show', 'placing'] : ['date', 'show', 'class', 'placing', 'awards']));
  protected readonly grandChampion = computed(() => this.record().grandChampion.earned || this.record().grandChampion.recorded);

  protected classOf(r: ShowRecord['results'][number]): string {
    return classLabel(r);
  }
  protected placing(r: ShowRecord['results'][number]): string {
    return placingText(r.placing, r.entriesInClass);
  }
  protected label(a: Award): string {
    return AWARD_LABELS[a];
  }
  protected awardWords(awards: Award[]): string {
    return awardsText(awards);
  }
  protected ageClass(c: keyof typeof AGE_CLASS_LABELS | null): string {
    return c ? AGE_CLASS_LABELS[c].toLowerCase() : 'unknown';
  }
  protected basis(b: string): string {
    return BASIS[b] ?? (b in AWARD_LABELS ? AWARD_LABELS[b as Award].toLowerCase() : b);
  }
}
