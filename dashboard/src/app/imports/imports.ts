import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { map } from 'rxjs';
import { clubRoleOf, editsRecords, rabbitryRoleOf } from '../records/records-access';
import { Session } from '../session/session';
import { LoadError } from '../status/load-error';
import { ImportHistory } from './import-history';
import { ImportWizard } from './import-wizard';
import { ImportsApi, type ImportScope } from './imports-api';

/** Imports of a rabbitry's herd files or a club's show results: the wizard, then the history. */
@Component({
  selector: 'kl-imports',
  template: `
    <section class="kl-page" aria-labelledby="imports-title">
      <h1 id="imports-title">Imports</h1>
      <p class="kl-lede">
        @if (scope()?.kind === 'club') {
          Show results from a CSV file, as a show secretary saves them. A file imported twice adds nothing the second time.
        } @else {
          Animals and pedigrees, weights, litters or evaluations from a CSV file. A file imported twice adds nothing the second time.
        }
      </p>
      @if (canImport()) {
        <kl-import-wizard [scope]="scope()!" [vertical]="isPhone()" (changed)="history.reload()" />
      } @else {
        <p class="kl-note">
          @if (scope()?.kind === 'club') {
            Only the club’s officers import show results.
          } @else {
            Only the owner and partners import files; you can read the history of what was imported.
          }
        </p>
      }
      @if (showHistory()) {
        <div class="kl-section">
          @if (history.error()) {
            <kl-load-error [error]="history.error()" what="The import history could not be loaded." (retry)="history.reload()" />
          } @else if (history.hasValue()) {
            <kl-import-history [scope]="scope()!" [jobs]="history.value()" />
          } @else {
            <mat-progress-bar mode="indeterminate" aria-label="Loading the import history" />
          }
        </div>
      }
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatProgressBarModule, LoadError, ImportHistory, ImportWizard],
})
export class Imports {
  private readonly session = inject(Session);
  readonly rabbitryId = input<string>();
  readonly clubId = input<string>();

  protected readonly scope = computed<ImportScope | null>(() => {
    const r = this.rabbitryId();
    if (r) return { kind: 'rabbitry', id: r };
    const c = this.clubId();
    return c ? { kind: 'club', id: c } : null;
  });
  protected readonly canImport = computed(() => {
    const s = this.scope();
    const user = this.session.user();
    if (!s) return false;
    return s.kind === 'rabbitry' ? editsRecords(rabbitryRoleOf(user, s.id)) : clubRoleOf(user, s.id) === 'officer';
  });
  /** Every rabbitry role reads the history; in a club only officers do (the API's rule). */
  protected readonly showHistory = computed(() => this.scope()?.kind === 'rabbitry' || this.canImport());
  protected readonly history = inject(ImportsApi).history(() => (this.showHistory() ? this.scope() : null));
  protected readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), {
    initialValue: false,
  });
}
