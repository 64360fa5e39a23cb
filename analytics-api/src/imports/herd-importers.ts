import type { DataSource, EntityManager } from 'typeorm';
import { DEFAULT_EVALUATION_TRAITS, type Breed as DomainBreed, type EvaluationTrait } from '@shared/domain/breed';
import { ageInDays } from '@shared/domain/age-class';
import type { ImportContext, ImportRecords, RowValidation } from '@shared/imports/import-records';
import { plausibleWeightRange } from '@shared/imports/plausible-weight-range';
import { traitsToMap } from '@shared/imports/traits-to-map';
import { rowValidator } from '@shared/imports/validate-row';
import { formatWeight } from '@shared/units/weight';
import { Animal } from '../db/entities/animal.entity';
import { Breed } from '../db/entities/breed.entity';
import { Evaluation } from '../db/entities/evaluation.entity';
import { Litter } from '../db/entities/litter.entity';
import { WeightRecord } from '../db/entities/weight-record.entity';
import type { CheckReport, CommitProgress, ImporterContext, KindImporter } from './kind-importer';

interface HerdAnimal { id: number; earId: string; sex: 'buck' | 'doe'; birthDate: string | null; breedId: number | null }

const BATCH = 1000;

/** A breed's evaluation traits; the default traits for no breed or a breed without a template. */
function traitsOfBreed(breed: Breed | undefined): readonly EvaluationTrait[] {
  const traits = (breed?.evaluationTemplate as { traits?: EvaluationTrait[] } | null | undefined)?.traits;
  return traits?.length ? traits : DEFAULT_EVALUATION_TRAITS;
}

/** What every herd importer needs: the rabbitry's animals by ear ID and the breed catalogue. */
class HerdContext {
  animals = new Map<string, HerdAnimal>();
  breedsByName = new Map<string, Breed>();
  breedsById = new Map<number, Breed>();

  static async load(db: DataSource, rabbitryId: number): Promise<HerdContext> {
    const h = new HerdContext();
    const rows: { id: number; ear_id: string; sex: 'buck' | 'doe'; birth_date: string | null; breed_id: number | null }[] =
      await db.query('SELECT id, ear_id, sex, birth_date, breed_id FROM animal WHERE rabbitry_id = ?', [rabbitryId]);
    for (const r of rows) h.animals.set(r.ear_id.toUpperCase(), { id: r.id, earId: r.ear_id, sex: r.sex, birthDate: r.birth_date, breedId: r.breed_id });
    for (const b of await db.getRepository(Breed).find()) {
      h.breedsByName.set(b.name.toLowerCase(), b);
      h.breedsById.set(b.id, b);
    }
    return h;
  }

  traitsOf(breedId: number | null): readonly EvaluationTrait[] {
    return traitsOfBreed(breedId ? this.breedsById.get(breedId) : undefined);
  }

  domainBreed(breedId: number | null): DomainBreed | null {
    const b = breedId ? this.breedsById.get(breedId) : undefined;
    if (!b) return null;
    return { key: String(b.id), name: b.name, classScheme: b.classScheme, varieties: b.varieties, weightLimits: b.weightLimits as DomainBreed['weightLimits'], evaluationTemplate: b.evaluationTemplate as DomainBreed['evaluationTemplate'] };
  }
}

/** Stub animals for ear IDs from outside the herd, inserted first in the commit. */
class Stubs {
  readonly wanted = new Map<string, 'buck' | 'doe' | null>();
  want(earId: string, sex: 'buck' | 'doe' | null) {
    if (!this.wanted.has(earId) || this.wanted.get(earId) === null) this.wanted.set(earId, sex);
  }
  async insert(tx: EntityManager, rabbitryId: number, herd: HerdContext): Promise<void> {
    const rows = [...this.wanted].filter(([ear]) => !herd.animals.has(ear))
      .map(([earId, sex]) => ({ rabbitryId, earId, sex: sex ?? 'doe', isStub: true, status: 'active' as const, notes: sex ? null : 'Sex unknown (created by an import)' }));
    for (let i = 0; i < rows.length; i += BATCH) {
      const saved = await tx.getRepository(Animal).save(rows.slice(i, i + BATCH), { chunk: BATCH });
      for (const a of saved) herd.animals.set(a.earId, { id: a.id, earId: a.earId, sex: a.sex, birthDate: null, breedId: null });
    }
  }
}

type HerdKind = 'animals' | 'weights' | 'litters' | 'evaluations';

abstract class HerdImporter<K extends HerdKind> implements KindImporter<K> {
  protected readonly accepted: { row: number; record: ImportRecords[K] }[] = [];
  protected readonly stubs = new Stubs();
  constructor(protected readonly herd: HerdContext, protected readonly ctx: ImporterContext) {}
  abstract readonly validate: (cells: readonly string[]) => RowValidation<ImportRecords[K]>;
  abstract accept(record: ImportRecords[K], row: number, keyHash: string, report: CheckReport): void;
  async finishCheck(report: CheckReport): Promise<void> {
    report.stubsToCreate = [...this.stubs.wanted.keys()].filter((e) => !this.herd.animals.has(e)).length;
  }
  abstract commit(tx: EntityManager, progress: CommitProgress): Promise<number>;

  protected validator<V extends HerdKind>(kind: V, extra: Partial<ImportContext> = {}) {
    return rowValidator(kind, { ...this.baseCtx(), ...extra }, this.ctx.columns);
  }

  protected baseCtx() {
    return { dateOrder: this.ctx.options.dateOrder, unitSetting: this.ctx.unitSetting, today: this.ctx.today };
  }

  /** An ear ID the herd does not know: a stub when the user chose so, else the row is skipped. */
  protected resolveAnimal(earId: string, row: number, field: string, report: CheckReport): boolean {
    if (this.herd.animals.has(earId)) return true;
    if (this.ctx.options.unknownEarIds === 'create-stubs') {
      this.stubs.want(earId, null);
      report.problem(row, field, `ear ID ${earId} is not in the herd: a stub animal will be created`, 'warning');
      return true;
    }
    report.problem(row, field, `ear ID ${earId} is not in the herd: row skipped (choose "create stubs" to keep it)`, 'warning');
    report.skippedRows++;
    return false;
  }
}

export class AnimalsImporter extends HerdImporter<'animals'> {
  private readonly inFile = new Map<string, 'buck' | 'doe'>();

  readonly validate = this.validator('animals');

  accept(r: ImportRecords['animals'], row: number, _hash: string, report: CheckReport): void {
    if (!this.herd.breedsByName.has(r.breed.toLowerCase())) {
      report.problem(row, 'breed', `breed "${r.breed}" is not in the breed catalogue (known: ${[...this.herd.breedsByName.values()].map((b) => b.name).join(', ')})`, 'error');
      report.skippedRows++;
      return;
    }
    this.inFile.set(r.earId, r.sex);
    if (this.herd.animals.has(r.earId)) {
      report.alreadyPresent++;
      return;
    }
    report.newRows++;
    this.accepted.push({ row, record: r });
  }

  override async finishCheck(report: CheckReport): Promise<void> {
    for (const { row, record: r } of this.accepted) {
      for (const [field, ear, sex] of [['sire_ear_id', r.sireEarId, 'buck'], ['dam_ear_id', r.damEarId, 'doe']] as const) {
        if (!ear) continue;
        const knownSex = this.inFile.get(ear) ?? this.herd.animals.get(ear)?.sex;
        if (knownSex && knownSex !== sex) report.problem(row, field, `${ear} is recorded as a ${knownSex}, so it cannot be the ${field.startsWith('sire') ? 'sire' : 'dam'}`, 'error');
        else if (!knownSex && this.ctx.options.unknownEarIds === 'create-stubs') this.stubs.want(ear, sex);
        else if (!knownSex) report.problem(row, field, `parent ${ear} is neither in the herd nor in the file: the link is left empty`, 'warning');
      }
    }
    await super.finishCheck(report);
  }

  async commit(tx: EntityManager, progress: CommitProgress): Promise<number> {
    const rabbitryId = this.ctx.scopeId;
    await this.stubs.insert(tx, rabbitryId, this.herd);
    const rows = this.accepted.map(({ record: r }) => ({
      rabbitryId, earId: r.earId, name: r.name, sex: r.sex, breedId: this.herd.breedsByName.get(r.breed.toLowerCase())!.id,
      variety: r.variety, birthDate: r.born, line: r.line, status: r.status ?? 'active', registrationNo: r.registrationNo,
      grandChampion: r.grandChampion ?? false, breeder: r.breeder, isStub: r.outside, stubWeightGrams: r.outside ? r.weightGrams : null,
      notes: r.notes,
    }));
    for (let i = 0; i < rows.length; i += BATCH) {
      const saved = await tx.getRepository(Animal).save(rows.slice(i, i + BATCH), { chunk: BATCH });
      for (const a of saved) this.herd.animals.set(a.earId, { id: a.id, earId: a.earId, sex: a.sex, birthDate: a.birthDate, breedId: a.breedId });
      progress((i + saved.length) / rows.length / 2, i + saved.length); // the parent links below are the other half
    }
    // Parents are linked once every animal of the file has an id (a parent may come later in the file).
    for (const [k, { record: r }] of this.accepted.entries()) {
      const sire = r.sireEarId ? this.herd.animals.get(r.sireEarId) : undefined;
      const dam = r.damEarId ? this.herd.animals.get(r.damEarId) : undefined;
      if (sire || dam) {
        await tx.query('UPDATE animal SET sire_id = ?, dam_id = ? WHERE id = ?', [sire?.id ?? null, dam?.id ?? null, this.herd.animals.get(r.earId)!.id]);
      }
      progress(0.5 + (k + 1) / this.accepted.length / 2, rows.length);
    }
    return rows.length;
  }
}

export class WeightsImporter extends HerdImporter<'weights'> {
  private existing = new Set<string>();

  static async create(db: DataSource, ctx: ImporterContext): Promise<WeightsImporter> {
    const imp = new WeightsImporter(await HerdContext.load(db, ctx.scopeId), ctx);
    const rows: { a: number; d: string }[] = await db.query(
      'SELECT w.animal_id AS a, w.weighed_on AS d FROM weight_record w JOIN animal an ON an.id = w.animal_id WHERE an.rabbitry_id = ?', [ctx.scopeId]);
    for (const r of rows) imp.existing.add(`${r.a}|${r.d}`);
    return imp;
  }

  readonly validate = this.validator('weights');

  accept(r: ImportRecords['weights'], row: number, _hash: string, report: CheckReport): void {
    if (!this.resolveAnimal(r.earId, row, 'ear_id', report)) return;
    const animal = this.herd.animals.get(r.earId);
    if (animal && this.existing.has(`${animal.id}|${r.weighedOn}`)) {
      report.alreadyPresent++;
      return;
    }
    if (animal?.birthDate) {
      if (r.weighedOn < animal.birthDate) {
        report.problem(row, 'weighed_on', `weighed on ${r.weighedOn}, before the animal was born (${animal.birthDate})`, 'error');
        report.skippedRows++;
        return;
      }
      const breed = this.herd.domainBreed(animal.breedId);
      if (breed) {
        const range = plausibleWeightRange(breed, animal.sex, ageInDays(animal.birthDate, r.weighedOn));
        if ((range.minGrams !== null && r.grams < range.minGrams) || (range.maxGrams !== null && r.grams > range.maxGrams)) {
          report.problem(row, 'weight', `${formatWeight(r.grams, this.ctx.unitSetting)} is outside the plausible range for a ${breed.name} of this age (${range.minGrams === null ? 'no minimum' : formatWeight(range.minGrams, this.ctx.unitSetting)} – ${range.maxGrams === null ? 'no maximum' : formatWeight(range.maxGrams, this.ctx.unitSetting)}); check the entry`, 'warning');
        }
      }
    }
    report.newRows++;
    this.accepted.push({ row, record: r });
  }

  async commit(tx: EntityManager, progress: CommitProgress): Promise<number> {
    await this.stubs.insert(tx, this.ctx.scopeId, this.herd);
    const rows = this.accepted.map(({ record: r }) => ({ animalId: this.herd.animals.get(r.earId)!.id, weighedOn: r.weighedOn, grams: r.grams, notes: r.notes }));
    return insertIgnore(tx, 'weight_record', ['animal_id', 'weighed_on', 'grams', 'notes'], rows.map((r) => [r.animalId, r.weighedOn, r.grams, r.notes]), progress);
  }
}

export class LittersImporter extends HerdImporter<'litters'> {
  private existing = new Set<string>();

  static async create(db: DataSource, ctx: ImporterContext): Promise<LittersImporter> {
    const imp = new LittersImporter(await HerdContext.load(db, ctx.scopeId), ctx);
    for (const l of await db.getRepository(Litter).findBy({ rabbitryId: ctx.scopeId })) imp.existing.add(l.code.toUpperCase());
    return imp;
  }

  readonly validate = this.validator('litters');

  accept(r: ImportRecords['litters'], row: number, _hash: string, report: CheckReport): void {
    if (this.existing.has(r.litterCode.toUpperCase())) {
      report.alreadyPresent++;
      return;
    }
    for (const [field, ear, sex] of [['sire_ear_id', r.sireEarId, 'buck'], ['dam_ear_id', r.damEarId, 'doe']] as const) {
      const a = this.herd.animals.get(ear);
      if (a && a.sex !== sex) {
        report.problem(row, field, `${ear} is recorded as a ${a.sex}, so it cannot be the ${sex === 'buck' ? 'sire' : 'dam'}`, 'error');
        report.skippedRows++;
        return;
      }
      if (!a && !this.resolveAnimal(ear, row, field, report)) return;
      if (!a) this.stubs.want(ear, sex);
    }
    report.newRows++;
    this.accepted.push({ row, record: r });
  }

  async commit(tx: EntityManager, progress: CommitProgress): Promise<number> {
    await this.stubs.insert(tx, this.ctx.scopeId, this.herd);
    const rows = this.accepted.map(({ record: r }) => [this.ctx.scopeId, r.litterCode, this.herd.animals.get(r.sireEarId)!.id,
      this.herd.animals.get(r.damEarId)!.id, r.bredOn, r.kindledOn, r.bornAlive, r.bornDead, r.weaned, r.weight21dGrams, r.notes]);
    const added = await insertIgnore(tx, 'litter', ['rabbitry_id', 'code', 'sire_id', 'dam_id', 'bred_on', 'kindled_on', 'born_alive',
      'born_dead', 'weaned', 'weight_21d_grams', 'notes'], rows, progress);
    // Kits already in the herd belong to the litter whose parents and kindling date they share.
    await tx.query(`UPDATE animal a JOIN litter l ON l.rabbitry_id = a.rabbitry_id AND l.sire_id = a.sire_id AND l.dam_id = a.dam_id
      AND l.kindled_on = a.birth_date SET a.litter_id = l.id WHERE a.rabbitry_id = ? AND a.litter_id IS NULL`, [this.ctx.scopeId]);
    return added;
  }
}

export class EvaluationsImporter extends HerdImporter<'evaluations'> {
  private existing = new Set<string>();

  static async create(db: DataSource, ctx: ImporterContext): Promise<EvaluationsImporter> {
    const imp = new EvaluationsImporter(await HerdContext.load(db, ctx.scopeId), ctx);
    const rows: { a: number; d: string }[] = await db.query(
      'SELECT e.animal_id AS a, e.evaluated_on AS d FROM evaluation e JOIN animal an ON an.id = e.animal_id WHERE an.rabbitry_id = ?', [ctx.scopeId]);
    for (const r of rows) imp.existing.add(`${r.a}|${r.d}`);
    return imp;
  }

  /** One checker per breed: scores are checked against the template of the animal's own breed. */
  private readonly byBreed = new Map<number | null, (cells: readonly string[]) => RowValidation<ImportRecords['evaluations']>>();

  readonly validate = (cells: readonly string[]) => {
    const column = this.ctx.columns.ear_id;
    const ear = column === undefined ? '' : (cells[column] ?? '').trim().replace(/\s+/g, ' ').toUpperCase();
    const breedId = this.herd.animals.get(ear)?.breedId ?? null;
    let check = this.byBreed.get(breedId);
    if (!check) {
      check = this.validator('evaluations', { traits: this.herd.traitsOf(breedId), mappedTraits: this.ctx.mappedTraits });
      this.byBreed.set(breedId, check);
    }
    return check(cells);
  };

  accept(r: ImportRecords['evaluations'], row: number, _hash: string, report: CheckReport): void {
    if (!this.resolveAnimal(r.earId, row, 'ear_id', report)) return;
    const animal = this.herd.animals.get(r.earId);
    if (animal && this.existing.has(`${animal.id}|${r.evaluatedOn}`)) {
      report.alreadyPresent++;
      return;
    }
    report.newRows++;
    this.accepted.push({ row, record: r });
  }

  async commit(tx: EntityManager, progress: CommitProgress): Promise<number> {
    await this.stubs.insert(tx, this.ctx.scopeId, this.herd);
    const rows = this.accepted.map(({ record: r }) => [this.herd.animals.get(r.earId)!.id, r.evaluatedOn, r.evaluator, JSON.stringify(r.scores), r.notes]);
    return insertIgnore(tx, 'evaluation', ['animal_id', 'evaluated_on', 'evaluator', 'scores', 'notes'], rows, progress);
  }
}

/** Batched multi-row INSERT IGNORE (unique keys make a re-import add nothing); returns rows added. */
async function insertIgnore(tx: EntityManager, table: string, columns: string[], rows: unknown[][], progress: CommitProgress): Promise<number> {
  let added = 0;
  for (let i = 0; i < rows.length; i += BATCH) {
    const batch = rows.slice(i, i + BATCH);
    const placeholders = batch.map(() => `(${columns.map(() => '?').join(',')})`).join(',');
    const res = await tx.query(`INSERT IGNORE INTO \`${table}\` (${columns.map((c) => `\`${c}\``).join(',')}) VALUES ${placeholders}`, batch.flat());
    added += Number(res.affectedRows ?? 0);
    progress((i + batch.length) / rows.length, i + batch.length);
  }
  return added;
}

/**
 * The trait columns an evaluations file for a rabbitry may map: those of the evaluation
 * templates of the breeds its animals belong to (outside stubs aside; the default traits for
 * animals without a breed or a breed without a template), or of the whole catalogue while the
 * herd is empty.
 */
export async function evaluationTraitsFor(db: DataSource, rabbitryId: number): Promise<EvaluationTrait[]> {
  const breeds = new Map((await db.getRepository(Breed).find()).map((b) => [b.id, b]));
  const rows: { breed_id: number | null }[] = await db.query('SELECT DISTINCT breed_id FROM animal WHERE rabbitry_id = ? AND is_stub = 0', [rabbitryId]);
  const herdBreeds = rows.length ? rows.map((r) => (r.breed_id === null ? undefined : breeds.get(r.breed_id))) : [...breeds.values()];
  return traitsToMap(herdBreeds.map(traitsOfBreed));
}

export async function createHerdImporter(kind: 'animals' | 'weights' | 'litters' | 'evaluations', db: DataSource, ctx: ImporterContext) {
  switch (kind) {
    case 'animals': return new AnimalsImporter(await HerdContext.load(db, ctx.scopeId), ctx);
    case 'weights': return WeightsImporter.create(db, ctx);
    case 'litters': return LittersImporter.create(db, ctx);
    case 'evaluations': return EvaluationsImporter.create(db, ctx);
  }
}
