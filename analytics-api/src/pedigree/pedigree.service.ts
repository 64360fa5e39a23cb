import type { DataSource } from 'typeorm';
import type { PedigreeTreeNode } from '@shared/contracts/animals';
import type { UnitSetting } from '@shared/units/weight';
import { Breed } from '../db/entities/breed.entity';
import { Rabbitry } from '../db/entities/rabbitry.entity';
import { notFound } from '../http/app-error';
import { findAnimal } from '../animals/find-animal';
import { todayUtc } from '../animals/record-dates';
import { loadPedigree } from './load-pedigree';
import { CERTIFICATE_GENERATIONS, renderPedigreePdf } from './pedigree-pdf';

export class PedigreeService {
  constructor(private readonly db: DataSource) {}

  async tree(rabbitryId: number, animalId: number, generations: number): Promise<PedigreeTreeNode> {
    const tree = await loadPedigree(this.db, rabbitryId, animalId, generations);
    if (!tree) throw notFound('Animal');
    return tree;
  }

  async certificate(rabbitryId: number, animalId: number, paper: 'letter' | 'a4', unit: UnitSetting): Promise<{ fileName: string; pdf: Buffer }> {
    const animal = await findAnimal(this.db.manager, rabbitryId, animalId);
    const [tree, breed, rabbitry] = await Promise.all([
      this.tree(rabbitryId, animalId, CERTIFICATE_GENERATIONS),
      animal.breedId ? this.db.getRepository(Breed).findOneBy({ id: animal.breedId }) : null,
      this.db.getRepository(Rabbitry).findOneByOrFail({ id: rabbitryId }),
    ]);
    const pdf = await renderPedigreePdf({
      tree, breed: breed?.name ?? null, birthDate: animal.birthDate, rabbitry: rabbitry.name, printedOn: todayUtc(), unit, paper,
    });
    const safe = animal.earId.replace(/[^\p{L}\p{N}-]+/gu, '_');
    return { fileName: `pedigree-${safe}.pdf`, pdf };
  }
}
