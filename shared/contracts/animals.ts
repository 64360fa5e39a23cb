import * as z from 'zod';
import { parseIsoDate } from '../domain/calendar-date';
import { ageClassSchema, animalStatusSchema, EAR_ID_MAX_LENGTH, sexSchema } from '../domain/terms';
import { awardSchema } from '../domain/awards';

/** A calendar day as 'YYYY-MM-DD', the form every record uses. */
export const IsoDate = z.string().refine((s) => parseIsoDate(s) !== null, 'Give a date as YYYY-MM-DD');

/** Ear tattoo ID: letters, digits and - . / ; unique per rabbitry (case-insensitive). */
export const EarId = z.string().trim().min(1, 'Give the ear ID').max(EAR_ID_MAX_LENGTH, `An ear ID has at most ${EAR_ID_MAX_LENGTH} characters`)
  .regex(/^[\p{L}\p{N}][\p{L}\p{N}\-./ ]*$/u, 'An ear ID starts with a letter or digit and holds letters, digits, - . / only');

const text = (max: number) => z.string().trim().max(max).transform((s) => (s === '' ? null : s)).nullish();

export const KEEPER_DECISIONS = ['keep', 'sell', 'undecided'] as const;
export const KeeperDecision = z.enum(KEEPER_DECISIONS);
export type KeeperDecision = z.infer<typeof KeeperDecision>;

// ---- herd table -------------------------------------------------------------------------

export const HERD_SORTS = ['earId', 'name', 'sex', 'breed', 'variety', 'birthDate', 'line', 'status', 'latestWeight'] as const;

export const HerdQuery = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200, 'At most 200 rows per page').default(50),
  sort: z.enum(HERD_SORTS).default('earId'),
  dir: z.enum(['asc', 'desc']).default('asc'),
  /** Text search in ear ID and name. */
  q: z.string().trim().max(80).optional(),
  sex: sexSchema.optional(),
  breedId: z.coerce.number().int().positive().optional(),
  variety: z.string().trim().max(80).optional(),
  status: animalStatusSchema.optional(),
  line: z.string().trim().max(80).optional(),
  /** Age class today. */
  ageClass: ageClassSchema.optional(),
  /** Outside parents (stubs) are left out of the herd table unless asked for. */
  stubs: z.enum(['exclude', 'include', 'only']).default('exclude'),
  format: z.enum(['json', 'csv']).default('json'),
});
export type HerdQuery = z.infer<typeof HerdQuery>;

export const HerdRow = z.object({
  id: z.number().int(),
  earId: z.string(),
  name: z.string().nullable(),
  sex: sexSchema,
  breedId: z.number().int().nullable(),
  breed: z.string().nullable(),
  variety: z.string().nullable(),
  birthDate: z.string().nullable(),
  ageDays: z.number().int().nullable(),
  /** Today's age class by the breed's class scheme (four-class when the breed is unknown). */
  ageClass: ageClassSchema.nullable(),
  line: z.string().nullable(),
  status: animalStatusSchema,
  isStub: z.boolean(),
  registrationNo: z.string().nullable(),
  latestWeightGrams: z.number().int().nullable(),
  latestWeighedOn: z.string().nullable(),
  /** Legs toward grand champion earned by the recorded results (default leg rule). */
  legs: z.number().int(),
  /** Recorded as grand champion, or earned by the legs on record. */
  grandChampion: z.boolean(),
  keeperDecision: KeeperDecision.nullable(),
});
export type HerdRow = z.infer<typeof HerdRow>;

export const HerdPage = z.object({
  rows: z.array(HerdRow),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type HerdPage = z.infer<typeof HerdPage>;

/** A line of the herd with how many animals carry it. */
export const HerdLine = z.object({
  line: z.string(),
  /** Herd animals (not outside parents) of the line, and those of them active. */
  animals: z.number().int(),
  active: z.number().int(),
  /** Outside parents (stubs) recorded with the line. */
  outside: z.number().int(),
});
export type HerdLine = z.infer<typeof HerdLine>;
export const HerdLines = z.object({ lines: z.array(HerdLine) });

// ---- writing animals --------------------------------------------------------------------

const animalFields = {
  name: text(120),
  breedId: z.number().int().positive().nullish(),
  variety: text(80),
  birthDate: IsoDate.nullish(),
  line: text(80),
  registrationNo: text(40),
  grandChampion: z.boolean().optional(),
  breeder: text(120),
  notes: text(5000),
  /** Parents by ear ID within the rabbitry; null clears the parent. */
  sireEarId: EarId.nullish(),
  damEarId: EarId.nullish(),
  /** Known weight of an outside stub, as typed ("5 lb 12 oz", "2.6 kg"), read in the user's unit. */
  stubWeight: z.string().trim().max(40).nullish(),
};

export const CreateAnimalRequest = z.object({
  earId: EarId,
  sex: sexSchema,
  status: animalStatusSchema.default('active'),
  /** A stub: a parent from outside the herd, only its pedigree facts known. */
  isStub: z.boolean().default(false),
  /** Unknown parent ear IDs become stub animals instead of being refused. */
  createStubs: z.boolean().default(false),
  ...animalFields,
});
export type CreateAnimalRequest = z.infer<typeof CreateAnimalRequest>;

export const UpdateAnimalRequest = z.object({
  earId: EarId.optional(),
  sex: sexSchema.optional(),
  createStubs: z.boolean().default(false),
  ...animalFields,
}).strict();
export type UpdateAnimalRequest = z.infer<typeof UpdateAnimalRequest>;

export const ChangeStatusRequest = z.object({
  status: animalStatusSchema,
  changedOn: IsoDate,
  note: text(255),
});
export type ChangeStatusRequest = z.infer<typeof ChangeStatusRequest>;

export const KeeperDecisionRequest = z.object({ decision: KeeperDecision });

// ---- reading animals --------------------------------------------------------------------

export const AnimalSummary = z.object({
  id: z.number().int(),
  earId: z.string(),
  name: z.string().nullable(),
  sex: sexSchema,
  variety: z.string().nullable(),
  birthDate: z.string().nullable(),
  status: animalStatusSchema,
  isStub: z.boolean(),
});
export type AnimalSummary = z.infer<typeof AnimalSummary>;

export const Animal = AnimalSummary.extend({
  rabbitryId: z.number().int(),
  breedId: z.number().int().nullable(),
  breed: z.string().nullable(),
  sireId: z.number().int().nullable(),
  damId: z.number().int().nullable(),
  litterId: z.number().int().nullable(),
  line: z.string().nullable(),
  registrationNo: z.string().nullable(),
  grandChampion: z.boolean(),
  breeder: z.string().nullable(),
  stubWeightGrams: z.number().int().nullable(),
  hasPhoto: z.boolean(),
  notes: z.string().nullable(),
  keeperDecision: KeeperDecision.nullable(),
});
export type Animal = z.infer<typeof Animal>;

export const Weight = z.object({
  id: z.number().int(),
  weighedOn: z.string(),
  grams: z.number().int(),
  /** In the reader's unit setting. */
  display: z.string(),
  notes: z.string().nullable(),
});
export type Weight = z.infer<typeof Weight>;

export const AddWeightRequest = z.object({
  weighedOn: IsoDate,
  /** As typed: "5 lb 12 oz", "5.75 lb", "2.6 kg", "2600 g", or "5-12" with the lb-oz setting. */
  weight: z.string().max(40),
  notes: text(255),
});

export const Evaluation = z.object({
  id: z.number().int(),
  evaluatedOn: z.string(),
  evaluator: z.string().nullable(),
  scores: z.record(z.string(), z.number()),
  total: z.number(),
  /** Sum of the points of the traits scored. */
  possible: z.number(),
  notes: z.string().nullable(),
});
export type Evaluation = z.infer<typeof Evaluation>;

export const AddEvaluationRequest = z.object({
  evaluatedOn: IsoDate,
  evaluator: text(120),
  /** Trait key → score, each from 0 to the trait's points in the breed's template. */
  scores: z.record(z.string(), z.number().min(0, 'A score is at least 0'))
    .refine((s) => Object.keys(s).length > 0, 'Score at least one trait'),
  notes: text(5000),
});

export const StatusChange = z.object({
  id: z.number().int(),
  status: animalStatusSchema,
  changedOn: z.string(),
  note: z.string().nullable(),
});

export const ShowRecordLine = z.object({
  resultId: z.number().int(),
  showId: z.number().int(),
  showName: z.string(),
  showDate: z.string(),
  judge: z.string().nullable(),
  breed: z.string(),
  variety: z.string().nullable(),
  sex: sexSchema,
  ageClass: ageClassSchema,
  entriesInClass: z.number().int(),
  exhibitorsInClass: z.number().int(),
  placing: z.number().int(),
  awards: z.array(awardSchema),
  /** Age class computed from the birth date and the breed's class scheme, when known. */
  computedAgeClass: ageClassSchema.nullable(),
  ageClassMismatch: z.boolean(),
});

export const LegLine = z.object({
  showId: z.string(),
  showDate: z.string(),
  judge: z.string(),
  ageClass: ageClassSchema,
  basis: z.string(),
  entries: z.number().int(),
  exhibitors: z.number().int(),
});

export const WeightCheckResult = z.object({
  grams: z.number().int(),
  weighedOn: z.string(),
  ageClass: ageClassSchema,
  limits: z.object({ minGrams: z.number().nullable(), idealGrams: z.number().nullable(), maxGrams: z.number().nullable() }).nullable(),
  status: z.enum(['no-limits', 'under-minimum', 'on-ideal', 'within-limits', 'over-maximum']),
  disqualificationRisk: z.boolean(),
  gramsFromIdeal: z.number().nullable(),
  caution: z.string(),
});

/** A litter the animal sired or mothered, with its mate and counts. */
export const AnimalLitter = z.object({
  id: z.number().int(),
  code: z.string(),
  /** The other parent (the dam of a buck's litter, the sire of a doe's), when recorded. */
  mate: z.object({ id: z.number().int(), earId: z.string(), name: z.string().nullable() }).nullable(),
  bredOn: z.string().nullable(),
  kindledOn: z.string().nullable(),
  bornAlive: z.number().int().nullable(),
  bornDead: z.number().int().nullable(),
  weaned: z.number().int().nullable(),
  /** Kits recorded as animals with this litter. */
  kitsRecorded: z.number().int(),
});
export type AnimalLitter = z.infer<typeof AnimalLitter>;

export const AnimalProfile = z.object({
  animal: Animal,
  ageDays: z.number().int().nullable(),
  ageClass: ageClassSchema.nullable(),
  sire: AnimalSummary.nullable(),
  dam: AnimalSummary.nullable(),
  weights: z.array(Weight),
  evaluations: z.array(Evaluation),
  statusHistory: z.array(StatusChange),
  showRecord: z.object({
    results: z.array(ShowRecordLine),
    legs: z.array(LegLine),
    grandChampion: z.object({
      recorded: z.boolean(),
      earned: z.boolean(),
      completedOn: z.string().nullable(),
      missing: z.array(z.string()),
    }),
  }),
  offspring: z.array(AnimalSummary),
  /** Newest first (by kindling, else breeding date). */
  litters: z.object({ asSire: z.array(AnimalLitter), asDam: z.array(AnimalLitter) }),
  notes: z.array(z.object({ id: z.number().int(), authorName: z.string(), body: z.string(), createdAt: z.string() })),
  registration: z.object({ ready: z.boolean(), missing: z.array(z.string()), caution: z.string() }),
  weightCheck: WeightCheckResult.nullable(),
});
export type AnimalProfile = z.infer<typeof AnimalProfile>;

// ---- pedigree ---------------------------------------------------------------------------

export interface PedigreeTreeNode {
  id: number;
  earId: string;
  name: string | null;
  sex: 'buck' | 'doe';
  variety: string | null;
  /** Latest recorded weight, or the stub's known weight. */
  weightGrams: number | null;
  registrationNo: string | null;
  grandChampion: boolean;
  breeder: string | null;
  isStub: boolean;
  /** null: not recorded; absent beyond the generations asked for. */
  sire?: PedigreeTreeNode | null;
  dam?: PedigreeTreeNode | null;
}

export const PedigreeTreeNode: z.ZodType<PedigreeTreeNode> = z.lazy(() => z.object({
  id: z.number().int(),
  earId: z.string(),
  name: z.string().nullable(),
  sex: sexSchema,
  variety: z.string().nullable(),
  weightGrams: z.number().int().nullable(),
  registrationNo: z.string().nullable(),
  grandChampion: z.boolean(),
  breeder: z.string().nullable(),
  isStub: z.boolean(),
  sire: PedigreeTreeNode.nullable().optional(),
  dam: PedigreeTreeNode.nullable().optional(),
}));

export const PedigreeQuery = z.object({
  /** Generations of ancestors: 1 = parents, 4 = up to great-great-grandparents. */
  generations: z.coerce.number().int().min(1).max(6).default(4),
});

export const PedigreePdfQuery = z.object({ paper: z.enum(['letter', 'a4']).default('letter') });

export const PedigreeResponse = z.object({ generations: z.number().int(), tree: PedigreeTreeNode });
