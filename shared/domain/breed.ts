import * as z from 'zod';
import { type AgeClass, ageClassesOf, CLASS_SCHEMES, type ClassScheme, type Sex } from './terms';

/**
 * A breed in the catalogue. Breeds are data, edited by admins; a starter catalogue ships with
 * values marked as from memory, to be checked against the current official standard.
 */
export interface WeightLimits {
  minGrams: number | null;
  idealGrams: number | null;
  maxGrams: number | null;
  /** Where the numbers come from, e.g. "from memory — check against the current official standard". */
  source?: string;
}

/** Intermediate is null for four-class breeds. */
export type ClassWeightLimits = Record<'junior' | 'senior', WeightLimits> & { intermediate: WeightLimits | null };

export interface EvaluationTrait {
  key: string;
  label: string;
  points: number;
}

export interface EvaluationTemplate {
  traits: EvaluationTrait[];
  source?: string;
}

export interface Breed {
  key: string;
  name: string;
  classScheme: ClassScheme;
  varieties: string[];
  weightLimits: Record<Sex, ClassWeightLimits>;
  evaluationTemplate: EvaluationTemplate;
  source?: string;
}

/**
 * Keeperline's own default evaluation traits and points (100 in all). Breeds override the
 * points; these are a breeder's scoring aid, not any standard's points schedule.
 */
export const DEFAULT_EVALUATION_TRAITS: readonly EvaluationTrait[] = [
  { key: 'body_type', label: 'Body type', points: 35 },
  { key: 'balance', label: 'Balance', points: 10 },
  { key: 'head', label: 'Head', points: 10 },
  { key: 'ears_crown', label: 'Ears & crown', points: 10 },
  { key: 'bone', label: 'Bone', points: 5 },
  { key: 'fur', label: 'Fur', points: 20 },
  { key: 'condition', label: 'Condition', points: 10 },
];

/** The limits that apply to an animal of a sex and age class; null when the breed has no such class. */
export function limitsFor(breed: Breed, sex: Sex, ageClass: AgeClass): WeightLimits | null {
  return breed.weightLimits[sex][ageClass];
}

const grams = z.number().int().positive().nullable();

export const weightLimitsSchema = z
  .object({ minGrams: grams, idealGrams: grams, maxGrams: grams, source: z.string().optional() })
  .superRefine((l, ctx) => {
    const ordered = [l.minGrams, l.idealGrams, l.maxGrams].filter((v): v is number => v !== null);
    for (let i = 1; i < ordered.length; i++) {
      if (ordered[i]! < ordered[i - 1]!) {
        ctx.addIssue({ code: 'custom', message: 'weight limits must run minimum ≤ ideal ≤ maximum' });
        return;
      }
    }
  });

const classWeightLimitsSchema = z.object({
  junior: weightLimitsSchema,
  intermediate: weightLimitsSchema.nullable(),
  senior: weightLimitsSchema,
});

export const evaluationTraitSchema = z.object({
  key: z.string().regex(/^[a-z][a-z0-9_]*$/, 'a trait key is lower-case letters, digits and underscores'),
  label: z.string().trim().min(1),
  points: z.number().int().positive(),
});

export const evaluationTemplateSchema = z.object({
  traits: z
    .array(evaluationTraitSchema)
    .min(1, 'an evaluation template needs at least one trait')
    .refine((t) => new Set(t.map((x) => x.key)).size === t.length, 'trait keys must be unique'),
  source: z.string().optional(),
});

export const breedSchema = z
  .object({
    key: z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'a breed key is lower-case words joined by hyphens'),
    name: z.string().trim().min(1),
    classScheme: z.enum(CLASS_SCHEMES),
    varieties: z
      .array(z.string().trim().min(1))
      .refine((v) => new Set(v.map((x) => x.toLowerCase())).size === v.length, 'varieties must be unique'),
    weightLimits: z.object({ buck: classWeightLimitsSchema, doe: classWeightLimitsSchema }),
    evaluationTemplate: evaluationTemplateSchema,
    source: z.string().optional(),
  })
  .superRefine((b, ctx) => {
    const usesIntermediate = ageClassesOf(b.classScheme).includes('intermediate');
    for (const sex of ['buck', 'doe'] as const) {
      const present = b.weightLimits[sex].intermediate !== null;
      if (present !== usesIntermediate) {
        ctx.addIssue({
          code: 'custom',
          path: ['weightLimits', sex, 'intermediate'],
          message: usesIntermediate
            ? 'a six-class breed needs intermediate weight limits (use nulls for unknown values)'
            : 'a four-class breed has no intermediate class',
        });
      }
    }
  });
