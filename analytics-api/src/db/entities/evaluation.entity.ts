import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A breeder's own scoring of an animal against the breed's evaluation template. */
@Entity('evaluation')
@Index(['animalId', 'evaluatedOn'], { unique: true })
export class Evaluation {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'int', name: 'animal_id' }) animalId: number;
  @Column({ type: 'date', name: 'evaluated_on' }) evaluatedOn: string;
  @Column({ type: 'varchar', length: 120, nullable: true }) evaluator: string | null;
  /** Trait key → score, per the breed's template. */
  @Column({ type: 'json' }) scores: Record<string, number>;
  @Column({ type: 'text', nullable: true }) notes: string | null;
}
