import * as z from 'zod';
import { AWARDS } from '../domain/awards';
import { animalStatusSchema, sexSchema } from '../domain/terms';
import { IsoDate, KeeperDecision } from './animals';

/**
 * Contracts of the analytics API (analytics-api/src/analytics): the queries each route accepts
 * and the reports it answers with. Every report carries its sample sizes, intervals or standard
 * errors, and `warnings`: sentences a breeder reads ("Only 6 sires with offspring records: …").
 * Intervals are 95 % unless said otherwise. Weights are grams; ages are days.
 */

// ---- shared pieces ------------------------------------------------------------------------

const int = z.number().int();
const id = z.coerce.number().int().positive();
/** A trait key: weight_8w, weight_12w, weight_16w, or a key of a breed's evaluation template. */
export const TraitKey = z.string().trim().regex(/^[a-z][a-z0-9_]{0,39}$/, 'A trait is weight_8w, weight_12w, weight_16w or an evaluation trait key');
export const WEIGHT_TRAITS = ['weight_8w', 'weight_12w', 'weight_16w'] as const;
/** Standard ages of the weight traits, in days (8, 12 and 16 weeks). */
export const WEIGHT_TRAIT_AGES: Record<(typeof WEIGHT_TRAITS)[number], number> = { weight_8w: 56, weight_12w: 84, weight_16w: 112 };

/** Which records an estimate pools: the route's rabbitry alone, or every rabbitry the caller may see. */
export const ScopeParam = z.enum(['rabbitry', 'all']);
export type ScopeParam = z.infer<typeof ScopeParam>;

export const AnalyticsScope = z.object({
  kind: z.enum(['rabbitry', 'pooled']),
  rabbitries: z.array(z.object({ id: int, name: z.string() })),
  /** In words, e.g. "Pooled over the 4 rabbitries you may see: …". */
  description: z.string(),
});
export type AnalyticsScope = z.infer<typeof AnalyticsScope>;

export const AnimalRef = z.object({
  id: int,
  rabbitryId: int,
  earId: z.string(),
  name: z.string().nullable(),
  sex: sexSchema,
  breedId: int.nullable(),
  breed: z.string().nullable(),
  variety: z.string().nullable(),
  line: z.string().nullable(),
  birthDate: z.string().nullable(),
  status: animalStatusSchema,
  /** An outside parent: only its pedigree facts are recorded. */
  isStub: z.boolean(),
});
export type AnimalRef = z.infer<typeof AnimalRef>;

/** A share with its Wilson 95 % interval. */
export const Proportion = z.object({ count: int, n: int, share: z.number(), lower: z.number(), upper: z.number() });
export type Proportion = z.infer<typeof Proportion>;

/** A mean with its standard error (null with fewer than 2 values). */
export const MeanWithSe = z.object({ mean: z.number(), se: z.number().nullable(), n: int });
export type MeanWithSe = z.infer<typeof MeanWithSe>;

export const DistributionSummary = z.object({
  n: int, min: z.number(), q1: z.number(), median: z.number(), q3: z.number(), max: z.number(), mean: z.number(),
});
export type DistributionSummary = z.infer<typeof DistributionSummary>;

const reportBase = {
  scope: AnalyticsScope,
  /** The day ages are counted to. */
  asOf: z.string(),
  warnings: z.array(z.string()),
};

/** The usual cautions, shown wherever the product advises on breeding or handling. */
const cautions = z.array(z.string());

// ---- 1. placement of a parent's offspring ------------------------------------------------

export const PLACEMENT_PARENTS = ['sire', 'dam', 'grandsire'] as const;
export const PlacementQuery = z.object({
  /** grandsire: both grandsires (the sire's sire and the dam's sire) each get the animal's results. */
  parent: z.enum(PLACEMENT_PARENTS).default('sire'),
  k: z.coerce.number().int().min(1).max(10).default(3),
  /** Filters on the offspring: breed id, variety, sex; show dates from/to. */
  breed: id.optional(),
  variety: z.string().trim().min(1).max(80).optional(),
  sex: sexSchema.optional(),
  from: IsoDate.optional(),
  to: IsoDate.optional(),
  /** Parents with fewer offspring results than this are left out of the list (not of the herd figures). */
  minEntries: z.coerce.number().int().min(1).max(1000).default(1),
});
export type PlacementQuery = z.infer<typeof PlacementQuery>;

export const PlacementIndexValue = z.object({
  /**
   * observed / expected top-k placings over the results in classes of more than k entries
   * (smaller classes place everyone): 1 = as chance, 2 = twice as often; held at the largest
   * value chance allows (1/max k/n), as is the interval.
   */
  index: z.number(), lower: z.number(), upper: z.number(), observed: int, expected: z.number(),
});

export const ParentPlacement = z.object({
  parent: AnimalRef,
  /** 1 = best shrunken top-k share ("1224" ties). */
  rank: int,
  /** Offspring results counted. */
  entries: int,
  offspringShown: int,
  topK: Proportion,
  /** Class-size-adjusted (n − p)/(n − 1): 1 = won, 0 = last; classes of one are left out. */
  meanPlacementScore: MeanWithSe.nullable(),
  placementIndex: PlacementIndexValue.nullable(),
  /** Legs toward grand champion earned by the offspring in the period, and offspring that are grand champions. */
  legs: int,
  grandChampions: int,
  /** Top-k share shrunk toward the herd's rate (beta-binomial), and the weight of the herd's rate in it. */
  shrunkenShare: z.number(),
  shrinkage: z.number(),
  warnings: z.array(z.string()),
});
export type ParentPlacement = z.infer<typeof ParentPlacement>;

export const PlacementReport = z.object({
  ...reportBase,
  parentKind: z.enum(PLACEMENT_PARENTS),
  k: int,
  totals: z.object({ results: int, offspringShown: int, parents: int, parentsListed: int }),
  /** All counted results together: the rate every parent is shrunk toward. */
  herd: z.object({ topK: Proportion.nullable(), meanPlacementScore: MeanWithSe.nullable() }),
  prior: z.object({ mean: z.number(), rho: z.number(), alpha: z.number().nullable(), beta: z.number().nullable() }).nullable(),
  parents: z.array(ParentPlacement),
});
export type PlacementReport = z.infer<typeof PlacementReport>;

// ---- 2. heritability -----------------------------------------------------------------------

export const HeritabilityQuery = z.object({ trait: TraitKey.default('weight_12w'), scope: ScopeParam.default('rabbitry') });
export type HeritabilityQuery = z.infer<typeof HeritabilityQuery>;

export const TraitInfo = z.object({
  key: z.string(),
  label: z.string(),
  kind: z.enum(['weight', 'evaluation', 'placement']),
  /** Unit of the raw records. */
  unit: z.enum(['grams', 'points', 'score']),
  /** Weight traits: the standard age and the tolerance of the interpolation. */
  standardAgeDays: int.nullable(),
  toleranceDays: int.nullable(),
});
export type TraitInfo = z.infer<typeof TraitInfo>;

export const HERITABILITY_METHODS = ['sire-offspring', 'dam-offspring', 'midparent-offspring', 'paternal-half-sib'] as const;
export const HeritabilityEstimate = z.object({
  method: z.enum(HERITABILITY_METHODS),
  h2: z.number(),
  se: z.number(),
  /** h² ± 1.96 SE (not clipped to 0–1, so a wild estimate shows as one). */
  lower: z.number(),
  upper: z.number(),
  /** Points of the regression (families), or offspring of the ANOVA. */
  n: int,
  /** Regressions: slope of offspring family mean on the parent value. */
  slope: z.number().nullable(),
  slopeSe: z.number().nullable(),
  /** Half-sib ANOVA details. */
  anova: z.object({ sires: int, offspring: int, k0: z.number(), msBetween: z.number(), msWithin: z.number(), f: z.number(), t: z.number() }).nullable(),
  warnings: z.array(z.string()),
});
export type HeritabilityEstimate = z.infer<typeof HeritabilityEstimate>;

/** One offspring: its value (y) against its midparent's (x), with the animal's ear ID and rabbitry. */
export const ScatterPoint = z.object({ x: z.number(), y: z.number(), animalId: int, earId: z.string(), rabbitryId: int });

export const HeritabilityReport = z.object({
  ...reportBase,
  trait: TraitInfo,
  /** How records were made comparable, in words. */
  adjustment: z.string(),
  counts: z.object({
    animalsWithRecord: int, sires: int, dams: int,
    sireFamilies: int, damFamilies: int, midparentFamilies: int, halfSibSires: int, halfSibOffspring: int,
  }),
  estimates: z.object({
    sireOffspring: HeritabilityEstimate.nullable(),
    damOffspring: HeritabilityEstimate.nullable(),
    midparentOffspring: HeritabilityEstimate.nullable(),
    halfSib: HeritabilityEstimate.nullable(),
  }),
  /** The estimate with the smallest standard error, which the reading and the breeding values use. */
  preferred: z.object({ method: z.enum(HERITABILITY_METHODS), reason: z.string() }).nullable(),
  plausibleRange: z.object({ lower: z.number(), upper: z.number(), source: z.string() }).nullable(),
  plausibleRangeNote: z.string(),
  /** Plain words, e.g. "Moderately heritable: selecting on it works, slowly". */
  reading: z.string(),
  /** Offspring (y) against midparent (x), in standardised units, with the midparent regression line. */
  scatter: z.object({
    xLabel: z.string(), yLabel: z.string(),
    points: z.array(ScatterPoint), total: int,
    line: z.object({ slope: z.number(), intercept: z.number() }).nullable(),
  }),
});
export type HeritabilityReport = z.infer<typeof HeritabilityReport>;

// ---- 3. growth -----------------------------------------------------------------------------

const idList = z.string().trim().regex(/^\d{1,10}(,\d{1,10}){0,49}$/, 'Give up to 50 animal ids separated by commas')
  .transform((s) => [...new Set(s.split(',').map(Number))]);

export const GrowthQuery = z.object({
  breed: id.optional(),
  sex: sexSchema.optional(),
  animals: idList.optional(),
  litter: id.optional(),
  /** The reference pools every rabbitry the caller may see unless `rabbitry` is asked for. */
  scope: ScopeParam.default('all'),
});
export type GrowthQuery = z.infer<typeof GrowthQuery>;

export const GROWTH_CENTILE_KEYS = ['p3', 'p10', 'p25', 'p50', 'p75', 'p90', 'p97'] as const;
export const Centiles = z.object({ p3: z.number(), p10: z.number(), p25: z.number(), p50: z.number(), p75: z.number(), p90: z.number(), p97: z.number() });
export type Centiles = z.infer<typeof Centiles>;

export const WeightLimitsValue = z.object({ minGrams: int.nullable(), idealGrams: int.nullable(), maxGrams: int.nullable() });

export const GrowthReferenceReport = z.object({
  breed: z.object({ id: int, name: z.string() }),
  sex: sexSchema,
  weighings: int,
  animals: int,
  /** The reference's last age (end of its last band), in days: weekly bands to 26 weeks, wider ones beyond as far as the weighings fill them. */
  reachesDays: int,
  /** Where the weighings became too few for another band (null when they fill every band to two years), and how many lay beyond. */
  thinsOutFromDays: int.nullable(),
  weighingsBeyond: int,
  bands: z.array(z.object({
    fromDays: int, toDays: int, midDays: z.number(), n: int,
    /** lms: fitted and smoothed; empirical: too few weights, sample centiles; null: no weights */
    method: z.enum(['lms', 'empirical']).nullable(),
    lms: z.object({ L: z.number(), M: z.number(), S: z.number() }).nullable(),
    centiles: Centiles.nullable(),
  })),
  seniorLimits: WeightLimitsValue.nullable(),
  warnings: z.array(z.string()),
});
export type GrowthReferenceReport = z.infer<typeof GrowthReferenceReport>;

export const WEIGHT_STATUSES = ['no-limits', 'under-minimum', 'on-ideal', 'within-limits', 'over-maximum'] as const;
export const WeightCheckValue = z.object({
  status: z.enum(WEIGHT_STATUSES),
  disqualificationRisk: z.boolean(),
  gramsFromIdeal: z.number().nullable(),
});

export const SeniorProjection = z.object({
  ageDays: int,
  grams: z.number(),
  lower: z.number().nullable(),
  upper: z.number().nullable(),
  percentile: z.number(),
  z: z.number(),
  weighingsUsed: int,
  /** The projection against the breed's senior limits (ideal within 2 oz = on ideal). */
  check: WeightCheckValue.nullable(),
  /** The interval's upper end over the maximum: a risk worth watching. */
  upperOverMaximum: z.boolean(),
});
export type SeniorProjection = z.infer<typeof SeniorProjection>;

export const GrowthAnimal = z.object({
  animal: AnimalRef,
  weighings: z.array(z.object({
    weighedOn: z.string(), ageDays: int, grams: int, z: z.number().nullable(), percentile: z.number().nullable(),
  })),
  latestPercentile: z.number().nullable(),
  projection: SeniorProjection.nullable(),
  idealGrams: int.nullable(),
  maxGrams: int.nullable(),
  /** In words: "Projected 4 lb 2 oz … over the maximum: disqualification risk". Grams are formatted by the screen. */
  classification: z.string(),
  warnings: z.array(z.string()),
});
export type GrowthAnimal = z.infer<typeof GrowthAnimal>;

export const GrowthReport = z.object({
  ...reportBase,
  centiles: z.array(int),
  /**
   * Age the senior weight is projected at (12 months) where the reference reaches it; each
   * projection gives its own age (the reference's oldest, when it stops earlier).
   */
  seniorAgeDays: int,
  references: z.array(GrowthReferenceReport),
  animals: z.array(GrowthAnimal),
});
export type GrowthReport = z.infer<typeof GrowthReport>;

// ---- 4. inbreeding, relationship, pairings -------------------------------------------------

export const CommonAncestor = z.object({
  animal: AnimalRef.nullable(),
  /** Part of the expected inbreeding passing through this ancestor, and its share of the total. */
  contribution: z.number(),
  share: z.number(),
});
export type CommonAncestor = z.infer<typeof CommonAncestor>;

export const InbreedingReport = z.object({
  ...reportBase,
  cautions,
  pedigree: z.object({ animals: int, withBothParents: int, founders: int, herdAnimals: int }),
  summary: DistributionSummary.nullable(),
  inbred: int,
  bands: z.array(z.object({ label: z.string(), from: z.number(), to: z.number().nullable(), count: int })),
  animals: z.array(z.object({ animal: AnimalRef, f: z.number(), sireId: int.nullable(), damId: int.nullable() })),
  topInbred: z.array(z.object({ animal: AnimalRef, f: z.number(), explanation: z.string(), commonAncestors: z.array(CommonAncestor) })),
});
export type InbreedingReport = z.infer<typeof InbreedingReport>;

export const RelationshipQuery = z.object({ a: id, b: id });
export type RelationshipQuery = z.infer<typeof RelationshipQuery>;

export const RelationshipReport = z.object({
  ...reportBase,
  cautions,
  a: z.object({ animal: AnimalRef, f: z.number() }),
  b: z.object({ animal: AnimalRef, f: z.number() }),
  /** Additive relationship a_ab (twice the coancestry), and r = a_ab/√((1+F_a)(1+F_b)). */
  additiveRelationship: z.number(),
  coefficientOfRelationship: z.number(),
  /** a_ab / 2: the inbreeding of their offspring. */
  expectedOffspringInbreeding: z.number(),
  oppositeSexes: z.boolean(),
  commonAncestors: z.array(CommonAncestor),
  otherAncestorsContribution: z.number(),
  explanation: z.string(),
});
export type RelationshipReport = z.infer<typeof RelationshipReport>;

export const PairingsQuery = z.object({
  animal: id,
  limit: z.coerce.number().int().min(1).max(100).default(20),
  trait: TraitKey.default('weight_12w'),
});
export type PairingsQuery = z.infer<typeof PairingsQuery>;

export const INBREEDING_LEVELS = ['none', 'low', 'moderate', 'high'] as const;
export const PairingsReport = z.object({
  ...reportBase,
  cautions,
  /** accuracy: r = √(1 − PEV/((1 + F)σ²a)) of the breeding value (null when not computed: large herds, confounded effects). */
  animal: z.object({ animal: AnimalRef, ebv: z.number().nullable(), accuracy: z.number().nullable() }),
  trait: TraitInfo,
  /** Minimum age for breeding used, by breed size (common practice). */
  breedingAgeDays: int,
  candidatesConsidered: int,
  candidates: z.array(z.object({
    rank: int,
    mate: AnimalRef,
    ageDays: int.nullable(),
    expectedInbreeding: z.number(),
    /** none 0; low < 1/16; moderate < 1/8; high from 1/8 (as close as half sibs) */
    inbreedingLevel: z.enum(INBREEDING_LEVELS),
    mateEbv: z.number().nullable(),
    /** r of the mate's breeding value, as `animal.accuracy`. */
    mateAccuracy: z.number().nullable(),
    /** Mean of the two parents' breeding values, in the trait's standard deviations. */
    expectedOffspringEbv: z.number().nullable(),
    commonAncestors: z.array(CommonAncestor),
    notes: z.array(z.string()),
  })),
  /** Expected offspring inbreeding of each doe × buck of breeding age (rows: does, columns: bucks). */
  matrix: z.object({
    does: z.array(AnimalRef), bucks: z.array(AnimalRef), values: z.array(z.array(z.number())),
    totalDoes: int, totalBucks: int, truncated: z.boolean(),
  }),
});
export type PairingsReport = z.infer<typeof PairingsReport>;

// ---- 5. breeding values --------------------------------------------------------------------

export const BreedingValuesQuery = z.object({
  trait: TraitKey.default('weight_12w'),
  h2: z.coerce.number().gt(0, 'h² lies between 0 and 1').lt(1, 'h² lies between 0 and 1').optional(),
  scope: ScopeParam.default('rabbitry'),
});
export type BreedingValuesQuery = z.infer<typeof BreedingValuesQuery>;

export const HeritabilityUsed = z.object({
  value: z.number(),
  source: z.enum(['user', 'half-sib', 'default']),
  se: z.number().nullable(),
  note: z.string(),
});

export const BreedingValuesReport = z.object({
  ...reportBase,
  trait: TraitInfo,
  h2: HeritabilityUsed,
  model: z.object({
    fixedEffects: z.array(z.string()),
    records: int, animalsInPedigree: int, contemporaryGroups: int,
  }),
  convergence: z.object({ iterations: int, relativeResidual: z.number(), converged: z.boolean() }),
  accuracyAvailable: z.boolean(),
  /**
   * Breeding values are in the trait's standard deviations within breed and sex, `ebvUnits` in grams or
   * points; for placement_score both are in placement-score units (0 = last, 1 = won).
   */
  animals: z.array(z.object({
    animal: AnimalRef,
    rank: int,
    ebv: z.number(),
    ebvUnits: z.number().nullable(),
    accuracy: z.number().nullable(),
    /** The animal's own record (raw units), if it has one. */
    record: z.number().nullable(),
  })),
});
export type BreedingValuesReport = z.infer<typeof BreedingValuesReport>;

// ---- 6. keepers ----------------------------------------------------------------------------

export const KEEPER_COMPONENTS = ['breedingValue', 'ownEvaluation', 'weightOnTarget', 'parentsPlacementIndex', 'inbreeding'] as const;
export type KeeperComponent = (typeof KEEPER_COMPONENTS)[number];
export const KEEPER_COMPONENT_LABELS: Record<KeeperComponent, string> = {
  breedingValue: 'Breeding value',
  ownEvaluation: 'Own evaluation',
  weightOnTarget: 'Weight on target',
  parentsPlacementIndex: "Parents' placement index",
  inbreeding: 'Inbreeding',
};

/** "breedingValue:1,ownEvaluation:2,…": each component's weight (0 leaves it out); unnamed ones weigh 1. */
const keeperWeights = z.string().trim().max(300)
  .regex(/^([A-Za-z]+:-?\d+(\.\d+)?)(,[A-Za-z]+:-?\d+(\.\d+)?)*$/, 'Write weights as component:number, separated by commas')
  .transform((s, ctx) => {
    const out: Record<string, number> = {};
    for (const part of s.split(',')) {
      const [key, value] = part.split(':');
      if (!(KEEPER_COMPONENTS as readonly string[]).includes(key!)) {
        ctx.addIssue({ code: 'custom', message: `Unknown component ${key}; use ${KEEPER_COMPONENTS.join(', ')}` });
        return z.NEVER;
      }
      out[key!] = Number(value);
    }
    return out as Partial<Record<KeeperComponent, number>>;
  });

export const KeepersQuery = z.object({
  weights: keeperWeights.optional(),
  /** The trait of the breeding-value component. */
  trait: TraitKey.default('weight_12w'),
});
export type KeepersQuery = z.infer<typeof KeepersQuery>;

export const KeeperContribution = z.object({
  component: z.enum(KEEPER_COMPONENTS),
  label: z.string(),
  /** Raw value: EBV (SD), evaluation (% of points), weight on target (−% from ideal), index, F. */
  value: z.number().nullable(),
  z: z.number(),
  weight: z.number(),
  contribution: z.number(),
});

export const WeightFlag = z.object({
  kind: z.enum(['current', 'projected', 'projected-upper']),
  status: z.enum(WEIGHT_STATUSES),
  disqualificationRisk: z.boolean(),
  message: z.string(),
});

export const KeepersReport = z.object({
  ...reportBase,
  cautions,
  weights: z.record(z.enum(KEEPER_COMPONENTS), z.number()),
  trait: TraitInfo,
  juniors: int,
  candidates: z.array(z.object({
    animal: AnimalRef,
    ageDays: int,
    rank: int,
    total: z.number(),
    components: z.array(KeeperContribution),
    latestWeight: z.object({ weighedOn: z.string(), grams: int }).nullable(),
    projectedSeniorWeight: SeniorProjection.nullable(),
    weightFlags: z.array(WeightFlag),
    disqualificationRisk: z.boolean(),
    keeperDecision: KeeperDecision.nullable(),
    explanation: z.array(z.string()),
  })),
});
export type KeepersReport = z.infer<typeof KeepersReport>;

// ---- 7. season -----------------------------------------------------------------------------

const points = z.number().min(0, 'Points are 0 or more').max(100_000);
/** A club's points formula (stored in club.points_formula). Bonuses are added per award. */
export const PointsFormula = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('multiplied'), base: z.array(points).min(1).max(20), bonuses: z.partialRecord(z.enum(AWARDS), points).optional() }),
  z.object({ kind: z.literal('flat'), table: z.array(points).min(1).max(20), bonuses: z.partialRecord(z.enum(AWARDS), points).optional() }),
]);
export type PointsFormula = z.infer<typeof PointsFormula>;
/** The common show-rule base: placings 1–5 earn 6/4/3/2/1 × animals in the class. */
export const DEFAULT_POINTS_FORMULA: PointsFormula = { kind: 'multiplied', base: [6, 4, 3, 2, 1] };

export const SeasonQuery = z.object({ from: IsoDate.optional(), to: IsoDate.optional() });
export type SeasonQuery = z.infer<typeof SeasonQuery>;

export const SeasonSettingsRequest = z.object({
  seasonStart: IsoDate,
  seasonEnd: IsoDate,
  pointsFormula: PointsFormula.nullable().default(null),
}).refine((s) => s.seasonStart <= s.seasonEnd, { message: 'The season ends on or after its start', path: ['seasonEnd'] });
export type SeasonSettingsRequest = z.infer<typeof SeasonSettingsRequest>;

export const SeasonSettings = z.object({
  clubId: int,
  seasonStart: z.string().nullable(),
  seasonEnd: z.string().nullable(),
  /** null: the default formula applies. */
  pointsFormula: PointsFormula.nullable(),
});
export type SeasonSettings = z.infer<typeof SeasonSettings>;

export const Standing = z.object({
  exhibitor: z.string(),
  breed: z.string().nullable(),
  points: z.number(),
  results: int,
  firsts: int,
  awards: int,
  rank: int,
  isMember: z.boolean(),
});
export type Standing = z.infer<typeof Standing>;

export const SeasonReport = z.object({
  club: z.object({ id: int, name: z.string() }),
  from: z.string().nullable(),
  to: z.string().nullable(),
  warnings: z.array(z.string()),
  formula: PointsFormula,
  formulaIsDefault: z.boolean(),
  totals: z.object({ shows: int, results: int, exhibitors: int, memberResults: int, matchedResults: int }),
  standings: z.object({ byExhibitor: z.array(Standing), byExhibitorBreed: z.array(Standing) }),
  /** Points after each show date, for lines (the leading exhibitors and every member). */
  cumulative: z.object({
    dates: z.array(z.string()),
    series: z.array(z.object({ exhibitor: z.string(), isMember: z.boolean(), points: z.array(z.number()) })),
    totalExhibitors: int,
  }),
  entries: z.object({
    shows: z.array(z.object({ id: int, name: z.string(), date: z.string() })),
    breeds: z.array(z.string()),
    /** counts[show][breed] */
    counts: z.array(z.array(int)),
    byBreed: z.array(z.object({ breed: z.string(), entries: int })),
  }),
  legs: z.array(z.object({ exhibitor: z.string(), isMember: z.boolean(), legs: int, animalsWithLegs: int, grandChampionsCompleted: int })),
  topSires: z.array(z.object({
    sire: z.object({ id: int, earId: z.string(), name: z.string().nullable() }),
    exhibitor: z.string().nullable(),
    rank: int,
    entries: int,
    offspringShown: int,
    topK: Proportion,
    meanPlacementScore: MeanWithSe.nullable(),
    placementIndex: PlacementIndexValue.nullable(),
    legs: int,
    shrunkenShare: z.number(),
  })),
});
export type SeasonReport = z.infer<typeof SeasonReport>;

// ---- 8. line comparison --------------------------------------------------------------------

export const LINE_MEASURES = ['weight_12w_percentile', 'placement_score', 'litter_weaned', 'inbreeding'] as const;
export const LinesQuery = z.object({
  groupBy: z.enum(['line', 'rabbitry']).default('line'),
  /** One of LINE_MEASURES or an evaluation trait key; all when omitted. */
  measure: TraitKey.optional(),
  /** Animals compared: of a breed (id), of a sex, born from / to (a cohort); their records count whatever their date. */
  breed: id.optional(),
  sex: sexSchema.optional(),
  from: IsoDate.optional(),
  to: IsoDate.optional(),
}).refine((q) => !q.from || !q.to || q.from <= q.to, { message: 'The range ends on or after its start', path: ['to'] });
export type LinesQuery = z.infer<typeof LinesQuery>;

export const LinesReport = z.object({
  ...reportBase,
  cautions,
  /** The filters in force, in words (e.g. "Mini Rex does born 2025-01-01 to 2025-12-31"), or null. */
  filtered: z.string().nullable(),
  groupBy: z.enum(['line', 'rabbitry']),
  groups: z.array(z.object({ key: z.string(), label: z.string(), animals: int })),
  measures: z.array(z.object({
    key: z.string(),
    label: z.string(),
    unit: z.string(),
    groups: z.array(z.object({
      key: z.string(),
      summary: DistributionSummary.nullable(),
      /**
       * Distribution-free 95 % interval for the median: order statistics of ranks r and n − r + 1
       * (binomial, Conover 1999 §3.2), with its exact coverage; null below 6 values.
       */
      medianInterval: z.object({ lower: z.number(), upper: z.number(), lowerRank: int, upperRank: int, coverage: z.number(), n: int }).nullable(),
    })),
  })),
});
export type LinesReport = z.infer<typeof LinesReport>;
