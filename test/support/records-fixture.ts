import type { DataSource } from 'typeorm';
import { loadConfig } from '../../analytics-api/src/config';
import { Animal } from '../../analytics-api/src/db/entities/animal.entity';
import { Breed } from '../../analytics-api/src/db/entities/breed.entity';
import { Evaluation } from '../../analytics-api/src/db/entities/evaluation.entity';
import { Litter } from '../../analytics-api/src/db/entities/litter.entity';
import { MentorNote } from '../../analytics-api/src/db/entities/mentor-note.entity';
import { Show } from '../../analytics-api/src/db/entities/show.entity';
import { ShowResult } from '../../analytics-api/src/db/entities/show-result.entity';
import { WeightRecord } from '../../analytics-api/src/db/entities/weight-record.entity';
import { PhotoStore } from '../../analytics-api/src/photos/photo-store';

/** A 1×1 PNG (the smallest valid file: signature, IHDR, IDAT, IEND). */
export const TINY_PNG = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAQAAAC1HAwCAAAAC0lEQVR42mNkYAAAAAYAAjCB0C8AAAAASUVORK5CYII=', 'base64');

export interface RecordsIds { r1: number; c1: number; user: (email: string) => number }

/**
 * A few invented herd and show records on top of the minimal demo, through TypeORM: in r1 a
 * sire, a dam, their litter and kit (with a weighing, an evaluation, a photo and a mentor's
 * note), an animal without history; in c1 a show with one result of the kit and an empty show;
 * a breed no animal uses. Returns the ids the access matrix and the record tests need.
 */
export async function loadRecordsFixture(db: DataSource, ids: RecordsIds): Promise<Record<string, number>> {
  const breeds = db.getRepository(Breed);
  const miniRex = await breeds.findOneByOrFail({ name: 'Mini Rex' });
  const unused = await breeds.save({
    name: 'Fixture Unused Breed', classScheme: 'four-class', varieties: ['White'], sourceNote: 'invented for tests',
    weightLimits: miniRex.weightLimits, evaluationTemplate: miniRex.evaluationTemplate,
  });
  const animals = db.getRepository(Animal);
  const common = { rabbitryId: ids.r1, breedId: miniRex.id, status: 'active' as const, isStub: false };
  const sire = await animals.save(animals.create({ ...common, earId: 'SIRE1', name: 'Fixture Sire', sex: 'buck', birthDate: '2024-01-10', variety: 'Black' }));
  const dam = await animals.save(animals.create({ ...common, earId: 'DAM1', name: 'Fixture Dam', sex: 'doe', birthDate: '2024-02-10', variety: 'Blue' }));
  const litter = await db.getRepository(Litter).save({
    rabbitryId: ids.r1, code: 'FIX-L1', sireId: sire.id, damId: dam.id, bredOn: '2025-05-01', kindledOn: '2025-06-01', bornAlive: 6,
  });
  const kit = await animals.save(animals.create({
    ...common, earId: 'KIT1', name: 'Fixture Kit', sex: 'buck', birthDate: '2025-06-01', variety: 'Black', sireId: sire.id, damId: dam.id, litterId: litter.id,
  }));
  const lone = await animals.save(animals.create({ ...common, earId: 'LONE1', sex: 'doe', birthDate: '2025-07-01' }));
  const weight = await db.getRepository(WeightRecord).save({ animalId: kit.id, weighedOn: '2025-12-01', grams: 1700, notes: null });
  const evaluation = await db.getRepository(Evaluation).save({ animalId: kit.id, evaluatedOn: '2025-12-01', evaluator: null, scores: { body_type: 40, fur: 30 }, notes: null });
  const note = await db.getRepository(MentorNote).save({ rabbitryId: ids.r1, animalId: kit.id, authorId: ids.user('mentor@example.test'), body: 'Good shoulders; watch the fur' });
  const dataDir = loadConfig({ ...process.env, SESSION_SECRET: 'fixture-secret-fixture-secret-fixture' }).DATA_DIR;
  const photoPath = await new PhotoStore(dataDir).save(ids.r1, kit.id, 'png', TINY_PNG);
  await animals.update({ id: kit.id }, { photoPath });

  const shows = db.getRepository(Show);
  const show = await shows.save({ clubId: ids.c1, name: 'Fixture Spring Show', showDate: '2026-03-14', location: 'Fixture Hall', hostClub: null, judges: ['Judge Quill'], sanctionNo: null });
  const emptyShow = await shows.save({ clubId: ids.c1, name: 'Fixture Empty Show', showDate: '2026-04-11', location: null, hostClub: null, judges: [], sanctionNo: null });
  const result = await db.getRepository(ShowResult).save({
    showId: show.id, animalId: kit.id, earId: 'KIT1', exhibitor: 'Marla Fenwick', breed: 'Mini Rex', variety: 'Black', sex: 'buck',
    ageClass: 'senior', entriesInClass: 6, exhibitorsInClass: 3, placing: 1, awards: 'BOV', judge: 'Judge Quill', dedupeKey: Buffer.alloc(20, 7), importJobId: null,
  });
  return {
    breedId: miniRex.id, unusedBreedId: unused.id, sireId: sire.id, damId: dam.id, animalId: kit.id, loneAnimalId: lone.id,
    litterId: litter.id, weightId: weight.id, evaluationId: evaluation.id, noteId: note.id, showId: show.id, emptyShowId: emptyShow.id, resultId: result.id,
  };
}
