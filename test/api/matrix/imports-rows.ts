import type { DataSource } from 'typeorm';
import { ImportJob } from '../../../analytics-api/src/db/entities/import-job.entity';
import type { Ids, MatrixFeature, Row } from './matrix-types';

const HERD_READERS = ['admin', 'owner', 'partner', 'mentor'] as const;
const HERD_WRITERS = ['admin', 'owner', 'partner'] as const;
const CLUB_IMPORTERS = ['admin', 'officer'] as const;

/** A finished job in each scope, so that reading, checking and reports have something to answer. */
async function fixture(db: DataSource, ids: Ids) {
  const repo = db.getRepository(ImportJob);
  const common = { status: 'done' as const, fileName: 'fixture.csv', headers: ['ear_id'], sampleRows: [], suggestedMapping: {}, userId: ids.user('owner@example.test') };
  const herdJob = await repo.save({ ...common, kind: 'animals', scopeType: 'rabbitry' as const, scopeId: ids.r1 });
  const clubJob = await repo.save({ ...common, kind: 'results', scopeType: 'club' as const, scopeId: ids.c1 });
  return { herdJobId: herdJob.id, clubJobId: clubJob.id };
}

// Writes are checked for access only: an allowed caller gets past the access check to the
// route's own answer, here a 400 for a missing file or mapping, a 409 for a finished job.
const herd = (i: Ids) => `/api/rabbitries/${i.r1}/imports`;
const club = (i: Ids) => `/api/clubs/${i.c1}/imports`;
const rows: Record<string, Row> = {
  'get /rabbitries/:rabbitryId/imports': { allowed: [...HERD_READERS], path: herd },
  'post /rabbitries/:rabbitryId/imports': { allowed: [...HERD_WRITERS], path: herd, body: () => ({ kind: 'animals' }), expect: [400] },
  'get /rabbitries/:rabbitryId/imports/:jobId': { allowed: [...HERD_READERS], path: (i) => `${herd(i)}/${i.fixture.herdJobId}` },
  'post /rabbitries/:rabbitryId/imports/:jobId/check': { allowed: [...HERD_WRITERS], path: (i) => `${herd(i)}/${i.fixture.herdJobId}/check`, body: () => ({ mapping: {} }), expect: [409] },
  'post /rabbitries/:rabbitryId/imports/:jobId/commit': { allowed: [...HERD_WRITERS], path: (i) => `${herd(i)}/${i.fixture.herdJobId}/commit`, body: () => ({}), expect: [409] },
  'get /rabbitries/:rabbitryId/imports/:jobId/problems.csv': { allowed: [...HERD_READERS], path: (i) => `${herd(i)}/${i.fixture.herdJobId}/problems.csv` },
  'get /clubs/:clubId/imports': { allowed: [...CLUB_IMPORTERS], path: club },
  'post /clubs/:clubId/imports': { allowed: [...CLUB_IMPORTERS], path: club, body: () => ({ kind: 'results' }), expect: [400] },
  'get /clubs/:clubId/imports/:jobId': { allowed: [...CLUB_IMPORTERS], path: (i) => `${club(i)}/${i.fixture.clubJobId}` },
  'post /clubs/:clubId/imports/:jobId/check': { allowed: [...CLUB_IMPORTERS], path: (i) => `${club(i)}/${i.fixture.clubJobId}/check`, body: () => ({ mapping: {} }), expect: [409] },
  'post /clubs/:clubId/imports/:jobId/commit': { allowed: [...CLUB_IMPORTERS], path: (i) => `${club(i)}/${i.fixture.clubJobId}/commit`, body: () => ({}), expect: [409] },
  'get /clubs/:clubId/imports/:jobId/problems.csv': { allowed: [...CLUB_IMPORTERS], path: (i) => `${club(i)}/${i.fixture.clubJobId}/problems.csv` },
};

export const imports: MatrixFeature = { rows, fixture };
