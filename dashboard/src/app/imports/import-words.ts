import type { ImportJob, ImportStatus, ImportSummary } from '@shared/contracts/imports';
import type { CsvColumn } from '@shared/csv/to-csv';
import { importKind, type ImportKindKey } from '@shared/imports/import-kinds';

export const RUNNING: readonly ImportStatus[] = ['checking', 'committing'];
export const isRunning = (job: Pick<ImportJob, 'status'>) => RUNNING.includes(job.status);

export const STATUS_LABELS: Record<ImportStatus, string> = {
  uploaded: 'Uploaded, not checked',
  checking: 'Checking',
  checked: 'Checked, not imported',
  committing: 'Importing',
  done: 'Imported',
  failed: 'Stopped',
};

/** The kinds each scope imports, as the API allows them. */
export const KINDS_FOR: Record<'rabbitry' | 'club', readonly ImportKindKey[]> = {
  rabbitry: ['animals', 'weights', 'litters', 'evaluations'],
  club: ['results'],
};

export function kindLabel(kind: ImportKindKey): string {
  return importKind(kind).label;
}

export interface Progress {
  /** A share reported by the API: a bar that fills; else a moving bar with the rows so far. */
  mode: 'determinate' | 'indeterminate';
  percent: number;
  text: string;
}

/**
 * Progress of a running job from what the API reports: the share of the step done
 * (`progress`: bytes of the file read while checking, rows written while importing) and the
 * rows handled (`processedRows`), with the new rows of the check as the total of an import.
 * The percentage is rounded down, so 100% only shows once the step has finished. O(1).
 */
export function progressOf(job: Pick<ImportJob, 'status' | 'processedRows' | 'progress' | 'summary'>): Progress {
  const n = (x: number) => x.toLocaleString('en-US');
  const importing = job.status === 'committing';
  if (job.progress === null) {
    return { mode: 'indeterminate', percent: 0, text: `${importing ? 'Importing' : 'Checking'}: ${n(job.processedRows)} rows so far` };
  }
  const percent = Math.min(99, Math.floor(job.progress * 100));
  if (!importing) return { mode: 'determinate', percent, text: `Checking: ${n(job.processedRows)} rows read (${percent}%)` };
  const total = job.summary?.newRows ?? 0;
  const rows = job.processedRows > 0 && total > 0 ? `${n(Math.min(job.processedRows, total))} of ${n(total)} new rows, ` : '';
  return { mode: 'determinate', percent, text: `Importing: ${rows}${percent}%` };
}

export interface SummaryCount {
  label: string;
  value: number;
  tone: 'plain' | 'error' | 'warning';
}

/** The check's counts in the order a breeder reads them; zero warnings and stubs are left out. */
export function summaryCounts(s: ImportSummary): SummaryCount[] {
  const all: (SummaryCount & { keep: boolean })[] = [
    { label: 'Rows read', value: s.totalRows, tone: 'plain', keep: true },
    { label: 'New', value: s.newRows, tone: 'plain', keep: true },
    { label: 'Already present', value: s.alreadyPresent, tone: 'plain', keep: true },
    { label: 'Repeated in the file', value: s.duplicatesInFile, tone: 'warning', keep: s.duplicatesInFile > 0 },
    { label: 'Rows with errors', value: s.errorRows, tone: 'error', keep: true },
    { label: 'Rows with warnings', value: s.warningRows, tone: 'warning', keep: s.warningRows > 0 },
    { label: 'Rows skipped', value: s.skippedRows, tone: 'warning', keep: s.skippedRows > 0 },
    { label: 'Outside parents (stubs) to create', value: s.stubsToCreate, tone: 'plain', keep: s.stubsToCreate > 0 },
  ];
  return all.filter((c) => c.keep).map(({ keep: _keep, ...c }) => c);
}

/** A history row's outcome in a few words. */
export function outcomeText(job: Pick<ImportJob, 'status' | 'message' | 'summary'>): string {
  if (job.status === 'done' || job.status === 'failed') return job.message ?? '';
  const s = job.summary;
  if (!s) return '';
  const parts = [`${s.newRows} new`, `${s.alreadyPresent} already present`];
  if (s.errorRows) parts.push(`${s.errorRows} with errors`);
  return parts.join(', ');
}

export const HISTORY_CSV: readonly CsvColumn<ImportJob>[] = [
  { header: 'Started', value: (j) => j.startedAt },
  { header: 'File', value: (j) => j.fileName },
  { header: 'Kind', value: (j) => kindLabel(j.kind) },
  { header: 'By', value: (j) => j.userName },
  { header: 'Status', value: (j) => STATUS_LABELS[j.status] },
  { header: 'Rows', value: (j) => j.summary?.totalRows ?? null },
  { header: 'New', value: (j) => j.summary?.newRows ?? null },
  { header: 'Already present', value: (j) => j.summary?.alreadyPresent ?? null },
  { header: 'Rows with errors', value: (j) => j.summary?.errorRows ?? null },
  { header: 'Outcome', value: (j) => outcomeText(j) },
];
