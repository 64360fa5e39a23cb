import { In, type DataSource, type EntityManager } from 'typeorm';
import type { AnimalSummary } from '@shared/contracts/animals';
import type { CreateLitterRequest, Litter as LitterDto, UpdateLitterRequest } from '@shared/contracts/litters';
import { toCsv } from '@shared/csv/to-csv';
import { kindlingWindow } from '@shared/domain/gestation';
import type { Sex } from '@shared/domain/terms';
import { formatWeight, type UnitSetting } from '@shared/units/weight';
import { Animal } from '../db/entities/animal.entity';
import { Litter } from '../db/entities/litter.entity';
import { AppError, notFound } from '../http/app-error';
import { isDuplicateKey, toSummary } from '../animals/animal-dto';
import { resolveParent } from '../animals/parent-links';
import { refuseFutureDate, todayUtc } from '../animals/record-dates';
import { readWeight } from '../weights/read-weight';
import { litterProblems } from './litter-problems';

const LITTER_SQL = `SELECT l.*, s.ear_id AS sire_ear_id, d.ear_id AS dam_ear_id,
    (SELECT COUNT(*) FROM animal k WHERE k.litter_id = l.id) AS kits
  FROM litter l LEFT JOIN animal s ON s.id = l.sire_id LEFT JOIN animal d ON d.id = l.dam_id
  WHERE l.rabbitry_id = ?`;

const csvColumns = (unit: UnitSetting) => [
  { header: 'Code', value: (l: LitterDto) => l.code },
  { header: 'Sire', value: (l: LitterDto) => l.sireEarId },
  { header: 'Dam', value: (l: LitterDto) => l.damEarId },
  { header: 'Bred on', value: (l: LitterDto) => l.bredOn },
  { header: 'Expected from', value: (l: LitterDto) => l.kindlingWindow?.expectedFrom },
  { header: 'Expected to', value: (l: LitterDto) => l.kindlingWindow?.expectedTo },
  { header: 'Kindled on', value: (l: LitterDto) => l.kindledOn },
  { header: 'Born alive', value: (l: LitterDto) => l.bornAlive },
  { header: 'Born dead', value: (l: LitterDto) => l.bornDead },
  { header: 'Weaned', value: (l: LitterDto) => l.weaned },
  { header: '21-day litter weight (g)', value: (l: LitterDto) => l.weight21dGrams },
  { header: `21-day litter weight (${unit})`, value: (l: LitterDto) => (l.weight21dGrams === null ? null : formatWeight(l.weight21dGrams, unit)) },
  { header: 'Kits recorded', value: (l: LitterDto) => l.kitsRecorded },
  { header: 'Notes', value: (l: LitterDto) => l.notes },
];

function toDto(r: Record<string, unknown>): LitterDto {
  const bredOn = r.bred_on as string | null;
  return {
    id: r.id as number, code: r.code as string, sireId: r.sire_id as number | null, sireEarId: r.sire_ear_id as string | null,
    damId: r.dam_id as number | null, damEarId: r.dam_ear_id as string | null, bredOn, kindledOn: r.kindled_on as string | null,
    kindlingWindow: bredOn ? kindlingWindow(bredOn) : null, bornAlive: r.born_alive as number | null, bornDead: r.born_dead as number | null,
    weaned: r.weaned as number | null, weight21dGrams: r.weight_21d_grams as number | null, kitsRecorded: Number(r.kits), notes: r.notes as string | null,
  };
}

export class LittersService {
  constructor(private readonly db: DataSource) {}

  async list(rabbitryId: number): Promise<LitterDto[]> {
    const rows = await this.db.query(`${LITTER_SQL} ORDER BY COALESCE(l.kindled_on, l.bred_on) DESC, l.id DESC`, [rabbitryId]);
    return rows.map(toDto);
  }

  async csv(rabbitryId: number, unit: UnitSetting): Promise<string> {
    return toCsv(await this.list(rabbitryId), csvColumns(unit));
  }

  async read(rabbitryId: number, litterId: number, m: EntityManager = this.db.manager): Promise<LitterDto> {
    const [row] = await m.query(`${LITTER_SQL} AND l.id = ?`, [rabbitryId, litterId]);
    if (!row) throw notFound('Litter');
    return toDto(row);
  }

  async create(rabbitryId: number, unit: UnitSetting, input: CreateLitterRequest): Promise<LitterDto> {
    const id = await this.db.transaction(async (tx) => {
      const values = await this.checked(tx, rabbitryId, unit, input, { bredOn: null, kindledOn: null, bornAlive: null, weaned: null, kitsRecorded: 0 });
      const code = input.code ?? (await this.freeCode(tx, rabbitryId, `${input.damEarId ?? 'L'}-${input.kindledOn ?? input.bredOn ?? todayUtc()}`));
      try {
        return (await tx.getRepository(Litter).save({ rabbitryId, code, notes: input.notes ?? null, ...values })).id;
      } catch (e) {
        if (isDuplicateKey(e)) throw this.codeTaken(code);
        throw e;
      }
    });
    return this.read(rabbitryId, id);
  }

  async update(rabbitryId: number, litterId: number, unit: UnitSetting, input: UpdateLitterRequest): Promise<LitterDto> {
    await this.db.transaction(async (tx) => {
      const current = await this.read(rabbitryId, litterId, tx);
      const values = await this.checked(tx, rabbitryId, unit, input, current);
      const patch: Partial<Litter> = { ...values };
      if (input.code !== undefined) patch.code = input.code;
      if (input.notes !== undefined) patch.notes = input.notes;
      try {
        await tx.getRepository(Litter).update({ id: litterId }, patch);
      } catch (e) {
        if (isDuplicateKey(e)) throw this.codeTaken(input.code!);
        throw e;
      }
    });
    return this.read(rabbitryId, litterId);
  }

  /**
   * Kits become animals of the herd with the litter's parents, the kindling date as birth date,
   * the dam's (else the sire's) breed and the litter filled in; all or none are created.
   */
  async addKits(rabbitryId: number, litterId: number, input: { count: number; sexes: Sex[]; earIdPrefix: string; firstNumber: number }): Promise<AnimalSummary[]> {
    return this.db.transaction(async (tx) => {
      const litter = await this.read(rabbitryId, litterId, tx);
      if (!litter.kindledOn) {
        throw new AppError('validation', 'Record the kindling date first: it is the kits\' birth date', 400, { kindledOn: 'Needed for the kits\' birth date' });
      }
      if (litter.bornAlive !== null && litter.kitsRecorded + input.count > litter.bornAlive) {
        const room = litter.bornAlive - litter.kitsRecorded;
        throw new AppError('validation', `${litter.bornAlive} were born alive and ${litter.kitsRecorded} kits are recorded; ${room} more can be added`, 400, { count: `At most ${room}` });
      }
      const earIds = Array.from({ length: input.count }, (_, i) => `${input.earIdPrefix}${input.firstNumber + i}`);
      const repo = tx.getRepository(Animal);
      const taken = await repo.findBy({ rabbitryId, earId: In(earIds) });
      if (taken.length) {
        throw new AppError('conflict', `Ear IDs already used in this rabbitry: ${taken.map((t) => t.earId).join(', ')}; choose another prefix or first number`, 409, { earIdPrefix: 'Ear IDs taken' });
      }
      const parents = await repo.findBy({ id: In([litter.sireId, litter.damId].filter((x): x is number => x !== null)), rabbitryId });
      const dam = parents.find((p) => p.id === litter.damId);
      const sire = parents.find((p) => p.id === litter.sireId);
      const kits = earIds.map((earId, i) => repo.create({
        rabbitryId, earId, sex: input.sexes[i]!, birthDate: litter.kindledOn, sireId: litter.sireId, damId: litter.damId,
        litterId: litter.id, breedId: dam?.breedId ?? sire?.breedId ?? null, line: dam?.line ?? null, status: 'active', isStub: false,
      }));
      try {
        return (await repo.save(kits)).map(toSummary);
      } catch (e) {
        if (isDuplicateKey(e)) throw new AppError('conflict', 'One of the ear IDs was taken meanwhile; try again', 409);
        throw e;
      }
    });
  }

  /** The litter's values after the request, checked: parents, dates, counts. */
  private async checked(
    tx: EntityManager, rabbitryId: number, unit: UnitSetting,
    input: Omit<UpdateLitterRequest, 'code' | 'notes'>,
    current: { bredOn: string | null; kindledOn: string | null; bornAlive: number | null; weaned: number | null; kitsRecorded: number; sireId?: number | null; damId?: number | null },
  ) {
    const pick = <K extends 'bredOn' | 'kindledOn' | 'bornAlive' | 'weaned'>(k: K) => (input[k] === undefined ? current[k] : input[k] ?? null);
    const v = {
      bredOn: pick('bredOn'), kindledOn: pick('kindledOn'), bornAlive: pick('bornAlive'), weaned: pick('weaned'),
      bornDead: input.bornDead, weight21dGrams: input.weight21d === undefined ? undefined : input.weight21d ? readWeight(input.weight21d, unit, 'weight21d') : null,
    };
    if (input.bredOn) refuseFutureDate(input.bredOn, 'bredOn', 'A breeding');
    if (input.kindledOn) refuseFutureDate(input.kindledOn, 'kindledOn', 'A kindling');
    const problems = litterProblems({ ...v, kitsRecorded: current.kitsRecorded });
    if (Object.keys(problems).length) throw new AppError('validation', Object.values(problems).join('; '), 400, problems);
    const parents: { sireId?: number | null; damId?: number | null } = {};
    for (const role of ['sire', 'dam'] as const) {
      const earId = input[`${role}EarId`];
      if (earId === undefined) continue;
      parents[`${role}Id`] = earId === null ? null : (await resolveParent(tx, rabbitryId, {
        role, earId, field: `${role}EarId`, childBorn: v.bredOn ?? v.kindledOn, createStubs: false, stubBreedId: null,
      })).id;
    }
    const out: Partial<Litter> = { bredOn: v.bredOn, kindledOn: v.kindledOn, bornAlive: v.bornAlive, weaned: v.weaned, ...parents };
    if (v.bornDead !== undefined) out.bornDead = v.bornDead ?? null;
    if (v.weight21dGrams !== undefined) out.weight21dGrams = v.weight21dGrams;
    return out;
  }

  private async freeCode(tx: EntityManager, rabbitryId: number, base: string): Promise<string> {
    const stem = base.slice(0, 36);
    for (let i = 1; ; i++) {
      const code = i === 1 ? stem : `${stem}-${i}`;
      if (!(await tx.getRepository(Litter).existsBy({ rabbitryId, code }))) return code;
    }
  }

  private codeTaken(code: string) {
    return new AppError('conflict', `Litter code ${code} is already used in this rabbitry`, 409, { code: 'Already used' });
  }
}
