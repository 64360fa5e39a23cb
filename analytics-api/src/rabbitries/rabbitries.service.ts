import type { DataSource, EntityManager } from 'typeorm';
import type { Rabbitry as RabbitryDto, RabbitryMember } from '@shared/contracts/rabbitries';
import type { RabbitryRole } from '@shared/contracts/roles';
import { Animal } from '../db/entities/animal.entity';
import { Litter } from '../db/entities/litter.entity';
import { Rabbitry } from '../db/entities/rabbitry.entity';
import { RabbitryMembership } from '../db/entities/rabbitry-membership.entity';
import { User } from '../db/entities/user.entity';
import { AppError, notFound } from '../http/app-error';

export const slugify = (name: string) =>
  name.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'rabbitry';

export class RabbitriesService {
  constructor(private readonly db: DataSource) {}

  async listForUser(userId: number): Promise<RabbitryDto[]> {
    const memberships = await this.db.getRepository(RabbitryMembership).findBy({ userId });
    const out: RabbitryDto[] = [];
    for (const m of memberships) out.push(await this.read(m.rabbitryId, m.role));
    return out.sort((a, b) => a.name.localeCompare(b.name));
  }

  async read(id: number, role: RabbitryRole | 'admin' | null): Promise<RabbitryDto> {
    const r = await this.db.getRepository(Rabbitry).findOneBy({ id });
    if (!r) throw notFound('Rabbitry');
    const [animals, litters] = await Promise.all([
      this.db.getRepository(Animal).countBy({ rabbitryId: id, isStub: false }),
      this.db.getRepository(Litter).countBy({ rabbitryId: id }),
    ]);
    return { id: r.id, name: r.name, slug: r.slug, location: r.location, role: role === 'admin' ? null : role, counts: { animals, litters } };
  }

  /** The creator becomes the owner, in the same transaction. */
  async create(userId: number, input: { name: string; location?: string | null }): Promise<RabbitryDto> {
    const id = await this.db.transaction(async (tx) => {
      const slug = await uniqueSlug(tx, slugify(input.name));
      const r = await tx.getRepository(Rabbitry).save({ name: input.name, slug, location: input.location ?? null });
      await tx.getRepository(RabbitryMembership).save({ rabbitryId: r.id, userId, role: 'owner', grantedBy: userId });
      return r.id;
    });
    return this.read(id, 'owner');
  }

  async update(id: number, role: RabbitryRole | 'admin', input: { name?: string; location?: string | null }) {
    const patch = Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined));
    if (Object.keys(patch).length) await this.db.getRepository(Rabbitry).update({ id }, patch);
    return this.read(id, role);
  }

  /** Deleting a rabbitry removes its records; the owner is asked to confirm in the dashboard. */
  async remove(id: number): Promise<void> {
    await this.db.transaction(async (tx) => {
      for (const table of ['weight_record', 'evaluation', 'animal_status_change']) {
        await tx.query(`DELETE t FROM \`${table}\` t JOIN animal a ON a.id = t.animal_id WHERE a.rabbitry_id = ?`, [id]);
      }
      await tx.query('UPDATE show_result sr JOIN animal a ON a.id = sr.animal_id SET sr.animal_id = NULL WHERE a.rabbitry_id = ?', [id]);
      for (const table of ['animal', 'litter', 'mentor_note', 'rabbitry_membership']) {
        await tx.query(`DELETE FROM \`${table}\` WHERE rabbitry_id = ?`, [id]);
      }
      await tx.query("DELETE FROM import_job WHERE scope_type = 'rabbitry' AND scope_id = ?", [id]);
      await tx.query('UPDATE club_membership SET rabbitry_id = NULL WHERE rabbitry_id = ?', [id]);
      await tx.getRepository(Rabbitry).delete({ id });
    });
  }

  async members(id: number): Promise<RabbitryMember[]> {
    const rows = await this.db.getRepository(RabbitryMembership).createQueryBuilder('m')
      .innerJoin(User, 'u', 'u.id = m.user_id')
      .select(['u.id AS userId', 'u.display_name AS displayName', 'u.email AS email', 'm.role AS role'])
      .where('m.rabbitry_id = :id', { id }).orderBy("FIELD(m.role, 'owner', 'partner', 'mentor')").addOrderBy('u.display_name')
      .getRawMany();
    return rows.map((r) => ({ ...r, userId: Number(r.userId) }));
  }

  /** Grants partner or mentor access to an existing account (invitations by e-mail come with the mail feature). */
  async grant(id: number, grantedBy: number, email: string, role: 'partner' | 'mentor'): Promise<RabbitryMember> {
    const user = await this.db.getRepository(User).findOneBy({ email });
    if (!user) throw new AppError('validation', 'No account uses that e-mail address', 400, { email: 'No account uses that e-mail address' });
    const repo = this.db.getRepository(RabbitryMembership);
    const existing = await repo.findOneBy({ rabbitryId: id, userId: user.id });
    if (existing?.role === 'owner') throw new AppError('conflict', 'That person owns this rabbitry already', 409);
    if (existing) await repo.update({ id: existing.id }, { role, grantedBy });
    else await repo.save({ rabbitryId: id, userId: user.id, role, grantedBy });
    return { userId: user.id, displayName: user.displayName, email: user.email, role };
  }

  async revoke(id: number, userId: number): Promise<void> {
    const repo = this.db.getRepository(RabbitryMembership);
    const m = await repo.findOneBy({ rabbitryId: id, userId });
    if (!m) throw notFound('Membership');
    if (m.role === 'owner') throw new AppError('conflict', 'An owner cannot be removed here', 409);
    await repo.delete({ id: m.id });
  }
}

async function uniqueSlug(tx: EntityManager, base: string): Promise<string> {
  for (let i = 1; ; i++) {
    const slug = i === 1 ? base : `${base}-${i}`;
    if (!(await tx.getRepository(Rabbitry).existsBy({ slug }))) return slug;
  }
}
