import * as z from 'zod';
import { IsoDate } from '@shared/contracts/animals';
import { queryFromView, viewFromQuery } from '../lines/query-view';

/** What the season page shows; kept in the address so a view can be shared. */
export interface SeasonView extends Record<string, unknown> {
  /** null: the club's own season dates. */
  from: string | null;
  to: string | null;
  /** Standings per exhibitor, or per exhibitor and breed. */
  standings: 'exhibitor' | 'breed';
  /** Breed the per-breed standings are narrowed to ('' = every breed). */
  breed: string;
  /** Lines drawn in the points chart, leaders first. */
  top: number;
  /** Lines of every exhibitor drawn, or of the club's members only. */
  who: 'all' | 'members';
}

export const SEASON_DEFAULTS: SeasonView = { from: null, to: null, standings: 'exhibitor', breed: '', top: 8, who: 'all' };
export const SEASON_TOPS = [5, 8, 12, 25];

const fields = {
  from: IsoDate,
  to: IsoDate,
  standings: z.enum(['exhibitor', 'breed']),
  breed: z.string().trim().max(80),
  top: z.coerce.number().int().min(1).max(25),
  who: z.enum(['all', 'members']),
};

/** The view from the address; a refused value falls back to its default. O(keys). */
export function seasonViewFrom(params: Record<string, string | undefined>): SeasonView {
  return viewFromQuery<SeasonView>(fields, SEASON_DEFAULTS, params);
}

export function seasonParams(view: SeasonView): Record<string, string> {
  return queryFromView(view, SEASON_DEFAULTS);
}
