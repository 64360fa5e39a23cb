import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity('password_reset')
export class PasswordReset {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Index() @Column({ type: 'int', name: 'user_id' }) userId: number;
  @Column({ type: 'char', length: 64, name: 'token_hash', unique: true }) tokenHash: string;
  @Column({ type: 'datetime', name: 'expires_at' }) expiresAt: Date;
  @Column({ type: 'datetime', name: 'used_at', nullable: true }) usedAt: Date | null;
}
