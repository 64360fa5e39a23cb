import * as z from 'zod';
import { IsoDate } from '@shared/contracts/animals';
import { queryParamsOf, queryViewFrom, type QueryParams } from '../panels/query-view';

/** What the season page shows; kept in the address so a view can be shared. */
const SeasonView = z.object({
  /** null: the club's own season dates. */
  from: IsoDate.nullable().default(null),
  to: IsoDate.nullable().default(null),
  /** Standings per exhibitor, or per exhibitor and breed. */
  standings: z.enum(['exhibitor', 'breed']).default('exhibitor'),
  /** Breed the per-breed standings are narrowed to ('' = every breed). */
  breed: z.string().trim().max(80).default(''),
  /** Lines drawn in the points chart, leaders first. */
  top: z.coerce.number().int().min(1).max(25).default(8),
  /** Lines of every exhibitor drawn, or of the club's members only. */
  who: z.enum(['all', 'members']).default('all'),
});
export type SeasonView = z.infer<typeof SeasonView>;

export const SEASON_TOPS = [5, 8, 12, 25];

/** The view from the address; a refused value falls back to its default. O(keys). */
export const seasonViewFrom = (params: QueryParams): SeasonView => queryViewFrom(SeasonView, params);
export const seasonParams = (view: SeasonView): Record<string, string> => queryParamsOf(SeasonView, view);
