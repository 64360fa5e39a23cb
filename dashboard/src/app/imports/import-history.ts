import { BreakpointObserver } from '@angular/cdk/layout';
import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, viewChild } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatPaginator, MatPaginatorModule } from '@angular/material/paginator';
import { MatSort, MatSortModule } from '@angular/material/sort';
import { MatTableDataSource, MatTableModule } from '@angular/material/table';
import { map } from 'rxjs';
import type { ImportJob } from '@shared/contracts/imports';
import { csvFileName, downloadCsv } from '../records/csv-download';
import { HISTORY_CSV, kindLabel, outcomeText, STATUS_LABELS } from './import-words';
import { ImportsApi, type ImportScope } from './imports-api';

/** Every import of the scope, newest first, each with its outcome and its problems report. */
@Component({
  selector: 'kl-import-history',
  template: `
    <div class="head">
      <h2 id="history-title">Import history</h2>
      <button mat-stroked-button type="button" (click)="download()" [disabled]="jobs().length === 0">Download CSV</button>
    </div>
    @if (jobs().length === 0) {
      <p class="kl-muted">No files imported yet.</p>
    } @else {
      <div class="kl-table-wrap">
        <table mat-table [dataSource]="table" matSort matSortActive="startedAt" matSortDirection="desc" aria-labelledby="history-title">
          <ng-container matColumnDef="startedAt">
            <th mat-header-cell *matHeaderCellDef mat-sort-header>Date</th>
            <td mat-cell *matCellDef="let j">{{ j.startedAt | date: 'yyyy-MM-dd HH:mm' }}</td>
          </ng-container>
          <ng-container matColumnDef="fileName">
            <th mat-header-cell *matHeaderCellDef mat-sort-header>File</th>
            <td mat-cell *matCellDef="let j" class="file">
              {{ j.fileName }}
              <span class="kl-person-detail">{{ kind(j) }}@if (isPhone()) { · {{ j.startedAt | date: 'yyyy-MM-dd' }} · {{ statusLabel(j) }} }</span>
            </td>
          </ng-container>
          <ng-container matColumnDef="userName">
            <th mat-header-cell *matHeaderCellDef mat-sort-header>By</th>
            <td mat-cell *matCellDef="let j">{{ j.userName }}</td>
          </ng-container>
          <ng-container matColumnDef="status">
            <th mat-header-cell *matHeaderCellDef mat-sort-header>Status</th>
            <td mat-cell *matCellDef="let j"><span class="status" [class.failed]="j.status === 'failed'">{{ statusLabel(j) }}</span></td>
          </ng-container>
          <ng-container matColumnDef="outcome">
            <th mat-header-cell *matHeaderCellDef>Outcome</th>
            <td mat-cell *matCellDef="let j">{{ outcome(j) }}</td>
          </ng-container>
          <ng-container matColumnDef="problems">
            <th mat-header-cell *matHeaderCellDef>Problems</th>
            <td mat-cell *matCellDef="let j">
              @if (j.summary && j.summary.errorRows + j.summary.warningRows > 0) {
                <a [href]="problemsUrl(j)" download [attr.aria-label]="'Problems of ' + j.fileName + ' (CSV)'">CSV</a>
              }
            </td>
          </ng-container>
          <tr mat-header-row *matHeaderRowDef="columns()"></tr>
          <tr mat-row *matRowDef="let row; columns: columns()"></tr>
        </table>
      </div>
      <mat-paginator [pageSize]="10" [pageSizeOptions]="[10, 25, 100]" aria-label="Pages of the import history" />
    }
  `,
  styles: `
    .head {
      display: flex;
      flex-wrap: wrap;
      align-items: center;
      justify-content: space-between;
      gap: 0.5rem;
      margin-bottom: 0.5rem;
    }
    h2 {
      margin: 0;
    }
    .file {
      overflow-wrap: anywhere;
    }
    .status.failed {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, MatButtonModule, MatPaginatorModule, MatSortModule, MatTableModule],
})
export class ImportHistory {
  private readonly api = inject(ImportsApi);
  readonly scope = input.required<ImportScope>();
  readonly jobs = input.required<readonly ImportJob[]>();

  protected readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), { initialValue: false });
  /** On a phone: which file, what came of it, its report; the date and status go under the file's name. */
  protected readonly columns = computed(() =>
    this.isPhone() ? ['fileName', 'outcome', 'problems'] : ['startedAt', 'fileName', 'userName', 'status', 'outcome', 'problems'],
  );
  protected readonly table = new MatTableDataSource<ImportJob>([]);
  private readonly sort = viewChild(MatSort);
  private readonly paginator = viewChild(MatPaginator);

  constructor() {
    effect(() => {
      this.table.data = [...this.jobs()];
    });
    effect(() => {
      this.table.sort = this.sort() ?? null;
      this.table.paginator = this.paginator() ?? null;
    });
  }

  protected kind(j: ImportJob): string {
    return kindLabel(j.kind);
  }
  protected statusLabel(j: ImportJob): string {
    return STATUS_LABELS[j.status];
  }
  protected outcome(j: ImportJob): string {
    return outcomeText(j);
  }
  protected problemsUrl(j: ImportJob): string {
    return this.api.problemsUrl(this.scope(), j.id);
  }
  protected download(): void {
    downloadCsv(csvFileName('imports', this.scope().kind, this.scope().id), this.jobs(), HISTORY_CSV);
  }
}
