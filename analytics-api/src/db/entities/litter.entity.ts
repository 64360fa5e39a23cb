import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity('litter')
@Index(['rabbitryId', 'code'], { unique: true })
export class Litter {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'int', name: 'rabbitry_id' }) rabbitryId: number;
  @Column({ type: 'varchar', length: 40 }) code: string;
  @Column({ type: 'int', name: 'sire_id', nullable: true }) sireId: number | null;
  @Index() @Column({ type: 'int', name: 'dam_id', nullable: true }) damId: number | null;
  @Column({ type: 'date', name: 'bred_on', nullable: true }) bredOn: string | null;
  @Column({ type: 'date', name: 'kindled_on', nullable: true }) kindledOn: string | null;
  @Column({ type: 'smallint', name: 'born_alive', nullable: true }) bornAlive: number | null;
  @Column({ type: 'smallint', name: 'born_dead', nullable: true }) bornDead: number | null;
  @Column({ type: 'smallint', nullable: true }) weaned: number | null;
  @Column({ type: 'int', name: 'weight_21d_grams', nullable: true }) weight21dGrams: number | null;
  @Column({ type: 'text', nullable: true }) notes: string | null;
}
