import { GrowthQuery, PlacementQuery } from '@shared/contracts/analytics';
import { queryParamsOf, queryViewFrom } from './query-view';

describe('panel views from the address', () => {
  it('reads each key with the API’s schema and keeps its defaults', () => {
    expect(queryViewFrom(PlacementQuery, { parent: 'dam', k: '5', minEntries: '4', breed: '2' }))
      .toEqual({ parent: 'dam', k: 5, minEntries: 4, breed: 2 });
    expect(queryViewFrom(PlacementQuery, {})).toEqual({ parent: 'sire', k: 3, minEntries: 1 });
  });

  it('drops a refused value alone: a hand-edited k of 40 leaves the other filters', () => {
    expect(queryViewFrom(PlacementQuery, { k: '40', sex: 'doe', from: '2026-02-30' })).toEqual({ parent: 'sire', k: 3, minEntries: 1, sex: 'doe' });
  });

  it('writes lists with commas and leaves defaults out, round trip', () => {
    const view = queryViewFrom(GrowthQuery, { animals: '12,5,12', sex: 'buck' });
    expect(view.animals).toEqual([12, 5]);
    expect(queryParamsOf(GrowthQuery, view)).toEqual({ animals: '12,5', sex: 'buck' });
    expect(queryParamsOf(GrowthQuery, { ...view, scope: 'rabbitry', animals: [] })).toEqual({ sex: 'buck', scope: 'rabbitry' });
  });
});
