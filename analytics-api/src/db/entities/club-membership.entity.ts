import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

export type ClubRole = 'officer' | 'member';

@Entity('club_membership')
@Index(['clubId', 'userId'], { unique: true })
export class ClubMembership {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'int', name: 'club_id' }) clubId: number;
  @Index() @Column({ type: 'int', name: 'user_id' }) userId: number;
  @Column({ type: 'varchar', length: 10 }) role: ClubRole;
  /** The name under which this member appears in show results. */
  @Column({ type: 'varchar', length: 120, name: 'exhibitor_name', nullable: true }) exhibitorName: string | null;
  /** The member's own herd, used to match results to animals. */
  @Column({ type: 'int', name: 'rabbitry_id', nullable: true }) rabbitryId: number | null;
  @CreateDateColumn({ type: 'datetime', name: 'created_at' }) createdAt: Date;
}
