import * as z from 'zod';
import { GrowthQuery, PlacementQuery } from '@shared/contracts/analytics';
import { queryParamsOf, queryViewFrom } from './query-view';

/** A panel's own view schema: every key has a default. */
const View = z.object({
  groupBy: z.enum(['line', 'rabbitry']).default('line'),
  top: z.coerce.number().int().min(1).max(25).default(8),
  from: z.string().regex(/^\d{4}-\d{2}-\d{2}$/).nullable().default(null),
});

describe('panel views from the address', () => {
  it('reads each key with the API’s schema and keeps its defaults', () => {
    expect(queryViewFrom(PlacementQuery, { parent: 'dam', k: '5', minEntries: '4', breed: '2' }))
      .toEqual({ parent: 'dam', k: 5, minEntries: 4, breed: 2 });
    expect(queryViewFrom(PlacementQuery, {})).toEqual({ parent: 'sire', k: 3, minEntries: 1 });
  });

  it('drops a refused value alone: a hand-edited k of 40 leaves the other filters', () => {
    expect(queryViewFrom(PlacementQuery, { k: '40', sex: 'doe', from: '2026-02-30' })).toEqual({ parent: 'sire', k: 3, minEntries: 1, sex: 'doe' });
    expect(queryViewFrom(View, { groupBy: 'colour', top: '99', from: '2026-01-01' })).toEqual({ groupBy: 'line', top: 8, from: '2026-01-01' });
  });

  it('takes the first of repeated parameters and ignores empty ones', () => {
    expect(queryViewFrom(View, { top: ['3', '4'], from: '' })).toEqual({ groupBy: 'line', top: 3, from: null });
  });

  it('writes lists with commas and leaves defaults and empty values out, round trip', () => {
    const view = queryViewFrom(GrowthQuery, { animals: '12,5,12', sex: 'buck' });
    expect(view.animals).toEqual([12, 5]);
    expect(queryParamsOf(GrowthQuery, view)).toEqual({ animals: '12,5', sex: 'buck' });
    expect(queryParamsOf(GrowthQuery, { ...view, scope: 'rabbitry', animals: [] })).toEqual({ sex: 'buck', scope: 'rabbitry' });
    expect(queryParamsOf(View, { groupBy: 'line', top: 5, from: null })).toEqual({ top: '5' });
  });
});
