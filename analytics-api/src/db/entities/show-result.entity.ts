import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { EAR_ID_MAX_LENGTH } from '@shared/domain/terms';

/** One placing of one animal in one class at one show. */
@Entity('show_result')
@Index('UQ_show_result_show_dedupe', ['showId', 'dedupeKey'], { unique: true })
export class ShowResult {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'int', name: 'show_id' }) showId: number;
  /** Null while the ear ID matches no animal in a member's herd. */
  @Index() @Column({ type: 'int', name: 'animal_id', nullable: true }) animalId: number | null;
  @Column({ type: 'varchar', length: EAR_ID_MAX_LENGTH, name: 'ear_id', nullable: true }) earId: string | null;
  @Index() @Column({ type: 'varchar', length: 120 }) exhibitor: string;
  @Column({ type: 'varchar', length: 80 }) breed: string;
  @Column({ type: 'varchar', length: 80, nullable: true }) variety: string | null;
  @Column({ type: 'varchar', length: 4 }) sex: 'buck' | 'doe';
  @Column({ type: 'varchar', length: 12, name: 'age_class' }) ageClass: 'junior' | 'intermediate' | 'senior';
  @Column({ type: 'smallint', name: 'entries_in_class' }) entriesInClass: number;
  @Column({ type: 'smallint', name: 'exhibitors_in_class' }) exhibitorsInClass: number;
  @Column({ type: 'smallint' }) placing: number;
  /** Space-separated award codes (BOV BOSV BOB BOSB BIS). */
  @Column({ type: 'varchar', length: 40, default: '' }) awards: string;
  @Column({ type: 'varchar', length: 120, nullable: true }) judge: string | null;
  /** SHA-1 of the record's dedupe key (shared/imports/dedupe-key.ts), 20 raw bytes. */
  @Column({ type: 'binary', length: 20, name: 'dedupe_key' }) dedupeKey: Buffer;
  @Column({ type: 'int', name: 'import_job_id', nullable: true }) importJobId: number | null;
}
