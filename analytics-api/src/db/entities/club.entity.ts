import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

@Entity('club')
export class Club {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Column({ type: 'varchar', length: 120 }) name: string;
  @Column({ type: 'varchar', length: 120, nullable: true }) region: string | null;
  @Column({ type: 'date', name: 'season_start', nullable: true }) seasonStart: string | null;
  @Column({ type: 'date', name: 'season_end', nullable: true }) seasonEnd: string | null;
  /** Points formula for season standings (shape in shared/contracts). */
  @Column({ type: 'json', name: 'points_formula', nullable: true }) pointsFormula: unknown;
  /** Leg rule overrides (minimum animals and exhibitors); null = the default rule. */
  @Column({ type: 'json', name: 'leg_rule', nullable: true }) legRule: unknown;
  @CreateDateColumn({ type: 'datetime', name: 'created_at' }) createdAt: Date;
}
