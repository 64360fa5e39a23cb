import type { DataSource } from 'typeorm';
import type { CurrentUser } from '@shared/contracts/session';
import { Club } from '../db/entities/club.entity';
import { ClubMembership } from '../db/entities/club-membership.entity';
import { Rabbitry } from '../db/entities/rabbitry.entity';
import { RabbitryMembership } from '../db/entities/rabbitry-membership.entity';
import { User } from '../db/entities/user.entity';

export class SessionService {
  constructor(private readonly db: DataSource) {}

  /** The user with every rabbitry and club they belong to, for the dashboard's navigation. */
  async currentUser(userId: number): Promise<CurrentUser> {
    const user = await this.db.getRepository(User).findOneByOrFail({ id: userId });
    const rabbitries = await this.db.getRepository(RabbitryMembership).createQueryBuilder('m')
      .innerJoin(Rabbitry, 'r', 'r.id = m.rabbitry_id')
      .select(['r.id AS id', 'r.name AS name', 'r.slug AS slug', 'm.role AS role'])
      .where('m.user_id = :userId', { userId }).orderBy('r.name').getRawMany();
    const clubs = await this.db.getRepository(ClubMembership).createQueryBuilder('m')
      .innerJoin(Club, 'c', 'c.id = m.club_id')
      .select(['c.id AS id', 'c.name AS name', 'm.role AS role'])
      .where('m.user_id = :userId', { userId }).orderBy('c.name').getRawMany();
    return {
      id: user.id, email: user.email, displayName: user.displayName, isAdmin: user.isAdmin,
      weightUnit: user.weightUnit, dateOrder: user.dateOrder,
      rabbitries: rabbitries.map((r) => ({ id: Number(r.id), name: r.name, slug: r.slug, role: r.role })),
      clubs: clubs.map((c) => ({ id: Number(c.id), name: c.name, role: c.role })),
    };
  }

  async updatePreferences(userId: number, prefs: Partial<Pick<User, 'weightUnit' | 'dateOrder' | 'displayName'>>) {
    const patch = Object.fromEntries(Object.entries(prefs).filter(([, v]) => v !== undefined));
    if (Object.keys(patch).length) await this.db.getRepository(User).update({ id: userId }, patch);
  }
}
