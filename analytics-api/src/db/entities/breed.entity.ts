import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A breed of the catalogue; shapes of the JSON columns live in shared/domain/breed.ts. */
@Entity('breed')
export class Breed {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'varchar', length: 80, unique: true }) name: string;
  @Column({ type: 'varchar', length: 12, name: 'class_scheme' }) classScheme: 'four-class' | 'six-class';
  @Column({ type: 'json', name: 'weight_limits' }) weightLimits: unknown;
  @Column({ type: 'json' }) varieties: string[];
  @Column({ type: 'json', name: 'evaluation_template' }) evaluationTemplate: unknown;
  @Column({ type: 'varchar', length: 255, name: 'source_note', nullable: true }) sourceNote: string | null;
}
