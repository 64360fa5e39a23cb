import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity('invitation')
export class Invitation {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Index() @Column({ type: 'varchar', length: 254 }) email: string;
  @Column({ type: 'char', length: 64, name: 'token_hash', unique: true }) tokenHash: string;
  @Column({ type: 'varchar', length: 8, name: 'scope_type' }) scopeType: 'rabbitry' | 'club';
  @Column({ type: 'int', name: 'scope_id' }) scopeId: number;
  @Column({ type: 'varchar', length: 10 }) role: string;
  @Column({ type: 'int', name: 'invited_by' }) invitedBy: number;
  @CreateDateColumn({ type: 'datetime', name: 'created_at' }) createdAt: Date;
  @Column({ type: 'datetime', name: 'expires_at' }) expiresAt: Date;
  @Column({ type: 'datetime', name: 'accepted_at', nullable: true }) acceptedAt: Date | null;
  @Column({ type: 'datetime', name: 'revoked_at', nullable: true }) revokedAt: Date | null;
}
