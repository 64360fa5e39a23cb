import type { EntityManager } from 'typeorm';
import { Animal } from '../db/entities/animal.entity';
import { notFound } from '../http/app-error';

/** An animal of the rabbitry the route names; another herd's animal is simply not found. */
export async function findAnimal(m: EntityManager, rabbitryId: number, animalId: number): Promise<Animal> {
  const a = await m.getRepository(Animal).findOneBy({ id: animalId, rabbitryId });
  if (!a) throw notFound('Animal');
  return a;
}
