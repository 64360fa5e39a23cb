import * as z from 'zod';
import { LinesQuery, TraitKey } from '@shared/contracts/analytics';
import type { Sex } from '@shared/domain/terms';
import { SMALL_GROUP } from './lines-chart-options';
import { queryFromView, viewFromQuery } from './query-view';

/**
 * What the comparison shows: groups by line or by rabbitry, one measure or all ('' = all), the
 * animals compared (breed, sex, born from / to) and the sample size under which a group is
 * marked small (marked, never hidden).
 */
export interface LinesView extends Record<string, unknown> {
  groupBy: 'line' | 'rabbitry';
  measure: string;
  minN: number;
  breed?: number;
  sex?: Sex;
  from?: string;
  to?: string;
}

export const LINES_DEFAULTS: LinesView = { groupBy: LinesQuery.parse({}).groupBy, measure: '', minN: SMALL_GROUP };
export const MIN_N_CHOICES = [5, 10, 20, 30];
export function linesViewFrom(params: Record<string, string | undefined>): LinesView {
  const s = LinesQuery.shape;
  return viewFromQuery<LinesView>(
    { groupBy: s.groupBy, measure: TraitKey, minN: z.coerce.number().int().min(2).max(1000), breed: s.breed, sex: s.sex, from: s.from, to: s.to },
    LINES_DEFAULTS,
    params,
  );
}

export function linesParams(view: LinesView): Record<string, string> {
  return queryFromView(view, LINES_DEFAULTS);
}

/** The API's query: the grouping (always said) and the filters; the measure and minN only change how the answer is shown. */
export function linesApiParams(view: LinesView): Record<string, string> {
  const { breed, sex, from, to } = linesParams(view);
  const filters = Object.entries({ breed, sex, from, to }).filter((e): e is [string, string] => e[1] !== undefined);
  return { groupBy: view.groupBy, ...Object.fromEntries(filters) };
}
