import * as z from 'zod';

/** Trade terms used across records, screens and imports, with the words screens show. */
export const SEXES = ['buck', 'doe'] as const;
export type Sex = (typeof SEXES)[number];
export const sexSchema = z.enum(SEXES);

export const AGE_CLASSES = ['junior', 'intermediate', 'senior'] as const;
export type AgeClass = (typeof AGE_CLASSES)[number];
export const ageClassSchema = z.enum(AGE_CLASSES);

/** Four-class breeds show junior and senior; six-class breeds add intermediate. */
export const CLASS_SCHEMES = ['four-class', 'six-class'] as const;
export type ClassScheme = (typeof CLASS_SCHEMES)[number];
export const classSchemeSchema = z.enum(CLASS_SCHEMES);

export const ANIMAL_STATUSES = ['active', 'sold', 'deceased', 'culled'] as const;
export type AnimalStatus = (typeof ANIMAL_STATUSES)[number];
export const animalStatusSchema = z.enum(ANIMAL_STATUSES);

/**
 * The longest ear (tattoo) ID Keeperline stores, wherever it comes from: forms, imports and the
 * database columns (animal.ear_id, show_result.ear_id) all use this one limit.
 */
export const EAR_ID_MAX_LENGTH = 32;

export const SEX_LABELS: Record<Sex, string> = { buck: 'Buck', doe: 'Doe' };
export const AGE_CLASS_LABELS: Record<AgeClass, string> = {
  junior: 'Junior',
  intermediate: 'Intermediate',
  senior: 'Senior',
};
export const CLASS_SCHEME_LABELS: Record<ClassScheme, string> = {
  'four-class': 'Four-class (junior, senior)',
  'six-class': 'Six-class (junior, intermediate, senior)',
};
export const ANIMAL_STATUS_LABELS: Record<AnimalStatus, string> = {
  active: 'Active',
  sold: 'Sold',
  deceased: 'Deceased',
  culled: 'Culled',
};

/** The age classes a scheme uses, youngest first. */
export function ageClassesOf(scheme: ClassScheme): readonly AgeClass[] {
  return scheme === 'six-class' ? AGE_CLASSES : ['junior', 'senior'];
}
