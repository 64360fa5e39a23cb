import type { UnitSetting } from '../shared/units/weight';
import type { DateOrder } from '../shared/imports/parse-date';

/**
 * The invented demo world: one regional club, four member rabbitries, demo accounts, the 2026
 * show season and the simulation's parameters. Every name here is made up for the demo.
 */
export const DEMO_SEED = 20261201;
export const TODAY = '2026-12-01';
/** Nothing in the demo happens after this day. */
export const LAST_DAY = '2026-11-30';
export const DEMO_PASSWORD = 'keeperline-demo';

export const CLUB = {
  slug: 'quillmere-valley',
  name: 'Quillmere Valley Rabbit Breeders’ Association',
  region: 'Quillmere Valley',
  seasonStart: '2026-01-01',
  seasonEnd: '2026-11-30',
  importSettings: { dateOrder: 'iso' as DateOrder, unitSetting: 'lb-oz' as UnitSetting },
};

export type WeightStyle = 'lb-oz' | 'lb-oz-shorthand' | 'kg' | 'grams';

export interface RabbitryPlan {
  slug: string;
  name: string;
  location: string;
  ownerEmail: string;
  earPrefix: string;
  /** How this herd writes weights and dates in its files (all accepted by the importer). */
  weightStyle: WeightStyle;
  importSettings: { dateOrder: DateOrder; unitSetting: UnitSetting };
  /** Breeding stock kept per breed; founders bought from two outside breeders per breed. */
  units: { breed: string; does: number; bucks: number; lines: [string, string]; founderBreeders: [string, string] }[];
}

export const RABBITRIES: RabbitryPlan[] = [
  {
    slug: 'brackenfold',
    name: 'Brackenfold Rabbitry',
    location: 'Ostwick',
    ownerEmail: 'owner@example.test',
    earPrefix: 'BF',
    weightStyle: 'lb-oz',
    importSettings: { dateOrder: 'iso', unitSetting: 'lb-oz' },
    units: [{ breed: 'mini-rex', does: 6, bucks: 2, lines: ['Ember', 'Slate'], founderBreeders: ['Wraybeck Hutches', 'Cullerton Rabbits'] }],
  },
  {
    slug: 'tinderbrook',
    name: 'Tinderbrook Hollow',
    location: 'Harlen Cross',
    ownerEmail: 'tinderbrook@example.test',
    earPrefix: 'TH',
    weightStyle: 'lb-oz-shorthand',
    importSettings: { dateOrder: 'mdy', unitSetting: 'lb-oz' },
    units: [
      { breed: 'holland-lop', does: 4, bucks: 2, lines: ['Bramble', 'Wicket'], founderBreeders: ['Amberlow Rabbits', 'Sedgecombe Lops'] },
      { breed: 'mini-rex', does: 3, bucks: 1, lines: ['Velvet', 'Ember'], founderBreeders: ['Ferrowby Rex', 'Wraybeck Hutches'] },
    ],
  },
  {
    slug: 'marrowind',
    name: 'Marrowind Farm',
    location: 'Ebbersley',
    ownerEmail: 'marrowind@example.test',
    earPrefix: 'MW',
    weightStyle: 'kg',
    importSettings: { dateOrder: 'iso', unitSetting: 'kg' },
    units: [{ breed: 'californian', does: 4, bucks: 2, lines: ['Harrow', 'Quill'], founderBreeders: ['Dunlessy Stock', 'Orrin Vale Rabbitry'] }],
  },
  {
    slug: 'silverhatch',
    name: 'Silverhatch Rabbitry',
    location: 'Pellam Ford',
    ownerEmail: 'silverhatch@example.test',
    earPrefix: 'SH',
    weightStyle: 'grams',
    importSettings: { dateOrder: 'iso', unitSetting: 'kg' },
    units: [{ breed: 'mini-lop', does: 5, bucks: 2, lines: ['Thorn', 'Meadowsweet'], founderBreeders: ['Kestlewick Lops', 'Brindlecombe Rabbits'] }],
  },
];

export interface AccountPlan {
  email: string;
  displayName: string;
  /** The role this account demonstrates; null for the other rabbitries' owners. */
  demoRole: 'admin' | 'owner' | 'partner' | 'mentor' | 'officer' | 'member' | null;
  siteAdmin: boolean;
  rabbitries: { slug: string; role: 'owner' | 'partner' | 'mentor' }[];
  clubs: { slug: string; role: 'officer' | 'member'; exhibitorName: string | null }[];
  unitSetting: UnitSetting;
}

export const ACCOUNTS: AccountPlan[] = [
  { email: 'admin@example.test', displayName: 'Orla Fenwright', demoRole: 'admin', siteAdmin: true, rabbitries: [], clubs: [], unitSetting: 'lb-oz' },
  {
    email: 'owner@example.test', displayName: 'Tamsin Brackley', demoRole: 'owner', siteAdmin: false,
    rabbitries: [{ slug: 'brackenfold', role: 'owner' }], clubs: [{ slug: CLUB.slug, role: 'member', exhibitorName: 'Brackenfold Rabbitry' }], unitSetting: 'lb-oz',
  },
  { email: 'partner@example.test', displayName: 'Idris Colembry', demoRole: 'partner', siteAdmin: false, rabbitries: [{ slug: 'brackenfold', role: 'partner' }], clubs: [], unitSetting: 'lb-oz' },
  { email: 'mentor@example.test', displayName: 'Wendell Oakhurst', demoRole: 'mentor', siteAdmin: false, rabbitries: [{ slug: 'brackenfold', role: 'mentor' }], clubs: [], unitSetting: 'lb-oz' },
  { email: 'officer@example.test', displayName: 'Priya Lindqvar', demoRole: 'officer', siteAdmin: false, rabbitries: [], clubs: [{ slug: CLUB.slug, role: 'officer', exhibitorName: null }], unitSetting: 'lb-oz' },
  { email: 'member@example.test', displayName: 'Caspian Dunmere', demoRole: 'member', siteAdmin: false, rabbitries: [], clubs: [{ slug: CLUB.slug, role: 'member', exhibitorName: null }], unitSetting: 'kg' },
  {
    email: 'tinderbrook@example.test', displayName: 'Hollis Tindall', demoRole: null, siteAdmin: false,
    rabbitries: [{ slug: 'tinderbrook', role: 'owner' }], clubs: [{ slug: CLUB.slug, role: 'member', exhibitorName: 'Tinderbrook Hollow' }], unitSetting: 'lb-oz',
  },
  {
    email: 'marrowind@example.test', displayName: 'Marguerite Wyndle', demoRole: null, siteAdmin: false,
    rabbitries: [{ slug: 'marrowind', role: 'owner' }], clubs: [{ slug: CLUB.slug, role: 'member', exhibitorName: 'Marrowind Farm' }], unitSetting: 'kg',
  },
  {
    email: 'silverhatch@example.test', displayName: 'Soren Halvick', demoRole: null, siteAdmin: false,
    rabbitries: [{ slug: 'silverhatch', role: 'owner' }], clubs: [{ slug: CLUB.slug, role: 'member', exhibitorName: 'Silverhatch Rabbitry' }], unitSetting: 'kg',
  },
];

export interface ShowPlan {
  name: string;
  date: string;
  location: string;
  sanctionNo: string;
  judges: [string, string];
}

const JUDGES = ['R. Ambleforth', 'K. Deverill', 'N. Oskarsen', 'L. Moravec-Hale', 'T. Oyelowo', 'B. Quenby'];
const j = (a: number, b: number): [string, string] => [JUDGES[a]!, JUDGES[b]!];

export const SHOWS: ShowPlan[] = [
  { name: 'Quillmere Valley Winter Show', date: '2026-01-17', location: 'Ostwick Grange Hall', sanctionNo: 'QV26-0117', judges: j(0, 1) },
  { name: 'Harlen Cross February Open', date: '2026-02-14', location: 'Harlen Cross Fairgrounds', sanctionNo: 'QV26-0214', judges: j(2, 3) },
  { name: 'Ebbersley Spring Show', date: '2026-03-14', location: 'Ebbersley Market Barn', sanctionNo: 'QV26-0314', judges: j(4, 5) },
  { name: 'Pellam Ford Easter Classic', date: '2026-04-11', location: 'Pellam Ford Community Hall', sanctionNo: 'QV26-0411', judges: j(1, 2) },
  { name: 'Quillmere Valley Spring Specialty', date: '2026-05-09', location: 'Ostwick Grange Hall', sanctionNo: 'QV26-0509', judges: j(3, 0) },
  { name: 'Ebbersley Early Summer Show', date: '2026-06-06', location: 'Ebbersley Market Barn', sanctionNo: 'QV26-0606', judges: j(5, 2) },
  { name: 'Harlen Cross County Fair Show', date: '2026-08-22', location: 'Harlen Cross Fairgrounds', sanctionNo: 'QV26-0822', judges: j(0, 4) },
  { name: 'Pellam Ford Harvest Show', date: '2026-09-19', location: 'Pellam Ford Community Hall', sanctionNo: 'QV26-0919', judges: j(1, 5) },
  { name: 'Quillmere Valley Autumn Open', date: '2026-10-03', location: 'Ostwick Grange Hall', sanctionNo: 'QV26-1003', judges: j(2, 4) },
  { name: 'Ebbersley Leaf-Fall Show', date: '2026-10-24', location: 'Ebbersley Market Barn', sanctionNo: 'QV26-1024', judges: j(3, 1) },
  { name: 'Quillmere Valley Season Finale', date: '2026-11-14', location: 'Ostwick Grange Hall', sanctionNo: 'QV26-1114', judges: j(5, 0) },
];

/** Exhibitors from outside the club; their animals have no ear ID in the club's herds. */
export const NON_MEMBER_EXHIBITORS = [
  'Ottersley Warren', 'Quenmoor Rabbitry', 'Yarrowdene Stock', 'Hobbleton Lops', 'Drummelow Rex',
  'Tarnwhistle Rabbitry', 'Feverfew Hutch', 'Pindlecote Rabbitry', 'Larrimore Glen Rabbits', 'Wystan Fold',
];

/**
 * Simulated genetics on a standardised liability scale (phenotypic variance 1): heritability h²
 * and common-litter variance c²; the rest is individual environment. Breeding values pass
 * from parents as the parents' mean plus Mendelian sampling with variance ½σ²a (inbreeding of
 * the parents ignored, a simplification). Values chosen within published ranges for rabbits
 * (e.g. Larzul et al. 2005 for 63-day weight); the type traits are our own guesses.
 */
export const TRAIT_GENETICS = {
  weight_12w: { h2: 0.3, c2: 0.15 },
  body_type: { h2: 0.25, c2: 0.05 },
  balance: { h2: 0.15, c2: 0.05 },
  head: { h2: 0.25, c2: 0.05 },
  ears_crown: { h2: 0.3, c2: 0.05 },
  bone: { h2: 0.3, c2: 0.05 },
  fur: { h2: 0.2, c2: 0.05 },
  condition: { h2: 0.1, c2: 0.1 },
} as const;
export type SimTrait = keyof typeof TRAIT_GENETICS;
export const SIM_TRAITS = Object.keys(TRAIT_GENETICS) as SimTrait[];

/** Other simulation parameters, written into scenario.json beside the heritabilities. */
export const SIMULATION = {
  /** Phenotypic coefficient of variation of weight at a given age (12-week weight on the liability scale). */
  weightCv: 0.09,
  /** Day-to-day scatter of a weighing around the animal's curve (fraction). */
  weighingNoise: 0.02,
  /** Evaluation score = points × (0.70 + 0.10 × liability), rounded to half points, within 0..points. */
  scoreMeanFraction: 0.7,
  scoreSdFraction: 0.1,
  /** Show-day score = type merit (standardised, points-weighted sum of the type traits) + N(0, sd²). */
  showDayNoiseSd: 0.6,
  /** Growth follows a Gompertz curve W(t) = A·exp(−ln(A/W0)·e^(−k·t)), A = the breed's senior ideal weight. */
  gompertzRatePerDay: { small: 0.024, large: 0.025 },
  birthWeightFraction: { small: 0.03, large: 0.018 },
  breedingAgeDays: { small: 183, large: 213 },
  meanLitterBornAlive: { 'mini-rex': 4.6, 'holland-lop': 4.2, 'mini-lop': 5.0, californian: 7.2 } as Record<string, number>,
  preWeaningSurvival: 0.86,
  conceptionRate: 0.82,
  weeklyBreedingChance: 0.085,
  /** First and last day of breeding; the founders arrive from the first. */
  herdStart: '2021-10-04',
  lastBreeding: '2026-10-19',
  /**
   * Mean type-trait breeding value of the outside stock behind each herd's first and second line
   * (liability units): the two founding breeders' stock differ, so sires and lines really differ.
   */
  founderLineTypeMeans: [0.4, -0.4] as [number, number],
  /** Juniors shown from this age (days). */
  firstShowAgeDays: 90,
};
