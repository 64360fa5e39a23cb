import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { AnimalStatus } from './animal.entity';

/** Status history: animals are never deleted once they have offspring or results. */
@Entity('animal_status_change')
export class AnimalStatusChange {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Index() @Column({ type: 'int', name: 'animal_id' }) animalId: number;
  @Column({ type: 'varchar', length: 10 }) status: AnimalStatus;
  @Column({ type: 'date', name: 'changed_on' }) changedOn: string;
  @Column({ type: 'varchar', length: 255, nullable: true }) note: string | null;
  @Column({ type: 'int', name: 'user_id', nullable: true }) userId: number | null;
  @CreateDateColumn({ type: 'datetime', name: 'created_at' }) createdAt: Date;
}
