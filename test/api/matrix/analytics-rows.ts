import type { DataSource } from 'typeorm';
import { Animal } from '../../../analytics-api/src/db/entities/animal.entity';
import { Breed } from '../../../analytics-api/src/db/entities/breed.entity';
import type { Actor, Ids, MatrixFeature, Row } from './matrix-types';

// Demo layout: r1 has owner, partner, mentor; c1 has officer, owner (as member) and member.
const HERD_READERS: Actor[] = ['admin', 'owner', 'partner', 'mentor'];
const CLUB_READERS: Actor[] = ['admin', 'owner', 'officer', 'member'];

/** A buck and a doe in r1, so that the relationship and pairing routes have animals to name. */
async function fixture(db: DataSource, ids: Ids) {
  const breed = await db.getRepository(Breed).findOneByOrFail({ name: 'Mini Rex' });
  const animals = db.getRepository(Animal);
  const common = { rabbitryId: ids.r1, breedId: breed.id, status: 'active' as const, isStub: false, variety: 'Black' };
  const buck = await animals.save(animals.create({ ...common, earId: 'ANXB1', sex: 'buck', birthDate: '2025-01-05' }));
  const doe = await animals.save(animals.create({ ...common, earId: 'ANXD1', sex: 'doe', birthDate: '2025-02-05' }));
  return { analyticsBuckId: buck.id, analyticsDoeId: doe.id };
}

const herd = (i: Ids) => `/api/rabbitries/${i.r1}/analytics`;
const rows: Record<string, Row> = {
  'get /rabbitries/:rabbitryId/analytics/placement': { allowed: HERD_READERS, path: (i) => `${herd(i)}/placement` },
  'get /rabbitries/:rabbitryId/analytics/heritability': { allowed: HERD_READERS, path: (i) => `${herd(i)}/heritability?scope=all` },
  'get /rabbitries/:rabbitryId/analytics/growth': { allowed: HERD_READERS, path: (i) => `${herd(i)}/growth?animals=${i.fixture.analyticsBuckId}` },
  'get /rabbitries/:rabbitryId/analytics/inbreeding': { allowed: HERD_READERS, path: (i) => `${herd(i)}/inbreeding` },
  'get /rabbitries/:rabbitryId/analytics/relationship': {
    allowed: HERD_READERS, path: (i) => `${herd(i)}/relationship?a=${i.fixture.analyticsBuckId}&b=${i.fixture.analyticsDoeId}`,
  },
  'get /rabbitries/:rabbitryId/analytics/pairings': { allowed: HERD_READERS, path: (i) => `${herd(i)}/pairings?animal=${i.fixture.analyticsDoeId}` },
  'get /rabbitries/:rabbitryId/analytics/breeding-values': { allowed: HERD_READERS, path: (i) => `${herd(i)}/breeding-values?scope=all` },
  'get /rabbitries/:rabbitryId/analytics/keepers': { allowed: HERD_READERS, path: (i) => `${herd(i)}/keepers` },
  'get /rabbitries/:rabbitryId/analytics/lines': { allowed: HERD_READERS, path: (i) => `${herd(i)}/lines?groupBy=rabbitry` },
  'get /clubs/:clubId/analytics/season': { allowed: CLUB_READERS, path: (i) => `/api/clubs/${i.c1}/analytics/season` },
  'put /clubs/:clubId/season': {
    allowed: ['admin', 'officer'], path: (i) => `/api/clubs/${i.c1}/season`, mutates: true,
    body: () => ({ seasonStart: '2026-01-01', seasonEnd: '2026-11-30', pointsFormula: { kind: 'flat', table: [10, 7, 5, 3, 1], bonuses: { BOB: 5 } } }),
  },
};

export const analytics: MatrixFeature = { rows, fixture };
