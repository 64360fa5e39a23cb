import * as z from 'zod';
import { awardSchema } from '../domain/awards';
import { ageClassSchema, sexSchema } from '../domain/terms';
import { IsoDate } from './animals';

const text = (max: number) => z.string().trim().max(max).transform((s) => (s === '' ? null : s)).nullish();

export const CreateShowRequest = z.object({
  name: z.string().trim().min(2, 'Give the show a name').max(160),
  showDate: IsoDate,
  location: text(160),
  hostClub: text(160),
  judges: z.array(z.string().trim().min(1).max(120)).max(20).default([]),
  sanctionNo: text(40),
});
export const UpdateShowRequest = z.object({
  name: z.string().trim().min(2, 'Give the show a name').max(160).optional(),
  showDate: IsoDate.optional(),
  location: text(160),
  hostClub: text(160),
  judges: z.array(z.string().trim().min(1).max(120)).max(20).optional(),
  sanctionNo: text(40),
}).strict();

export const DeleteShowQuery = z.object({
  /** A show with results is deleted only when this says so; its results go with it. */
  withResults: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
});

export const Show = z.object({
  id: z.number().int(),
  name: z.string(),
  showDate: z.string(),
  location: z.string().nullable(),
  hostClub: z.string().nullable(),
  judges: z.array(z.string()),
  sanctionNo: z.string().nullable(),
  results: z.number().int(),
});
export type Show = z.infer<typeof Show>;

/** One show with what its results hold: classes judged, exhibitors, and who judged how many. */
export const ShowDetail = Show.extend({
  counts: z.object({
    /** Classes judged: breed × variety × sex × age class. */
    classes: z.number().int(),
    breeds: z.number().int(),
    exhibitors: z.number().int(),
    /** Results matched to an animal of a member's herd. */
    matched: z.number().int(),
    /** Results whose age class differs from the one the birth date gives. */
    ageClassMismatches: z.number().int(),
  }),
  /** Judges named on the results (else the show's), with the classes and results each judged. */
  judging: z.array(z.object({ judge: z.string().nullable(), classes: z.number().int(), results: z.number().int() })),
});
export type ShowDetail = z.infer<typeof ShowDetail>;

export const ShowResult = z.object({
  id: z.number().int(),
  showId: z.number().int(),
  showName: z.string(),
  showDate: z.string(),
  earId: z.string().nullable(),
  exhibitor: z.string(),
  breed: z.string(),
  variety: z.string().nullable(),
  sex: sexSchema,
  ageClass: ageClassSchema,
  entriesInClass: z.number().int(),
  exhibitorsInClass: z.number().int(),
  placing: z.number().int(),
  awards: z.array(awardSchema),
  judge: z.string().nullable(),
  /** Matched to an animal of a member's herd. */
  matched: z.boolean(),
  /** From the matched animal's birth date and its breed's class scheme; null when unknown. */
  computedAgeClass: ageClassSchema.nullable(),
  ageClassMismatch: z.boolean(),
});
export type ShowResult = z.infer<typeof ShowResult>;

export const ShowResultsQuery = z.object({ format: z.enum(['json', 'csv']).default('json') });

export const SeasonResultsQuery = z.object({
  exhibitor: z.string().trim().max(120).optional(),
  breed: z.string().trim().max(80).optional(),
  /** Defaults to the club's season when it has one. */
  from: IsoDate.optional(),
  to: IsoDate.optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(500, 'At most 500 rows per page').default(100),
  format: z.enum(['json', 'csv']).default('json'),
});

export const SeasonResultsPage = z.object({
  rows: z.array(ShowResult),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
  from: z.string().nullable(),
  to: z.string().nullable(),
});
