import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

@Entity('user')
export class User {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'varchar', length: 254, unique: true }) email: string;
  @Column({ type: 'varchar', length: 120, name: 'display_name' }) displayName: string;
  @Column({ type: 'varchar', length: 255, name: 'password_hash' }) passwordHash: string;
  @Column({ type: 'boolean', name: 'is_admin', default: false }) isAdmin: boolean;
  @Column({ type: 'varchar', length: 8, name: 'weight_unit', default: 'lb-oz' }) weightUnit: 'lb-oz' | 'kg';
  @Column({ type: 'varchar', length: 4, name: 'date_order', default: 'iso' }) dateOrder: 'iso' | 'mdy';
  @CreateDateColumn({ type: 'datetime', name: 'created_at' }) createdAt: Date;
}
