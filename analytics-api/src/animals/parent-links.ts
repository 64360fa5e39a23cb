import type { EntityManager } from 'typeorm';
import { Animal } from '../db/entities/animal.entity';
import { AppError } from '../http/app-error';
import { parentProblem } from './parent-problem';

export interface ParentRequest {
  role: 'sire' | 'dam';
  earId: string;
  /** The request field that named the parent, for the error details. */
  field: string;
  /** The child's birth date (or a litter's bred date), to check birth order. */
  childBorn: string | null;
  /** Create an outside stub when no animal has the ear ID. */
  createStubs: boolean;
  /** Breed given to a new stub. */
  stubBreedId: number | null;
  /** The child itself when editing: it may not become its own ancestor. */
  childId?: number;
}

const refuse = (field: string, message: string) => new AppError('validation', message, 400, { [field]: message });

/**
 * The parent an ear ID names in the rabbitry: found, or created as an outside stub when asked,
 * and checked (sex, birth order, no loop in the pedigree). Throws AppError 400 naming the field.
 */
export async function resolveParent(tx: EntityManager, rabbitryId: number, p: ParentRequest): Promise<Animal> {
  const repo = tx.getRepository(Animal);
  let parent = await repo.findOneBy({ rabbitryId, earId: p.earId });
  if (!parent) {
    if (!p.createStubs) {
      throw refuse(p.field, `No animal with ear ID ${p.earId} in this rabbitry; add it first, or ask to create outside parents as stubs`);
    }
    parent = await repo.save(repo.create({
      rabbitryId, earId: p.earId, sex: p.role === 'sire' ? 'buck' : 'doe', breedId: p.stubBreedId, isStub: true, status: 'active',
    }));
  }
  const problem = parentProblem(p.role, parent, p.childBorn);
  if (problem) throw refuse(p.field, problem);
  if (p.childId !== undefined && (parent.id === p.childId || (await isDescendant(tx, rabbitryId, p.childId, parent.id)))) {
    throw refuse(p.field, `${parent.earId} descends from this animal and cannot be its ${p.role}`);
  }
  return parent;
}

/** Whether `candidateId` descends from `ancestorId` (one recursive query down the pedigree). */
async function isDescendant(tx: EntityManager, rabbitryId: number, ancestorId: number, candidateId: number): Promise<boolean> {
  const rows: unknown[] = await tx.query(
    `WITH RECURSIVE down AS (
       SELECT id FROM animal WHERE (sire_id = ? OR dam_id = ?) AND rabbitry_id = ?
       UNION
       SELECT c.id FROM down JOIN animal c ON (c.sire_id = down.id OR c.dam_id = down.id) AND c.rabbitry_id = ?
     ) SELECT id FROM down WHERE id = ? LIMIT 1`, [ancestorId, ancestorId, rabbitryId, rabbitryId, candidateId]);
  return rows.length > 0;
}
