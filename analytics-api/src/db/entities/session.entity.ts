import { Column, Entity, PrimaryColumn } from 'typeorm';

/** The session store's table (express-mysql-session's layout), created by migration. */
@Entity('sessions')
export class SessionRow {
  @PrimaryColumn({ type: 'varchar', length: 128, name: 'session_id' }) sessionId: string;
  @Column({ type: 'int', unsigned: true }) expires: number;
  @Column({ type: 'mediumtext', nullable: true }) data: string | null;
}
