import type { DataSource } from 'typeorm';
import type { Club as ClubDto, ClubMember } from '@shared/contracts/clubs';
import type { ClubRole } from '@shared/contracts/roles';
import { Club } from '../db/entities/club.entity';
import { ClubMembership } from '../db/entities/club-membership.entity';
import { Show } from '../db/entities/show.entity';
import { User } from '../db/entities/user.entity';
import { AppError, notFound } from '../http/app-error';

export class ClubsService {
  constructor(private readonly db: DataSource) {}

  async listForUser(userId: number): Promise<ClubDto[]> {
    const memberships = await this.db.getRepository(ClubMembership).findBy({ userId });
    const out: ClubDto[] = [];
    for (const m of memberships) out.push(await this.read(m.clubId, m.role));
    return out.sort((a, b) => a.name.localeCompare(b.name));
  }

  async read(id: number, role: ClubRole | 'admin' | null): Promise<ClubDto> {
    const c = await this.db.getRepository(Club).findOneBy({ id });
    if (!c) throw notFound('Club');
    const [members, shows, [{ n: results }]] = await Promise.all([
      this.db.getRepository(ClubMembership).countBy({ clubId: id }),
      this.db.getRepository(Show).countBy({ clubId: id }),
      this.db.query('SELECT COUNT(*) AS n FROM show_result sr JOIN `show` s ON s.id = sr.show_id WHERE s.club_id = ?', [id]),
    ]);
    return {
      id: c.id, name: c.name, region: c.region, seasonStart: c.seasonStart, seasonEnd: c.seasonEnd,
      role: role === 'admin' ? null : role, counts: { members, shows, results: Number(results) },
    };
  }

  async members(id: number): Promise<ClubMember[]> {
    const rows = await this.db.getRepository(ClubMembership).createQueryBuilder('m')
      .innerJoin(User, 'u', 'u.id = m.user_id')
      .select(['u.id AS userId', 'u.display_name AS displayName', 'u.email AS email', 'm.role AS role', 'm.exhibitor_name AS exhibitorName'])
      .where('m.club_id = :id', { id }).orderBy("FIELD(m.role, 'officer', 'member')").addOrderBy('u.display_name')
      .getRawMany();
    return rows.map((r) => ({ ...r, userId: Number(r.userId) }));
  }

  async addMember(id: number, input: { email: string; role: ClubRole; exhibitorName?: string | null }): Promise<ClubMember> {
    const user = await this.db.getRepository(User).findOneBy({ email: input.email });
    if (!user) throw new AppError('validation', 'No account uses that e-mail address', 400, { email: 'No account uses that e-mail address' });
    const repo = this.db.getRepository(ClubMembership);
    const exhibitorName = input.exhibitorName ?? user.displayName;
    const existing = await repo.findOneBy({ clubId: id, userId: user.id });
    if (existing) await repo.update({ id: existing.id }, { role: input.role, exhibitorName });
    else await repo.save({ clubId: id, userId: user.id, role: input.role, exhibitorName });
    return { userId: user.id, displayName: user.displayName, email: user.email, role: input.role, exhibitorName };
  }

  async removeMember(id: number, userId: number, callerId: number): Promise<void> {
    if (userId === callerId) throw new AppError('conflict', 'Officers cannot remove themselves; ask another officer', 409);
    const res = await this.db.getRepository(ClubMembership).delete({ clubId: id, userId });
    if (!res.affected) throw notFound('Membership');
  }
}
