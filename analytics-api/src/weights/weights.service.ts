import type { DataSource } from 'typeorm';
import type { Weight } from '@shared/contracts/animals';
import { formatWeight, type UnitSetting } from '@shared/units/weight';
import { WeightRecord } from '../db/entities/weight-record.entity';
import { AppError, notFound } from '../http/app-error';
import { isDuplicateKey } from '../animals/animal-dto';
import { findAnimal } from '../animals/find-animal';
import { refuseFutureDate } from '../animals/record-dates';
import { readWeight } from './read-weight';
import { weightDto } from './weight-dto';

export class WeightsService {
  constructor(private readonly db: DataSource) {}

  async list(rabbitryId: number, animalId: number, unit: UnitSetting): Promise<Weight[]> {
    await findAnimal(this.db.manager, rabbitryId, animalId);
    const rows = await this.db.query('SELECT id, weighed_on, grams, notes FROM weight_record WHERE animal_id = ? ORDER BY weighed_on', [animalId]);
    return rows.map((r: Record<string, unknown>) => weightDto(r, unit));
  }

  /** The weight is read as typed with the user's unit setting; one weighing per animal and day. */
  async add(rabbitryId: number, animalId: number, unit: UnitSetting, input: { weighedOn: string; weight: string; notes?: string | null }): Promise<Weight> {
    const a = await findAnimal(this.db.manager, rabbitryId, animalId);
    refuseFutureDate(input.weighedOn, 'weighedOn', 'A weighing');
    if (a.birthDate && input.weighedOn < a.birthDate) {
      throw new AppError('validation', `A weighing cannot come before the birth date (${a.birthDate})`, 400, { weighedOn: 'Before the birth date' });
    }
    const grams = readWeight(input.weight, unit, 'weight');
    const repo = this.db.getRepository(WeightRecord);
    const existing = await repo.findOneBy({ animalId, weighedOn: input.weighedOn });
    if (existing) throw this.duplicate(a.earId, input.weighedOn, existing.grams, unit);
    try {
      const saved = await repo.save({ animalId, weighedOn: input.weighedOn, grams, notes: input.notes ?? null });
      return weightDto({ id: saved.id, weighed_on: saved.weighedOn, grams: saved.grams, notes: saved.notes }, unit);
    } catch (e) {
      if (isDuplicateKey(e)) throw this.duplicate(a.earId, input.weighedOn, grams, unit);
      throw e;
    }
  }

  async remove(rabbitryId: number, weightId: number): Promise<void> {
    const [row] = await this.db.query(
      'SELECT w.id FROM weight_record w JOIN animal a ON a.id = w.animal_id WHERE w.id = ? AND a.rabbitry_id = ?', [weightId, rabbitryId]);
    if (!row) throw notFound('Weighing');
    await this.db.getRepository(WeightRecord).delete({ id: weightId });
  }

  private duplicate(earId: string, date: string, grams: number, unit: UnitSetting) {
    return new AppError('conflict', `${earId} already has a weighing on ${date} (${formatWeight(grams, unit)}); delete it first to replace it`, 409, { weighedOn: 'Already weighed on this day' });
  }
}
