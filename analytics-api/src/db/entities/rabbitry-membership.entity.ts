import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

export type RabbitryRole = 'owner' | 'partner' | 'mentor';

@Entity('rabbitry_membership')
@Index(['rabbitryId', 'userId'], { unique: true })
export class RabbitryMembership {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'int', name: 'rabbitry_id' }) rabbitryId: number;
  @Index() @Column({ type: 'int', name: 'user_id' }) userId: number;
  @Column({ type: 'varchar', length: 10 }) role: RabbitryRole;
  @Column({ type: 'int', name: 'granted_by', nullable: true }) grantedBy: number | null;
  @CreateDateColumn({ type: 'datetime', name: 'created_at' }) createdAt: Date;
}
