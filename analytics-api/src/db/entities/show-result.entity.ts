import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** One placing of one animal in one class at one show. */
@Entity('show_result')
@Index(['showId', 'dedupeKey'], { unique: true })
export class ShowResult {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'int', name: 'show_id' }) showId: number;
  /** Null while the ear ID matches no animal in a member's herd. */
  @Index() @Column({ type: 'int', name: 'animal_id', nullable: true }) animalId: number | null;
  @Column({ type: 'varchar', length: 32, name: 'ear_id', nullable: true }) earId: string | null;
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
  @Column({ type: 'char', length: 40, name: 'dedupe_key' }) dedupeKey: string;
  @Column({ type: 'int', name: 'import_job_id', nullable: true }) importJobId: number | null;
}
