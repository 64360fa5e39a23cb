import type { EntityManager } from 'typeorm';
import type { ImportCheckOptions } from '@shared/contracts/imports';
import type { ImportRecords, RowValidation } from '@shared/imports/import-records';
import type { ImportKindKey } from '@shared/imports/import-kinds';

/** Collects row problems and counts during a check (see imports.service.ts). */
export interface CheckReport {
  problem(row: number, field: string, message: string, severity: 'error' | 'warning'): void;
  newRows: number;
  alreadyPresent: number;
  skippedRows: number;
  stubsToCreate: number;
}

/**
 * What differs between import kinds. The service runs the common loop (read, map, validate,
 * drop in-file duplicates); a kind importer classifies each valid record against the
 * database, and writes the records in the commit transaction.
 */
export interface KindImporter<K extends ImportKindKey> {
  validate(mapped: Record<string, string>): RowValidation<ImportRecords[K]>;
  /** Called once per valid, first-in-file record; `keyHash` is its dedupe key's hash. */
  accept(record: ImportRecords[K], row: number, keyHash: string, report: CheckReport): void;
  /** After the last row: cross-row checks (parents later in the file), staging files. */
  finishCheck(report: CheckReport): Promise<void>;
  /** Writes what the check accepted; returns how many records were new. */
  commit(tx: EntityManager): Promise<number>;
}

export interface ImporterContext {
  scopeId: number;
  jobId: number;
  userId: number;
  options: ImportCheckOptions;
  unitSetting: 'lb-oz' | 'kg';
  today: string;
  stagingDir: string;
}
