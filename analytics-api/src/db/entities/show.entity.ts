import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity('show')
@Index(['clubId', 'name', 'showDate'], { unique: true })
export class Show {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  /** The club whose season the show counts for (its results are visible to the club's members). */
  @Column({ type: 'int', name: 'club_id' }) clubId: number;
  @Column({ type: 'varchar', length: 160 }) name: string;
  @Column({ type: 'date', name: 'show_date' }) showDate: string;
  @Column({ type: 'varchar', length: 160, nullable: true }) location: string | null;
  @Column({ type: 'varchar', length: 160, name: 'host_club', nullable: true }) hostClub: string | null;
  @Column({ type: 'json' }) judges: string[];
  @Column({ type: 'varchar', length: 40, name: 'sanction_no', nullable: true }) sanctionNo: string | null;
}
