import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** Column mapping remembered per user and import kind (secretaries' headers differ). */
@Entity('saved_mapping')
@Index(['userId', 'kind'], { unique: true })
export class SavedMapping {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'int', name: 'user_id' }) userId: number;
  @Column({ type: 'varchar', length: 16 }) kind: string;
  @Column({ type: 'json' }) mapping: Record<string, string>;
}
