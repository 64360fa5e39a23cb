import type { DataSource, EntityManager } from 'typeorm';
import type {
  AnimalProfile, ChangeStatusRequest, CreateAnimalRequest, HerdLine, HerdPage, HerdQuery, HerdRow, KeeperDecision, UpdateAnimalRequest,
} from '@shared/contracts/animals';
import { toCsv } from '@shared/csv/to-csv';
import { ageInDays } from '@shared/domain/age-class';
import type { Breed as DomainBreed } from '@shared/domain/breed';
import { limitsFor } from '@shared/domain/breed';
import { registrationReadiness } from '@shared/domain/registration';
import { checkWeightAgainstLimits } from '@shared/domain/weight-check';
import { formatWeight, type UnitSetting } from '@shared/units/weight';
import { Animal } from '../db/entities/animal.entity';
import { AnimalStatusChange } from '../db/entities/animal-status-change.entity';
import { Breed } from '../db/entities/breed.entity';
import { AppError } from '../http/app-error';
import { toDomainBreed } from '../breeds/to-domain-breed';
import { loadPedigree } from '../pedigree/load-pedigree';
import type { PhotoStore } from '../photos/photo-store';
import { computedAgeClass } from '../shows/computed-age-class';
import { loadShowRecords } from '../shows/load-show-records';
import { evaluationDto } from '../evaluations/evaluation-dto';
import { weightDto } from '../weights/weight-dto';
import { readWeight } from '../weights/read-weight';
import { isDuplicateKey, toAnimalDto, toAnimalLitter, toSummary } from './animal-dto';
import { findAnimal } from './find-animal';
import { herdSql } from './herd-query';
import { resolveParent } from './parent-links';
import { refuseFutureDate, todayUtc } from './record-dates';

/** Said beside a registration check: the product reads the records, the registrar decides. */
const REGISTRATION_CAUTION = 'A check of the records only (common practice); the registrar and the current official standard decide.';
const WEIGHT_CAUTION = 'Weighed against the catalogue limits for the age class on the weighing day; the judge and the show rules decide on the day.';

/** A breed with no limits, for animals recorded without one (then any weight counts as recorded). */
const NO_BREED: DomainBreed = {
  key: 'unknown', name: 'unknown', classScheme: 'four-class', varieties: [], evaluationTemplate: { traits: [] },
  weightLimits: Object.fromEntries((['buck', 'doe'] as const).map((s) => [s, {
    junior: { minGrams: null, idealGrams: null, maxGrams: null }, intermediate: null, senior: { minGrams: null, idealGrams: null, maxGrams: null },
  }])) as DomainBreed['weightLimits'],
};

const HERD_CSV_COLUMNS = (unit: UnitSetting) => [
  { header: 'Ear ID', value: (r: HerdRow) => r.earId },
  { header: 'Name', value: (r: HerdRow) => r.name },
  { header: 'Sex', value: (r: HerdRow) => r.sex },
  { header: 'Breed', value: (r: HerdRow) => r.breed },
  { header: 'Variety', value: (r: HerdRow) => r.variety },
  { header: 'Birth date', value: (r: HerdRow) => r.birthDate },
  { header: 'Age (days)', value: (r: HerdRow) => r.ageDays },
  { header: 'Age class', value: (r: HerdRow) => r.ageClass },
  { header: 'Line', value: (r: HerdRow) => r.line },
  { header: 'Status', value: (r: HerdRow) => r.status },
  { header: 'Outside stub', value: (r: HerdRow) => (r.isStub ? 'yes' : 'no') },
  { header: 'Registration no', value: (r: HerdRow) => r.registrationNo },
  { header: 'Latest weight (g)', value: (r: HerdRow) => r.latestWeightGrams },
  { header: `Latest weight (${unit})`, value: (r: HerdRow) => (r.latestWeightGrams === null ? null : formatWeight(r.latestWeightGrams, unit)) },
  { header: 'Weighed on', value: (r: HerdRow) => r.latestWeighedOn },
  { header: 'Legs', value: (r: HerdRow) => r.legs },
  { header: 'Grand champion', value: (r: HerdRow) => (r.grandChampion ? 'yes' : 'no') },
  { header: 'Keeper decision', value: (r: HerdRow) => r.keeperDecision },
];

export class AnimalsService {
  constructor(private readonly db: DataSource, private readonly photos: PhotoStore) {}

  // ---- herd table -----------------------------------------------------------------------

  /** One page of the herd table: four queries whatever the page size (rows, count, results, classes). */
  async list(rabbitryId: number, q: HerdQuery): Promise<HerdPage> {
    const today = todayUtc();
    const sql = herdSql(rabbitryId, q, today);
    const [rows, [{ n }]] = await Promise.all([this.db.query(sql.rows.sql, sql.rows.params), this.db.query(sql.count.sql, sql.count.params)]);
    return { rows: await this.herdRows(rows, today), total: Number(n), page: q.page, pageSize: q.pageSize };
  }

  /** The whole filtered table, in the table's sort order, as CSV. */
  async csv(rabbitryId: number, q: HerdQuery, unit: UnitSetting): Promise<string> {
    const today = todayUtc();
    const sql = herdSql(rabbitryId, q, today, false);
    return toCsv(await this.herdRows(await this.db.query(sql.rows.sql, sql.rows.params), today), HERD_CSV_COLUMNS(unit));
  }

  /** The herd's lines (names differing only in case counted together, under one of their spellings), most animals first. */
  async lines(rabbitryId: number): Promise<HerdLine[]> {
    const rows: Record<string, unknown>[] = await this.db.query(
      `SELECT MIN(line) AS line, SUM(is_stub = 0) AS animals, SUM(is_stub = 0 AND status = 'active') AS active, SUM(is_stub = 1) AS outside
         FROM animal WHERE rabbitry_id = ? AND line IS NOT NULL AND line <> '' GROUP BY LOWER(line)
        ORDER BY animals DESC, line`, [rabbitryId]);
    return rows.map((r) => ({ line: r.line as string, animals: Number(r.animals), active: Number(r.active), outside: Number(r.outside) }));
  }

  private async herdRows(rows: Record<string, unknown>[], today: string): Promise<HerdRow[]> {
    const facts = rows.map((r) => ({ id: r.id as number, birthDate: r.birth_date as string | null, classScheme: r.class_scheme as 'four-class' | 'six-class' | null }));
    const records = await loadShowRecords(this.db, facts);
    return rows.map((r, i) => {
      const birth = facts[i]!.birthDate;
      const status = records.get(facts[i]!.id)!.status;
      return {
        id: r.id as number, earId: r.ear_id as string, name: r.name as string | null, sex: r.sex as HerdRow['sex'],
        breedId: r.breed_id as number | null, breed: r.breed as string | null, variety: r.variety as string | null, birthDate: birth,
        ageDays: birth && birth <= today ? ageInDays(birth, today) : null,
        ageClass: computedAgeClass(birth, today, facts[i]!.classScheme),
        line: r.line as string | null, status: r.status as HerdRow['status'], isStub: Boolean(r.is_stub),
        registrationNo: r.registration_no as string | null,
        latestWeightGrams: r.lw_grams as number | null, latestWeighedOn: r.lw_on as string | null,
        legs: status.legs.length, grandChampion: Boolean(r.grand_champion) || status.isGrandChampion,
        keeperDecision: r.keeper_decision as HerdRow['keeperDecision'],
      };
    });
  }

  // ---- writing --------------------------------------------------------------------------

  async create(rabbitryId: number, unit: UnitSetting, input: CreateAnimalRequest): Promise<AnimalProfile['animal']> {
    if (input.birthDate) refuseFutureDate(input.birthDate, 'birthDate', 'A birth date');
    const id = await this.db.transaction(async (tx) => {
      await this.refuseTakenEarId(tx, rabbitryId, input.earId, null);
      await this.requireBreed(tx, input.breedId ?? null);
      const stubWeightGrams = this.stubWeight(input.isStub, input.stubWeight, unit);
      const parents = await this.parents(tx, rabbitryId, input, { birthDate: input.birthDate ?? null, breedId: input.breedId ?? null });
      const repo = tx.getRepository(Animal);
      try {
        const saved = await repo.save(repo.create({
          rabbitryId, earId: input.earId, sex: input.sex, status: input.status, isStub: input.isStub,
          name: input.name ?? null, breedId: input.breedId ?? null, variety: input.variety ?? null, birthDate: input.birthDate ?? null,
          line: input.line ?? null, registrationNo: input.registrationNo ?? null, grandChampion: input.grandChampion ?? false,
          breeder: input.breeder ?? null, notes: input.notes ?? null, stubWeightGrams,
          sireId: parents.sireId ?? null, damId: parents.damId ?? null,
        }));
        return saved.id;
      } catch (e) {
        if (isDuplicateKey(e)) throw this.earIdTaken(input.earId);
        throw e;
      }
    });
    return this.read(rabbitryId, id);
  }

  async update(rabbitryId: number, animalId: number, unit: UnitSetting, input: UpdateAnimalRequest): Promise<AnimalProfile['animal']> {
    if (input.birthDate) refuseFutureDate(input.birthDate, 'birthDate', 'A birth date');
    await this.db.transaction(async (tx) => {
      const a = await findAnimal(tx, rabbitryId, animalId);
      const sex = input.sex ?? a.sex;
      const birthDate = input.birthDate === undefined ? a.birthDate : input.birthDate;
      const breedId = input.breedId === undefined ? a.breedId : input.breedId;
      if (input.earId && input.earId !== a.earId) await this.refuseTakenEarId(tx, rabbitryId, input.earId, a.id);
      if (input.breedId !== undefined) await this.requireBreed(tx, breedId);
      if (sex !== a.sex || birthDate !== a.birthDate) await this.refuseOffspringConflicts(tx, a, sex, birthDate);
      const parents = await this.parents(tx, rabbitryId, input, { birthDate, breedId, id: a.id });
      const patch: Partial<Animal> = { sex, birthDate, breedId, ...parents };
      for (const k of ['earId', 'name', 'variety', 'line', 'registrationNo', 'grandChampion', 'breeder', 'notes'] as const) {
        if (input[k] !== undefined) (patch as Record<string, unknown>)[k] = input[k];
      }
      // Without new parents, a changed birth date must still come after the recorded parents'.
      if (birthDate !== a.birthDate) {
        for (const [role, pid] of [['sire', a.sireId], ['dam', a.damId]] as const) {
          if (parents[`${role}Id`] !== undefined || pid === null) continue;
          const p = await tx.getRepository(Animal).findOneByOrFail({ id: pid });
          await resolveParent(tx, rabbitryId, { role, earId: p.earId, field: 'birthDate', childBorn: birthDate, createStubs: false, stubBreedId: null, childId: a.id });
        }
      }
      if (input.stubWeight !== undefined) patch.stubWeightGrams = this.stubWeight(a.isStub, input.stubWeight, unit);
      try {
        await tx.getRepository(Animal).update({ id: a.id }, patch);
      } catch (e) {
        if (isDuplicateKey(e)) throw this.earIdTaken(input.earId!);
        throw e;
      }
    });
    return this.read(rabbitryId, animalId);
  }

  /** Status changes are kept as history beside the current status. */
  async changeStatus(rabbitryId: number, animalId: number, userId: number, input: ChangeStatusRequest): Promise<AnimalProfile['statusHistory']> {
    refuseFutureDate(input.changedOn, 'changedOn', 'A status change');
    await this.db.transaction(async (tx) => {
      const a = await findAnimal(tx, rabbitryId, animalId);
      if (a.birthDate && input.changedOn < a.birthDate) {
        throw new AppError('validation', `A status change cannot come before the birth date (${a.birthDate})`, 400, { changedOn: 'Before the birth date' });
      }
      await tx.getRepository(Animal).update({ id: a.id }, { status: input.status });
      await tx.getRepository(AnimalStatusChange).save({ animalId: a.id, status: input.status, changedOn: input.changedOn, note: input.note ?? null, userId });
    });
    return this.statusHistory(animalId);
  }

  async setKeeperDecision(rabbitryId: number, animalId: number, decision: KeeperDecision): Promise<AnimalProfile['animal']> {
    const a = await findAnimal(this.db.manager, rabbitryId, animalId);
    await this.db.getRepository(Animal).update({ id: a.id }, { keeperDecision: decision });
    return this.read(rabbitryId, animalId);
  }

  /**
   * Only an animal without history may be deleted: offspring, litters, show results, weights and
   * evaluations are records of the herd (and of others' pedigrees) and are kept.
   */
  async remove(rabbitryId: number, animalId: number): Promise<void> {
    const photo = await this.db.transaction(async (tx) => {
      const a = await findAnimal(tx, rabbitryId, animalId);
      const [c] = await tx.query(
        `SELECT (SELECT COUNT(*) FROM animal WHERE sire_id = ? OR dam_id = ?) AS offspring,
                (SELECT COUNT(*) FROM litter WHERE sire_id = ? OR dam_id = ?) AS litters,
                (SELECT COUNT(*) FROM show_result WHERE animal_id = ?) AS results,
                (SELECT COUNT(*) FROM weight_record WHERE animal_id = ?) AS weights,
                (SELECT COUNT(*) FROM evaluation WHERE animal_id = ?) AS evaluations`,
        [a.id, a.id, a.id, a.id, a.id, a.id, a.id]);
      const held = (['offspring', 'litters', 'results', 'weights', 'evaluations'] as const)
        .map((k) => [k, Number(c[k])] as const).filter(([, n]) => n > 0);
      if (held.length) {
        const words = { offspring: ['offspring', 'offspring'], litters: ['litter', 'litters'], results: ['show result', 'show results'], weights: ['weighing', 'weighings'], evaluations: ['evaluation', 'evaluations'] };
        const list = held.map(([k, n]) => `${n} ${words[k][n === 1 ? 0 : 1]}`).join(', ');
        throw new AppError('conflict', `${a.earId} has ${list}, kept as history, so it cannot be deleted; change its status to sold, deceased or culled instead`, 409, Object.fromEntries(held));
      }
      await tx.getRepository(AnimalStatusChange).delete({ animalId: a.id });
      // Notes about the animal stay with the rabbitry.
      await tx.query('UPDATE mentor_note SET animal_id = NULL WHERE animal_id = ?', [a.id]);
      await tx.getRepository(Animal).delete({ id: a.id });
      return a.photoPath;
    });
    await this.photos.remove(photo);
  }

  // ---- reading --------------------------------------------------------------------------

  async read(rabbitryId: number, animalId: number): Promise<AnimalProfile['animal']> {
    const a = await findAnimal(this.db.manager, rabbitryId, animalId);
    const breed = a.breedId ? await this.db.getRepository(Breed).findOneBy({ id: a.breedId }) : null;
    return toAnimalDto(a, breed?.name ?? null);
  }

  /** Everything the animal screen shows, in a fixed number of queries. */
  async profile(rabbitryId: number, animalId: number, unit: UnitSetting): Promise<AnimalProfile> {
    const a = await findAnimal(this.db.manager, rabbitryId, animalId);
    const today = todayUtc();
    const animals = this.db.getRepository(Animal);
    const [breedRow, parents, offspring, weights, evaluations, statusHistory, litters, notes, pedigree] = await Promise.all([
      a.breedId ? this.db.getRepository(Breed).findOneBy({ id: a.breedId }) : null,
      a.sireId || a.damId ? animals.findBy([a.sireId, a.damId].filter((x): x is number => x !== null).map((id) => ({ id, rabbitryId }))) : [],
      animals.find({ where: [{ sireId: a.id, rabbitryId }, { damId: a.id, rabbitryId }], order: { birthDate: 'DESC', earId: 'ASC' } }),
      this.db.query('SELECT id, weighed_on, grams, notes FROM weight_record WHERE animal_id = ? ORDER BY weighed_on', [a.id]),
      this.db.query('SELECT id, evaluated_on, evaluator, scores, notes FROM evaluation WHERE animal_id = ? ORDER BY evaluated_on', [a.id]),
      this.statusHistory(a.id),
      this.db.query(
        `SELECT l.id, l.code, l.sire_id, l.dam_id, l.bred_on, l.kindled_on, l.born_alive, l.born_dead, l.weaned,
                m.id AS mate_id, m.ear_id AS mate_ear_id, m.name AS mate_name, (SELECT COUNT(*) FROM animal k WHERE k.litter_id = l.id) AS kits
           FROM litter l LEFT JOIN animal m ON m.id = IF(l.sire_id = ?, l.dam_id, l.sire_id)
          WHERE l.rabbitry_id = ? AND (l.sire_id = ? OR l.dam_id = ?)
          ORDER BY COALESCE(l.kindled_on, l.bred_on) DESC, l.id DESC`, [a.id, rabbitryId, a.id, a.id]),
      this.db.query(
        `SELECT n.id, u.display_name AS author, n.body, n.created_at FROM mentor_note n JOIN \`user\` u ON u.id = n.author_id
          WHERE n.rabbitry_id = ? AND n.animal_id = ? ORDER BY n.created_at DESC, n.id DESC`, [rabbitryId, a.id]),
      loadPedigree(this.db, rabbitryId, a.id, 3),
    ]);
    const breed = breedRow ? toDomainBreed(breedRow) : null;
    const scheme = breed?.classScheme ?? null;
    const records = await loadShowRecords(this.db, [{ id: a.id, birthDate: a.birthDate, classScheme: scheme }]);
    const record = records.get(a.id)!;
    const latest = weights.at(-1) as { weighed_on: string; grams: number } | undefined;

    const readiness = registrationReadiness(
      { birthDate: a.birthDate, sex: a.sex, latestWeightGrams: latest?.grams ?? a.stubWeightGrams, sire: pedigree?.sire ?? null, dam: pedigree?.dam ?? null },
      breed ?? NO_BREED, today, unit);
    if (!breed) readiness.missing.unshift('breed: no breed recorded');

    let weightCheck: AnimalProfile['weightCheck'] = null;
    const weighedClass = latest ? computedAgeClass(a.birthDate, latest.weighed_on, scheme) : null;
    if (latest && breed && weighedClass) {
      const limits = limitsFor(breed, a.sex, weighedClass);
      weightCheck = {
        grams: latest.grams, weighedOn: latest.weighed_on, ageClass: weighedClass,
        limits: limits && { minGrams: limits.minGrams, idealGrams: limits.idealGrams, maxGrams: limits.maxGrams },
        ...checkWeightAgainstLimits(latest.grams, limits), caution: WEIGHT_CAUTION,
      };
    }
    const traits = breed?.evaluationTemplate.traits ?? [];
    const byId = new Map(parents.map((p) => [p.id, p]));
    return {
      animal: toAnimalDto(a, breed?.name ?? null),
      ageDays: a.birthDate && a.birthDate <= today ? ageInDays(a.birthDate, today) : null,
      ageClass: computedAgeClass(a.birthDate, today, scheme),
      sire: a.sireId && byId.has(a.sireId) ? toSummary(byId.get(a.sireId)!) : null,
      dam: a.damId && byId.has(a.damId) ? toSummary(byId.get(a.damId)!) : null,
      weights: weights.map((w: Record<string, unknown>) => weightDto(w, unit)),
      evaluations: evaluations.map((e: Record<string, unknown>) => evaluationDto(e, traits)),
      statusHistory,
      showRecord: {
        results: record.results.map((r) => ({
          resultId: r.id, showId: r.showId, showName: r.showName, showDate: r.showDate, judge: r.judge ?? (r.showJudges.join(', ') || null),
          breed: r.breed, variety: r.variety, sex: r.sex, ageClass: r.ageClass, entriesInClass: r.entriesInClass,
          exhibitorsInClass: r.exhibitorsInClass, placing: r.placing, awards: r.awards,
          computedAgeClass: r.computedAgeClass, ageClassMismatch: r.ageClassMismatch,
        })),
        legs: record.status.legs,
        grandChampion: {
          recorded: a.grandChampion, earned: record.status.isGrandChampion,
          completedOn: record.status.completedOn, missing: record.status.missing,
        },
      },
      offspring: offspring.map(toSummary),
      litters: {
        asSire: litters.filter((l: Record<string, unknown>) => l.sire_id === a.id).map(toAnimalLitter),
        asDam: litters.filter((l: Record<string, unknown>) => l.dam_id === a.id).map(toAnimalLitter),
      },
      notes: notes.map((n: Record<string, unknown>) => ({
        id: n.id as number, authorName: n.author as string, body: n.body as string, createdAt: new Date(n.created_at as string).toISOString(),
      })),
      registration: { ...readiness, caution: REGISTRATION_CAUTION },
      weightCheck,
    };
  }

  private async statusHistory(animalId: number): Promise<AnimalProfile['statusHistory']> {
    const rows = await this.db.getRepository(AnimalStatusChange).find({ where: { animalId }, order: { changedOn: 'DESC', id: 'DESC' } });
    return rows.map((s) => ({ id: s.id, status: s.status, changedOn: s.changedOn, note: s.note }));
  }

  // ---- checks ---------------------------------------------------------------------------

  private earIdTaken(earId: string) {
    return new AppError('conflict', `Ear ID ${earId} is already used in this rabbitry; each animal needs its own`, 409, { earId: 'Already used in this rabbitry' });
  }

  private async refuseTakenEarId(tx: EntityManager, rabbitryId: number, earId: string, exceptId: number | null): Promise<void> {
    const other = await tx.getRepository(Animal).findOneBy({ rabbitryId, earId });
    if (other && other.id !== exceptId) {
      const what = other.isStub ? 'an outside parent (stub)' : other.name ? `"${other.name}"` : 'another animal';
      throw new AppError('conflict', `Ear ID ${other.earId} is already used in this rabbitry by ${what}; each animal needs its own`, 409, { earId: 'Already used in this rabbitry' });
    }
  }

  private async requireBreed(tx: EntityManager, breedId: number | null): Promise<void> {
    if (breedId !== null && !(await tx.getRepository(Breed).existsBy({ id: breedId }))) {
      throw new AppError('validation', 'That breed is not in the catalogue', 400, { breedId: 'Not in the breed catalogue' });
    }
  }

  private stubWeight(isStub: boolean, text: string | null | undefined, unit: UnitSetting): number | null {
    if (text === undefined || text === null || text === '') return null;
    if (!isStub) {
      throw new AppError('validation', 'A known weight is kept for outside parents only; record weighings of herd animals instead', 400, { stubWeight: 'Outside parents only' });
    }
    return readWeight(text, unit, 'stubWeight');
  }

  /** New parents as the request names them: undefined keeps, null clears. */
  private async parents(
    tx: EntityManager, rabbitryId: number,
    input: { sireEarId?: string | null; damEarId?: string | null; createStubs: boolean },
    child: { birthDate: string | null; breedId: number | null; id?: number },
  ): Promise<{ sireId?: number | null; damId?: number | null }> {
    const out: { sireId?: number | null; damId?: number | null } = {};
    for (const role of ['sire', 'dam'] as const) {
      const earId = input[`${role}EarId`];
      if (earId === undefined) continue;
      out[`${role}Id`] = earId === null ? null : (await resolveParent(tx, rabbitryId, {
        role, earId, field: `${role}EarId`, childBorn: child.birthDate, createStubs: input.createStubs, stubBreedId: child.breedId, childId: child.id,
      })).id;
    }
    return out;
  }

  /** A parent's sex and birth date bind its offspring's records. */
  private async refuseOffspringConflicts(tx: EntityManager, a: Animal, sex: Animal['sex'], birthDate: string | null): Promise<void> {
    const kids = await tx.getRepository(Animal).find({ where: [{ sireId: a.id }, { damId: a.id }] });
    if (sex !== a.sex && kids.length) {
      throw new AppError('conflict', `${a.earId} is recorded as ${a.sex === 'buck' ? 'sire' : 'dam'} of ${kids.length} animal${kids.length === 1 ? '' : 's'}; its sex cannot change while they name it`, 409, { sex: 'Recorded as a parent' });
    }
    const early = birthDate ? kids.find((k) => k.birthDate && k.birthDate <= birthDate) : undefined;
    if (early) {
      throw new AppError('validation', `${early.earId}, offspring of ${a.earId}, was born on ${early.birthDate}; a parent must be born first`, 400, { birthDate: 'After an offspring\'s birth' });
    }
  }
}
