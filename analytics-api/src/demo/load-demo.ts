import type { DataSource } from 'typeorm';
import { hashPassword } from '../auth/passwords';
import { Breed } from '../db/entities/breed.entity';
import { Club } from '../db/entities/club.entity';
import { ClubMembership } from '../db/entities/club-membership.entity';
import { Rabbitry } from '../db/entities/rabbitry.entity';
import { RabbitryMembership } from '../db/entities/rabbitry-membership.entity';
import { User } from '../db/entities/user.entity';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './demo-accounts';

/** True when the database holds no accounts yet (the first start loads the demo). */
export async function isEmpty(db: DataSource): Promise<boolean> {
  return (await db.getRepository(User).count()) === 0;
}

/**
 * Loads the minimal invented demo: one account per role, one club (and a second one for the
 * outsider), two rabbitries and a breed. All in one transaction.
 */
export async function loadDemo(db: DataSource): Promise<void> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await db.transaction(async (tx) => {
    const users = new Map<string, number>();
    for (const a of DEMO_ACCOUNTS) {
      const u = await tx.getRepository(User).save({ email: a.email, displayName: a.displayName, passwordHash, isAdmin: a.isAdmin });
      users.set(a.role, u.id);
    }
    const id = (role: string) => users.get(role)!;
    await tx.getRepository(Breed).save({
      name: 'Mini Rex', classScheme: 'four-class', varieties: ['Black', 'Blue', 'Castor', 'Broken'],
      // Values from memory for the fixture only — check against the current official standard.
      weightLimits: {
        buck: { junior: { minGrams: 680, idealGrams: null, maxGrams: 1588 }, intermediate: null, senior: { minGrams: 1588, idealGrams: 1928, maxGrams: 2041 } },
        doe: { junior: { minGrams: 680, idealGrams: null, maxGrams: 1588 }, intermediate: null, senior: { minGrams: 1588, idealGrams: 1928, maxGrams: 2155 } },
      },
      evaluationTemplate: { traits: [{ key: 'body_type', label: 'Body type', points: 50 }, { key: 'fur', label: 'Fur', points: 35 }, { key: 'condition', label: 'Condition', points: 15 }] },
      sourceNote: 'from memory — check against the current official standard',
    });
    const r1 = await tx.getRepository(Rabbitry).save({ name: 'Fenwick Hollow', slug: 'fenwick-hollow', location: 'Upper Brackenford' });
    const r2 = await tx.getRepository(Rabbitry).save({ name: 'Castellan Meadow', slug: 'castellan-meadow', location: 'Lowmere' });
    const rm = tx.getRepository(RabbitryMembership);
    await rm.save([
      { rabbitryId: r1.id, userId: id('owner'), role: 'owner' },
      { rabbitryId: r1.id, userId: id('partner'), role: 'partner' },
      { rabbitryId: r1.id, userId: id('mentor'), role: 'mentor' },
      { rabbitryId: r2.id, userId: id('officer'), role: 'owner' },
    ]);
    const c1 = await tx.getRepository(Club).save({ name: 'Brackenford Valley Rabbit Club', region: 'Brackenford Valley', seasonStart: '2026-01-01', seasonEnd: '2026-12-31' });
    const c2 = await tx.getRepository(Club).save({ name: 'Lowmere Coast Fanciers', region: 'Lowmere Coast', seasonStart: '2026-01-01', seasonEnd: '2026-12-31' });
    const cm = tx.getRepository(ClubMembership);
    await cm.save([
      { clubId: c1.id, userId: id('officer'), role: 'officer', exhibitorName: 'Priya Castellan', rabbitryId: r2.id },
      { clubId: c1.id, userId: id('owner'), role: 'member', exhibitorName: 'Marla Fenwick', rabbitryId: r1.id },
      { clubId: c1.id, userId: id('member'), role: 'member', exhibitorName: 'Jonah Whitlow' },
      { clubId: c2.id, userId: id('member of another club'), role: 'officer', exhibitorName: 'Sunniva Ortolan' },
    ]);
  });
}
