import type { DataSource } from 'typeorm';
import type { BreedRecord } from '@shared/contracts/breeds';
import type { Breed as DomainBreed } from '@shared/domain/breed';
import { Animal } from '../db/entities/animal.entity';
import { Breed } from '../db/entities/breed.entity';
import { AppError, notFound } from '../http/app-error';
import { toDomainBreed } from './to-domain-breed';

export class BreedsService {
  constructor(private readonly db: DataSource) {}

  async list(): Promise<BreedRecord[]> {
    const breeds = await this.db.getRepository(Breed).find({ order: { name: 'ASC' } });
    const counts: { breed_id: number; n: string }[] = await this.db.query(
      'SELECT breed_id, COUNT(*) AS n FROM animal WHERE breed_id IS NOT NULL GROUP BY breed_id');
    const used = new Map(counts.map((c) => [c.breed_id, Number(c.n)]));
    return breeds.map((b) => this.toRecord(b, used.get(b.id) ?? 0));
  }

  async create(input: DomainBreed): Promise<BreedRecord> {
    await this.refuseTakenName(input.name, null);
    const saved = await this.db.getRepository(Breed).save(this.toColumns(input));
    return this.toRecord(saved, 0);
  }

  /** The patch is merged over the stored breed; the caller validates the merged whole. */
  async merged(id: number, patch: Record<string, unknown>): Promise<Record<string, unknown>> {
    const b = await this.mustFind(id);
    const { key: _key, ...current } = toDomainBreed(b);
    return { ...current, ...patch };
  }

  async update(id: number, breed: DomainBreed): Promise<BreedRecord> {
    await this.mustFind(id);
    await this.refuseTakenName(breed.name, id);
    await this.db.getRepository(Breed).update({ id }, this.toColumns(breed));
    const animals = await this.db.getRepository(Animal).countBy({ breedId: id });
    return this.toRecord(await this.mustFind(id), animals);
  }

  /** A breed in use stays: its animals' weight checks and classes depend on it. */
  async remove(id: number): Promise<void> {
    const b = await this.mustFind(id);
    const animals = await this.db.getRepository(Animal).countBy({ breedId: id });
    if (animals > 0) {
      throw new AppError('conflict', `${b.name} is recorded for ${animals} animal${animals === 1 ? '' : 's'}; change their breed first, or keep the breed`, 409);
    }
    await this.db.getRepository(Breed).delete({ id });
  }

  private async mustFind(id: number): Promise<Breed> {
    const b = await this.db.getRepository(Breed).findOneBy({ id });
    if (!b) throw notFound('Breed');
    return b;
  }

  private async refuseTakenName(name: string, exceptId: number | null): Promise<void> {
    const other = await this.db.getRepository(Breed).findOneBy({ name });
    if (other && other.id !== exceptId) {
      throw new AppError('conflict', `The catalogue already has a breed named ${other.name}`, 409, { name: 'This name is taken' });
    }
  }

  private toColumns(b: DomainBreed) {
    return {
      name: b.name, classScheme: b.classScheme, varieties: b.varieties, weightLimits: b.weightLimits,
      evaluationTemplate: b.evaluationTemplate, sourceNote: b.source ?? null,
    };
  }

  private toRecord(b: Breed, animals: number): BreedRecord {
    const d = toDomainBreed(b);
    return {
      id: b.id, key: d.key, name: d.name, classScheme: d.classScheme, varieties: d.varieties,
      weightLimits: d.weightLimits, evaluationTemplate: d.evaluationTemplate, source: b.sourceNote, animals,
    };
  }
}
