import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** One breeder's herd: the unit of ownership and access for animal records. */
@Entity('rabbitry')
export class Rabbitry {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'varchar', length: 120 }) name: string;
  @Column({ type: 'varchar', length: 80, unique: true }) slug: string;
  @Column({ type: 'varchar', length: 120, nullable: true }) location: string | null;
  @CreateDateColumn({ type: 'datetime', name: 'created_at' }) createdAt: Date;
}
