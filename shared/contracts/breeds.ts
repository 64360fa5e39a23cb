import * as z from 'zod';
import { breedSchema } from '../domain/breed';

/**
 * A breed's key, derived from its name (the catalogue stores names; keys name breeds in files
 * and URLs): lower-case words joined by hyphens, accents dropped.
 */
export function breedKeyOf(name: string): string {
  return name.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toLowerCase()
    .replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '') || 'breed';
}

/** The catalogue's own schema; the key always follows from the name (the catalogue stores names). */
export const CreateBreedRequest = z.preprocess(
  (v) => (v && typeof v === 'object' && typeof (v as { name?: unknown }).name === 'string'
    ? { ...v, key: breedKeyOf((v as { name: string }).name) } : v),
  breedSchema,
);

/** Top-level fields to replace; the merged breed is checked with the catalogue schema. */
export const UpdateBreedRequest = z.object({
  name: z.unknown(), classScheme: z.unknown(), varieties: z.unknown(), weightLimits: z.unknown(),
  evaluationTemplate: z.unknown(), source: z.unknown(),
}).partial().strict();

export const BreedRecord = z.object({
  id: z.number().int(),
  key: z.string(),
  name: z.string(),
  classScheme: breedSchema.shape.classScheme,
  varieties: z.array(z.string()),
  weightLimits: breedSchema.shape.weightLimits,
  evaluationTemplate: breedSchema.shape.evaluationTemplate,
  source: z.string().nullable(),
  /** Animals recorded with this breed (a breed in use cannot be deleted). */
  animals: z.number().int(),
});
export type BreedRecord = z.infer<typeof BreedRecord>;
