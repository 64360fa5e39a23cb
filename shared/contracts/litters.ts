import * as z from 'zod';
import { sexSchema } from '../domain/terms';
import { EarId, IsoDate } from './animals';

const count = z.number().int().min(0, 'A count is at least 0').max(30, 'A litter count is at most 30').nullish();
const text = (max: number) => z.string().trim().max(max).transform((s) => (s === '' ? null : s)).nullish();

const litterFields = {
  /** Parents by ear ID in this rabbitry (herd animals or outside stubs). */
  sireEarId: EarId.nullish(),
  damEarId: EarId.nullish(),
  bredOn: IsoDate.nullish(),
  kindledOn: IsoDate.nullish(),
  bornAlive: count,
  bornDead: count,
  weaned: count,
  /** Litter weight at 21 days as typed ("9 lb 4 oz", "4.2 kg"), read in the user's unit. */
  weight21d: z.string().trim().max(40).nullish(),
  notes: text(5000),
};

export const CreateLitterRequest = z.object({
  /** Unique per rabbitry; generated from the dam and date when left out. */
  code: z.string().trim().min(1).max(40).optional(),
  ...litterFields,
});
export type CreateLitterRequest = z.infer<typeof CreateLitterRequest>;

export const UpdateLitterRequest = z.object({
  code: z.string().trim().min(1).max(40).optional(),
  ...litterFields,
}).strict();
export type UpdateLitterRequest = z.infer<typeof UpdateLitterRequest>;

export const AddKitsRequest = z.object({
  count: z.number().int().min(1, 'Add at least one kit').max(20, 'At most 20 kits at once'),
  /**
   * One sex per kit, in ear ID order. Required: every animal record has a sex, and a guessed
   * one would mislead pairings and class entries; sexing can wait until the kits are recorded.
   */
  sexes: z.array(sexSchema),
  /** Kits get `<prefix><n>`, n = 1…count. */
  earIdPrefix: z.string().trim().min(1).max(28).regex(/^[\p{L}\p{N}][\p{L}\p{N}\-./ ]*$/u, 'An ear ID prefix holds letters, digits, - . / only'),
  firstNumber: z.number().int().min(0).max(9999).default(1),
}).superRefine((r, ctx) => {
  if (r.sexes.length !== r.count) {
    ctx.addIssue({ code: 'custom', path: ['sexes'], message: `Give one sex per kit (${r.count} kits, ${r.sexes.length} sexes)` });
  }
});

export const LitterQuery = z.object({ format: z.enum(['json', 'csv']).default('json') });

export const KindlingWindowDto = z.object({
  earliest: z.string(), expectedFrom: z.string(), expectedTo: z.string(), latest: z.string(),
});

export const Litter = z.object({
  id: z.number().int(),
  code: z.string(),
  sireId: z.number().int().nullable(),
  sireEarId: z.string().nullable(),
  damId: z.number().int().nullable(),
  damEarId: z.string().nullable(),
  bredOn: z.string().nullable(),
  kindledOn: z.string().nullable(),
  /** From the bred date: gestation 29–35 days, usually 31–32 (common practice). */
  kindlingWindow: KindlingWindowDto.nullable(),
  bornAlive: z.number().int().nullable(),
  bornDead: z.number().int().nullable(),
  weaned: z.number().int().nullable(),
  weight21dGrams: z.number().int().nullable(),
  /** Kits recorded as animals with this litter. */
  kitsRecorded: z.number().int(),
  notes: z.string().nullable(),
});
export type Litter = z.infer<typeof Litter>;

/** Shown beside the kindling window: the product supports the breeder's judgment, not a vet's. */
export const KINDLING_CAUTION =
  'Gestation usually runs 31–32 days (29–35). Put the nest box in a few days before the earliest date; a doe not kindled by the latest date, or one in distress, should be seen by a veterinarian.';
