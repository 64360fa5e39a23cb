import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A note left on a rabbitry or one of its animals (mentors may write notes, not records). */
@Entity('mentor_note')
export class MentorNote {
  @PrimaryGeneratedColumn({ type: 'int' }) id: number;
  @Index() @Column({ type: 'int', name: 'rabbitry_id' }) rabbitryId: number;
  @Column({ type: 'int', name: 'animal_id', nullable: true }) animalId: number | null;
  @Column({ type: 'int', name: 'author_id' }) authorId: number;
  @Column({ type: 'text' }) body: string;
  @CreateDateColumn({ type: 'datetime', name: 'created_at' }) createdAt: Date;
}
