import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { ImportCheckOptions, ImportStatus, ImportSummary } from '@shared/contracts/imports';
import type { EvaluationTrait } from '@shared/domain/breed';

@Entity('import_job')
@Index(['scopeType', 'scopeId'])
export class ImportJob {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'varchar', length: 16 }) kind: string;
  @Column({ type: 'varchar', length: 8, name: 'scope_type' }) scopeType: 'rabbitry' | 'club';
  @Column({ type: 'int', name: 'scope_id' }) scopeId: number;
  @Column({ type: 'int', name: 'user_id' }) userId: number;
  @Column({ type: 'varchar', length: 255, name: 'file_name' }) fileName: string;
  @Column({ type: 'varchar', length: 12 }) status: ImportStatus;
  @Column({ type: 'int', name: 'total_rows', default: 0 }) totalRows: number;
  @Column({ type: 'int', name: 'processed_rows', default: 0 }) processedRows: number;
  /** Share of the running check or commit done (0–1); null before the first report. */
  @Column({ type: 'double', nullable: true }) progress: number | null;
  @Column({ type: 'int', name: 'new_rows', default: 0 }) newRows: number;
  @Column({ type: 'int', name: 'duplicate_rows', default: 0 }) duplicateRows: number;
  @Column({ type: 'int', name: 'error_rows', default: 0 }) errorRows: number;
  @Column({ type: 'json', nullable: true }) mapping: Record<string, string> | null;
  /** Row-level problems as CSV, downloadable from the import history. */
  @Column({ type: 'longtext', name: 'error_report', nullable: true }) errorReport: string | null;
  @Column({ type: 'varchar', length: 500, nullable: true }) message: string | null;
  /** The uploaded file, kept under the data folder until the import is done. */
  @Column({ type: 'varchar', length: 500, name: 'file_path', nullable: true }) filePath: string | null;
  @Column({ type: 'varchar', length: 20, nullable: true }) encoding: string | null;
  @Column({ type: 'varchar', length: 4, nullable: true }) delimiter: string | null;
  @Column({ type: 'json', nullable: true }) headers: string[] | null;
  @Column({ type: 'json', name: 'sample_rows', nullable: true }) sampleRows: string[][] | null;
  @Column({ type: 'json', name: 'suggested_mapping', nullable: true }) suggestedMapping: Record<string, string> | null;
  @Column({ type: 'json', nullable: true }) options: ImportCheckOptions | null;
  @Column({ type: 'json', nullable: true }) summary: ImportSummary | null;
  /** Evaluations: the trait columns offered for mapping (the herd's breed templates). */
  @Column({ type: 'json', name: 'evaluation_traits', nullable: true }) evaluationTraits: EvaluationTrait[] | null;
  @CreateDateColumn({ type: 'datetime', name: 'started_at' }) startedAt: Date;
  @Column({ type: 'datetime', name: 'finished_at', nullable: true }) finishedAt: Date | null;
}
