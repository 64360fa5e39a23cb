import type { DataSource } from 'typeorm';
import type { Note } from '@shared/contracts/notes';
import type { ResolvedAccess } from '../access/access-rules';
import { MentorNote } from '../db/entities/mentor-note.entity';
import { forbidden, notFound } from '../http/app-error';
import { findAnimal } from '../animals/find-animal';

/** Notes on a rabbitry or one of its animals; everyone with a role in the rabbitry may write one. */
export class NotesService {
  constructor(private readonly db: DataSource) {}

  async list(access: ResolvedAccess, animalId?: number): Promise<Note[]> {
    const rows: Record<string, unknown>[] = await this.db.query(
      `SELECT n.id, n.animal_id, a.ear_id, n.author_id, u.display_name, n.body, n.created_at
         FROM mentor_note n JOIN \`user\` u ON u.id = n.author_id LEFT JOIN animal a ON a.id = n.animal_id
        WHERE n.rabbitry_id = ? ${animalId ? 'AND n.animal_id = ?' : ''}
        ORDER BY n.created_at DESC, n.id DESC`,
      animalId ? [access.rabbitryId, animalId] : [access.rabbitryId]);
    return rows.map((r) => ({
      id: r.id as number, animalId: r.animal_id as number | null, animalEarId: r.ear_id as string | null,
      authorId: r.author_id as number, authorName: r.display_name as string, body: r.body as string,
      createdAt: new Date(r.created_at as string).toISOString(), canDelete: this.mayDelete(access, r.author_id as number),
    }));
  }

  async create(access: ResolvedAccess, input: { body: string; animalId?: number | null }): Promise<Note> {
    if (input.animalId) await findAnimal(this.db.manager, access.rabbitryId!, input.animalId);
    const saved = await this.db.getRepository(MentorNote).save({
      rabbitryId: access.rabbitryId!, animalId: input.animalId ?? null, authorId: access.userId, body: input.body,
    });
    return (await this.list(access)).find((n) => n.id === saved.id)!;
  }

  /** Its author, the rabbitry's owner or an administrator may delete a note. */
  async remove(access: ResolvedAccess, noteId: number): Promise<void> {
    const note = await this.db.getRepository(MentorNote).findOneBy({ id: noteId, rabbitryId: access.rabbitryId! });
    if (!note) throw notFound('Note');
    if (!this.mayDelete(access, note.authorId)) throw forbidden('Only the note\'s author or the rabbitry\'s owner may delete it');
    await this.db.getRepository(MentorNote).delete({ id: noteId });
  }

  private mayDelete(access: ResolvedAccess, authorId: number): boolean {
    return authorId === access.userId || access.rabbitryRole === 'owner' || access.rabbitryRole === 'admin';
  }
}
