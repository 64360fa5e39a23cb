import * as z from 'zod';
import { LinesQuery, TraitKey } from '@shared/contracts/analytics';
import { SMALL_GROUP } from './lines-chart-options';
import { queryFromView, viewFromQuery } from './query-view';

/**
 * What the comparison shows: groups by line or by rabbitry, one measure or all ('' = all), and
 * the sample size under which a group is marked small (marked, never hidden).
 */
export interface LinesView extends Record<string, unknown> {
  groupBy: 'line' | 'rabbitry';
  measure: string;
  minN: number;
}

export const LINES_DEFAULTS: LinesView = { groupBy: LinesQuery.parse({}).groupBy, measure: '', minN: SMALL_GROUP };
export const MIN_N_CHOICES = [5, 10, 20, 30];

export function linesViewFrom(params: Record<string, string | undefined>): LinesView {
  return viewFromQuery<LinesView>({ groupBy: LinesQuery.shape.groupBy, measure: TraitKey, minN: z.coerce.number().int().min(2).max(1000) }, LINES_DEFAULTS, params);
}

export function linesParams(view: LinesView): Record<string, string> {
  return queryFromView(view, LINES_DEFAULTS);
}
