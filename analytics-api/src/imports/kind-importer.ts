import type { EntityManager } from 'typeorm';
import type { ImportCheckOptions } from '@shared/contracts/imports';
import type { EvaluationTrait } from '@shared/domain/breed';
import type { ImportRecords, RowValidation } from '@shared/imports/import-records';
import type { ImportKindKey } from '@shared/imports/import-kinds';
import type { ColumnIndex } from '@shared/imports/validate-row';

/** Collects row problems and counts during a check (see imports.service.ts). */
export interface CheckReport {
  problem(row: number, field: string, message: string, severity: 'error' | 'warning'): void;
  newRows: number;
  alreadyPresent: number;
  skippedRows: number;
  stubsToCreate: number;
}

/** How far a commit has got: the share done (0–1) and the rows written. */
export type CommitProgress = (fraction: number, rows: number) => void;

/**
 * What differs between import kinds. The service runs the common loop (read, validate, drop
 * in-file duplicates); a kind importer classifies each valid record against the database, and
 * writes the records in the commit transaction.
 */
export interface KindImporter<K extends ImportKindKey> {
  /** Checks one row's cells (laid out as ImporterContext.columns says). */
  validate(cells: readonly string[]): RowValidation<ImportRecords[K]>;
  /** Called once per valid, first-in-file record; `keyHash` is its dedupe key's SHA-1 in hex. */
  accept(record: ImportRecords[K], row: number, keyHash: string, report: CheckReport): void;
  /** After each chunk of rows: a chance to write out what the chunk staged. */
  endChunk?(): Promise<void>;
  /** After the last row: cross-row checks (parents later in the file), staging files. */
  finishCheck(report: CheckReport): Promise<void>;
  /** Writes what the check accepted; returns how many records were new. */
  commit(tx: EntityManager, progress: CommitProgress): Promise<number>;
}

export interface ImporterContext {
  scopeId: number;
  jobId: number;
  userId: number;
  options: ImportCheckOptions;
  /** The file's column for each mapped field. */
  columns: ColumnIndex;
  /** Evaluations: every trait the mapping may name (traitsToMap over the herd's breeds). */
  mappedTraits?: readonly EvaluationTrait[];
  unitSetting: 'lb-oz' | 'kg';
  today: string;
  stagingDir: string;
}
