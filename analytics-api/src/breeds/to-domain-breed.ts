import { breedKeyOf } from '@shared/contracts/breeds';
import type { Breed as DomainBreed } from '@shared/domain/breed';
import type { Breed } from '../db/entities/breed.entity';

/** The catalogue row as the domain rules read it (JSON columns typed, key from the name). */
export function toDomainBreed(b: Pick<Breed, 'name' | 'classScheme' | 'varieties' | 'weightLimits' | 'evaluationTemplate' | 'sourceNote'>): DomainBreed {
  return {
    key: breedKeyOf(b.name),
    name: b.name,
    classScheme: b.classScheme,
    varieties: b.varieties,
    weightLimits: b.weightLimits as DomainBreed['weightLimits'],
    evaluationTemplate: b.evaluationTemplate as DomainBreed['evaluationTemplate'],
    ...(b.sourceNote ? { source: b.sourceNote } : {}),
  };
}
