import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity('weight_record')
@Index(['animalId', 'weighedOn'], { unique: true })
export class WeightRecord {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'int', name: 'animal_id' }) animalId: number;
  @Column({ type: 'date', name: 'weighed_on' }) weighedOn: string;
  @Column({ type: 'int' }) grams: number;
  @Column({ type: 'varchar', length: 255, nullable: true }) notes: string | null;
}
