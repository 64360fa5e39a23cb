import type { Animal } from '@shared/contracts/animals';
import type { Sex } from '@shared/domain/terms';
import type { AnimalChange, NewAnimal } from './herd-api';

/** The animal form's values as the controls hold them (empty text for "not given"). */
export interface AnimalFormValue {
  earId: string;
  sex: Sex | '';
  name: string;
  breedId: number | null;
  variety: string;
  birthDate: string;
  sireEarId: string;
  damEarId: string;
  createStubs: boolean;
  line: string;
  registrationNo: string;
  notes: string;
}

/** The record being edited, with its parents' ear IDs as the form shows them. */
export type EditedAnimal = Animal & { sireEarId: string | null; damEarId: string | null };

const orNull = (text: string) => (text.trim() === '' ? null : text.trim());

/** The form's starting values: empty for a new animal, the record's values for an edit. */
export function animalFormValue(animal: EditedAnimal | null): AnimalFormValue {
  return {
    earId: animal?.earId ?? '',
    sex: animal?.sex ?? '',
    name: animal?.name ?? '',
    breedId: animal?.breedId ?? null,
    variety: animal?.variety ?? '',
    birthDate: animal?.birthDate ?? '',
    sireEarId: animal?.sireEarId ?? '',
    damEarId: animal?.damEarId ?? '',
    createStubs: false,
    line: animal?.line ?? '',
    registrationNo: animal?.registrationNo ?? '',
    notes: animal?.notes ?? '',
  };
}

/** A new animal: empty texts become "not given"; the API validates it again. O(fields). */
export function newAnimalRequest(v: AnimalFormValue): NewAnimal {
  if (v.sex === '') throw new Error('newAnimalRequest requires a sex');
  return {
    earId: v.earId.trim(),
    sex: v.sex,
    name: orNull(v.name),
    breedId: v.breedId,
    variety: orNull(v.variety),
    birthDate: orNull(v.birthDate),
    sireEarId: orNull(v.sireEarId),
    damEarId: orNull(v.damEarId),
    createStubs: v.createStubs,
    line: orNull(v.line),
    registrationNo: orNull(v.registrationNo),
    notes: orNull(v.notes),
  };
}

/**
 * Only what the breeder changed, so an edit never rewrites a field someone else changed
 * meanwhile; a cleared field is sent as null. O(fields).
 */
export function animalChange(v: AnimalFormValue, before: EditedAnimal): AnimalChange {
  const was = animalFormValue(before);
  const next = newAnimalRequest(v);
  const change: Record<string, unknown> = {};
  for (const key of Object.keys(was) as (keyof AnimalFormValue)[]) {
    if (key === 'createStubs') continue;
    const now = typeof v[key] === 'string' ? (v[key] as string).trim() : v[key];
    const then = typeof was[key] === 'string' ? (was[key] as string).trim() : was[key];
    if (now !== then) change[key] = next[key as keyof NewAnimal];
  }
  if ('sireEarId' in change || 'damEarId' in change) change['createStubs'] = v.createStubs;
  return change as AnimalChange;
}
