import { loadRecordsFixture } from '../../support/records-fixture';
import type { Actor, Ids, MatrixFeature, Row } from './matrix-types';

// Demo layout: r1 has owner, partner, mentor; c1 has officer, owner (as member) and member.
const HERD_READERS: Actor[] = ['admin', 'owner', 'partner', 'mentor'];
const HERD_WRITERS: Actor[] = ['admin', 'owner', 'partner'];
const HERD_OWNERS: Actor[] = ['admin', 'owner'];
const CLUB_READERS: Actor[] = ['admin', 'owner', 'officer', 'member'];
const CLUB_OFFICERS: Actor[] = ['admin', 'officer'];
const SIGNED_IN: Actor[] = ['admin', 'owner', 'partner', 'mentor', 'officer', 'member', 'other-club'];

const herd = (i: Ids) => `/api/rabbitries/${i.r1}`;
const animal = (i: Ids) => `${herd(i)}/animals/${i.fixture.animalId}`;
const shows = (i: Ids) => `/api/clubs/${i.c1}/shows`;

const newBreed = {
  name: 'Matrix Test Breed', classScheme: 'four-class', varieties: ['White'],
  weightLimits: {
    buck: { junior: { minGrams: null, idealGrams: null, maxGrams: 1500 }, intermediate: null, senior: { minGrams: 1500, idealGrams: 1800, maxGrams: 2000 } },
    doe: { junior: { minGrams: null, idealGrams: null, maxGrams: 1500 }, intermediate: null, senior: { minGrams: 1500, idealGrams: 1850, maxGrams: 2100 } },
  },
  evaluationTemplate: { traits: [{ key: 'body_type', label: 'Body type', points: 60 }, { key: 'fur', label: 'Fur', points: 40 }] },
};

export const recordsRows: Record<string, Row> = {
  'get /breeds': { allowed: SIGNED_IN, path: () => '/api/breeds' },
  'post /breeds': { allowed: ['admin'], path: () => '/api/breeds', body: () => newBreed, mutates: true },
  'patch /breeds/:breedId': { allowed: ['admin'], path: (i) => `/api/breeds/${i.fixture.unusedBreedId}`, body: () => ({ varieties: ['White', 'Cream'] }), mutates: true },
  'delete /breeds/:breedId': { allowed: ['admin'], path: (i) => `/api/breeds/${i.fixture.unusedBreedId}`, mutates: true },

  'get /rabbitries/:rabbitryId/animals': { allowed: HERD_READERS, path: (i) => `${herd(i)}/animals` },
  'get /rabbitries/:rabbitryId/lines': { allowed: HERD_READERS, path: (i) => `${herd(i)}/lines` },
  'post /rabbitries/:rabbitryId/animals': { allowed: HERD_WRITERS, path: (i) => `${herd(i)}/animals`, body: () => ({ earId: 'NEW1', sex: 'doe' }), mutates: true },
  'get /rabbitries/:rabbitryId/animals/:animalId': { allowed: HERD_READERS, path: animal },
  'patch /rabbitries/:rabbitryId/animals/:animalId': { allowed: HERD_WRITERS, path: animal, body: () => ({ name: 'Renamed Kit' }), mutates: true },
  'post /rabbitries/:rabbitryId/animals/:animalId/status': {
    allowed: HERD_WRITERS, path: (i) => `${animal(i)}/status`, body: () => ({ status: 'sold', changedOn: '2026-01-15' }), mutates: true,
  },
  'patch /rabbitries/:rabbitryId/animals/:animalId/keeper-decision': {
    allowed: HERD_WRITERS, path: (i) => `${animal(i)}/keeper-decision`, body: () => ({ decision: 'keep' }), mutates: true,
  },
  'delete /rabbitries/:rabbitryId/animals/:animalId': { allowed: HERD_OWNERS, path: (i) => `${herd(i)}/animals/${i.fixture.loneAnimalId}`, mutates: true },
  'get /rabbitries/:rabbitryId/animals/:animalId/pedigree': { allowed: HERD_READERS, path: (i) => `${animal(i)}/pedigree` },
  'get /rabbitries/:rabbitryId/animals/:animalId/pedigree.pdf': { allowed: HERD_READERS, path: (i) => `${animal(i)}/pedigree.pdf` },
  // Access only: a JSON body carries no file, so an allowed caller gets the route's own 400.
  'post /rabbitries/:rabbitryId/animals/:animalId/photo': { allowed: HERD_WRITERS, path: (i) => `${animal(i)}/photo`, body: () => ({}), expect: [400] },
  'get /rabbitries/:rabbitryId/animals/:animalId/photo': { allowed: HERD_READERS, path: (i) => `${animal(i)}/photo` },
  'get /rabbitries/:rabbitryId/animals/:animalId/weights': { allowed: HERD_READERS, path: (i) => `${animal(i)}/weights` },
  'post /rabbitries/:rabbitryId/animals/:animalId/weights': {
    allowed: HERD_WRITERS, path: (i) => `${animal(i)}/weights`, body: () => ({ weighedOn: '2026-02-01', weight: '2600 g' }), mutates: true,
  },
  'delete /rabbitries/:rabbitryId/weights/:weightId': { allowed: HERD_WRITERS, path: (i) => `${herd(i)}/weights/${i.fixture.weightId}`, mutates: true },
  'get /rabbitries/:rabbitryId/animals/:animalId/evaluations': { allowed: HERD_READERS, path: (i) => `${animal(i)}/evaluations` },
  'post /rabbitries/:rabbitryId/animals/:animalId/evaluations': {
    allowed: HERD_WRITERS, path: (i) => `${animal(i)}/evaluations`, body: () => ({ evaluatedOn: '2026-02-01', scores: { body_type: 41 } }), mutates: true,
  },
  'delete /rabbitries/:rabbitryId/evaluations/:evaluationId': {
    allowed: HERD_WRITERS, path: (i) => `${herd(i)}/evaluations/${i.fixture.evaluationId}`, mutates: true,
  },
  'get /rabbitries/:rabbitryId/litters': { allowed: HERD_READERS, path: (i) => `${herd(i)}/litters` },
  'post /rabbitries/:rabbitryId/litters': {
    allowed: HERD_WRITERS, path: (i) => `${herd(i)}/litters`, body: () => ({ sireEarId: 'SIRE1', damEarId: 'DAM1', bredOn: '2026-01-01' }), mutates: true,
  },
  'patch /rabbitries/:rabbitryId/litters/:litterId': {
    allowed: HERD_WRITERS, path: (i) => `${herd(i)}/litters/${i.fixture.litterId}`, body: () => ({ bornDead: 1 }), mutates: true,
  },
  'post /rabbitries/:rabbitryId/litters/:litterId/kits': {
    allowed: HERD_WRITERS, path: (i) => `${herd(i)}/litters/${i.fixture.litterId}/kits`,
    body: () => ({ count: 2, sexes: ['buck', 'doe'], earIdPrefix: 'NK' }), mutates: true,
  },
  'get /rabbitries/:rabbitryId/notes': { allowed: HERD_READERS, path: (i) => `${herd(i)}/notes` },
  // Mentors may leave notes though they edit no records.
  'post /rabbitries/:rabbitryId/notes': { allowed: HERD_READERS, path: (i) => `${herd(i)}/notes`, body: () => ({ body: 'Compare with the dam line' }), mutates: true },
  // The fixture's note is the mentor's: its author and the owner may delete it, the partner not.
  'delete /rabbitries/:rabbitryId/notes/:noteId': { allowed: ['admin', 'owner', 'mentor'], path: (i) => `${herd(i)}/notes/${i.fixture.noteId}`, mutates: true },

  'get /clubs/:clubId/shows': { allowed: CLUB_READERS, path: shows },
  'post /clubs/:clubId/shows': { allowed: CLUB_OFFICERS, path: shows, body: () => ({ name: 'Matrix Summer Show', showDate: '2026-06-20' }), mutates: true },
  'get /clubs/:clubId/shows/:showId': { allowed: CLUB_READERS, path: (i) => `${shows(i)}/${i.fixture.showId}` },
  'patch /clubs/:clubId/shows/:showId': { allowed: CLUB_OFFICERS, path: (i) => `${shows(i)}/${i.fixture.showId}`, body: () => ({ location: 'Matrix Hall' }), mutates: true },
  'delete /clubs/:clubId/shows/:showId': { allowed: CLUB_OFFICERS, path: (i) => `${shows(i)}/${i.fixture.emptyShowId}`, mutates: true },
  'get /clubs/:clubId/shows/:showId/results': { allowed: CLUB_READERS, path: (i) => `${shows(i)}/${i.fixture.showId}/results` },
  'delete /clubs/:clubId/shows/:showId/results/:resultId': {
    allowed: CLUB_OFFICERS, path: (i) => `${shows(i)}/${i.fixture.showId}/results/${i.fixture.resultId}`, mutates: true,
  },
  'get /clubs/:clubId/results': { allowed: CLUB_READERS, path: (i) => `/api/clubs/${i.c1}/results` },
};

export const records: MatrixFeature = { rows: recordsRows, fixture: (db, ids) => loadRecordsFixture(db, ids) };
