import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { EAR_ID_MAX_LENGTH } from '@shared/domain/terms';

export type AnimalSex = 'buck' | 'doe';
export type AnimalStatus = 'active' | 'sold' | 'deceased' | 'culled';

/**
 * An animal of a rabbitry, or a stub for a parent from outside the herd (isStub: only the
 * pedigree facts are known).
 */
@Entity('animal')
@Index(['rabbitryId', 'earId'], { unique: true })
export class Animal {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'int', name: 'rabbitry_id' }) rabbitryId: number;
  @Column({ type: 'varchar', length: EAR_ID_MAX_LENGTH, name: 'ear_id' }) earId: string;
  @Column({ type: 'varchar', length: 120, nullable: true }) name: string | null;
  @Column({ type: 'varchar', length: 4 }) sex: AnimalSex;
  @Index() @Column({ type: 'int', name: 'breed_id', nullable: true }) breedId: number | null;
  @Column({ type: 'varchar', length: 80, nullable: true }) variety: string | null;
  @Column({ type: 'date', name: 'birth_date', nullable: true }) birthDate: string | null;
  @Index() @Column({ type: 'int', name: 'sire_id', nullable: true }) sireId: number | null;
  @Index() @Column({ type: 'int', name: 'dam_id', nullable: true }) damId: number | null;
  @Column({ type: 'int', name: 'litter_id', nullable: true }) litterId: number | null;
  @Column({ type: 'varchar', length: 80, nullable: true }) line: string | null;
  @Column({ type: 'varchar', length: 10, default: 'active' }) status: AnimalStatus;
  @Column({ type: 'varchar', length: 40, name: 'registration_no', nullable: true }) registrationNo: string | null;
  @Column({ type: 'boolean', name: 'grand_champion', default: false }) grandChampion: boolean;
  @Column({ type: 'varchar', length: 120, nullable: true }) breeder: string | null;
  @Column({ type: 'boolean', name: 'is_stub', default: false }) isStub: boolean;
  /** Known weight of an outside stub (its own weights are not recorded here). */
  @Column({ type: 'int', name: 'stub_weight_grams', nullable: true }) stubWeightGrams: number | null;
  @Column({ type: 'varchar', length: 255, name: 'photo_path', nullable: true }) photoPath: string | null;
  @Column({ type: 'text', nullable: true }) notes: string | null;
  @Column({ type: 'varchar', length: 10, name: 'keeper_decision', nullable: true }) keeperDecision: 'keep' | 'sell' | 'undecided' | null;
  @CreateDateColumn({ type: 'datetime', name: 'created_at' }) createdAt: Date;
  @UpdateDateColumn({ type: 'datetime', name: 'updated_at' }) updatedAt: Date;
}
