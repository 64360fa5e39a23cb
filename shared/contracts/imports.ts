import * as z from 'zod';
import { evaluationTraitSchema } from '../domain/breed';
import { IMPORT_KIND_KEYS } from '../imports/import-kinds';

export const ImportKind = z.enum(IMPORT_KIND_KEYS);

/**
 * An import moves through: uploaded → checking → checked → committing → done (or failed).
 * Checking and committing run in the background; clients poll the job for progress.
 */
export const IMPORT_STATUSES = ['uploaded', 'checking', 'checked', 'committing', 'done', 'failed'] as const;
export const ImportStatus = z.enum(IMPORT_STATUSES);
export type ImportStatus = z.infer<typeof ImportStatus>;

export const RowProblem = z.object({
  row: z.number().int(),
  field: z.string(),
  message: z.string(),
  severity: z.enum(['error', 'warning']),
});
export type RowProblem = z.infer<typeof RowProblem>;

export const ImportCheckOptions = z.object({
  /** File column for each field key of the kind. */
  mapping: z.record(z.string(), z.string()),
  dateOrder: z.enum(['iso', 'mdy']).default('iso'),
  /** Ear IDs that match no animal: create stub animals for them, or skip those rows / links. */
  unknownEarIds: z.enum(['create-stubs', 'skip']).default('skip'),
});
export type ImportCheckOptions = z.infer<typeof ImportCheckOptions>;

export const ImportSummary = z.object({
  totalRows: z.number().int(),
  newRows: z.number().int(),
  alreadyPresent: z.number().int(),
  duplicatesInFile: z.number().int(),
  errorRows: z.number().int(),
  warningRows: z.number().int(),
  skippedRows: z.number().int(),
  stubsToCreate: z.number().int(),
  /** The first problems (the full list is in the downloadable report). */
  problems: z.array(RowProblem),
});
export type ImportSummary = z.infer<typeof ImportSummary>;

export const ImportJob = z.object({
  id: z.number().int(),
  kind: ImportKind,
  scopeType: z.enum(['rabbitry', 'club']),
  scopeId: z.number().int(),
  fileName: z.string(),
  status: ImportStatus,
  encoding: z.string().nullable(),
  delimiter: z.string().nullable(),
  headers: z.array(z.string()),
  sampleRows: z.array(z.array(z.string())),
  suggestedMapping: z.record(z.string(), z.string()),
  /** Evaluations: the trait columns this herd's breed templates offer (labels, highest points); null for other kinds. */
  evaluationTraits: z.array(evaluationTraitSchema).nullable(),
  /** Rows handled so far by the running check (rows read) or commit (rows written). */
  processedRows: z.number().int(),
  totalRows: z.number().int(),
  /** Share of the running check or commit done, 0–1 (bytes of the file read, rows written); null when nothing runs. */
  progress: z.number().min(0).max(1).nullable(),
  summary: ImportSummary.nullable(),
  message: z.string().nullable(),
  startedAt: z.string(),
  finishedAt: z.string().nullable(),
  userName: z.string().nullable(),
});
export type ImportJob = z.infer<typeof ImportJob>;

export const CommitOptions = z.object({
  /** Rows with errors are left out (and listed in the report) instead of stopping the import. */
  skipRowsWithErrors: z.boolean().default(false),
});
