import * as z from 'zod';
import { LinesQuery, TraitKey } from '@shared/contracts/analytics';
import { queryParamsOf, queryViewFrom, type QueryParams } from '../panels/query-view';
import { SMALL_GROUP } from './lines-chart-options';

/**
 * What the comparison shows: groups by line or by rabbitry, one measure or all ('' = all), the
 * animals compared (breed, sex, born from / to) and the sample size under which a group is
 * marked small (marked, never hidden).
 */
const LinesView = z.object({
  groupBy: LinesQuery.shape.groupBy,
  measure: z.union([TraitKey, z.literal('')]).default(''),
  minN: z.coerce.number().int().min(2).max(1000).default(SMALL_GROUP),
  breed: LinesQuery.shape.breed,
  sex: LinesQuery.shape.sex,
  from: LinesQuery.shape.from,
  to: LinesQuery.shape.to,
});
export type LinesView = z.infer<typeof LinesView>;

export const MIN_N_CHOICES = [5, 10, 20, 30];

export const linesViewFrom = (params: QueryParams): LinesView => queryViewFrom(LinesView, params);
export const linesParams = (view: LinesView): Record<string, string> => queryParamsOf(LinesView, view);

/** The API's query: the grouping (always said) and the filters; the measure and minN only change how the answer is shown. */
export function linesApiParams(view: LinesView): Record<string, string> {
  const { breed, sex, from, to } = linesParams(view);
  const filters = Object.entries({ breed, sex, from, to }).filter((e): e is [string, string] => e[1] !== undefined);
  return { groupBy: view.groupBy, ...Object.fromEntries(filters) };
}
