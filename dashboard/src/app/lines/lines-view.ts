import * as z from 'zod';
import { LinesQuery, TraitKey } from '@shared/contracts/analytics';
import { queryParamsOf, queryViewFrom, type QueryParams } from '../panels/query-view';
import { SMALL_GROUP } from './lines-chart-options';

/**
 * What the comparison shows: groups by line or by rabbitry, one measure or all ('' = all), and
 * the sample size under which a group is marked small (marked, never hidden).
 */
const LinesView = z.object({
  groupBy: LinesQuery.shape.groupBy,
  measure: z.union([TraitKey, z.literal('')]).default(''),
  minN: z.coerce.number().int().min(2).max(1000).default(SMALL_GROUP),
});
export type LinesView = z.infer<typeof LinesView>;

export const MIN_N_CHOICES = [5, 10, 20, 30];

export const linesViewFrom = (params: QueryParams): LinesView => queryViewFrom(LinesView, params);
export const linesParams = (view: LinesView): Record<string, string> => queryParamsOf(LinesView, view);
