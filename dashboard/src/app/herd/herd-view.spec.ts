import { activeFilters, herdApiParams, herdCsvUrl, herdParams, herdViewFrom, HERD_DEFAULTS, withFilter } from './herd-view';

describe('herd view', () => {
  it('reads the address with the API’s schema and drops what it would refuse', () => {
    const view = herdViewFrom({ page: '3', sort: 'latestWeight', dir: 'desc', sex: 'doe', breedId: '2', pageSize: '999', ageClass: 'elder' });
    expect(view).toMatchObject({ page: 3, sort: 'latestWeight', dir: 'desc', sex: 'doe', breedId: 2 });
    expect(view.pageSize).toBe(HERD_DEFAULTS.pageSize);
    expect(view.ageClass).toBeUndefined();
  });

  it('writes only what differs from the defaults', () => {
    expect(herdParams(HERD_DEFAULTS)).toEqual({});
    expect(herdParams({ ...HERD_DEFAULTS, q: 'BF1', page: 2, stubs: 'include' })).toEqual({ q: 'BF1', page: '2', stubs: 'include' });
  });

  it('opens on the animals in the herd and says "any status" to the API by leaving it out', () => {
    expect(HERD_DEFAULTS.status).toBe('active');
    expect(herdApiParams(HERD_DEFAULTS)).toEqual({ status: 'active' });
    const any = herdViewFrom({ status: 'any' });
    expect(any.status).toBe('any');
    expect(herdParams(any)).toEqual({ status: 'any' });
    expect(herdApiParams(any)).toEqual({});
    expect(herdApiParams(herdViewFrom({ status: 'sold' }))).toEqual({ status: 'sold' });
    expect(withFilter(any, 'status', undefined).status).toBe('active');
  });

  it('downloads the whole filtered table, without paging', () => {
    const url = herdCsvUrl('7', { ...HERD_DEFAULTS, page: 4, pageSize: 25, sort: 'name', sex: 'doe' });
    expect(url).toBe('/api/rabbitries/7/animals?sort=name&sex=doe&status=active&format=csv');
  });

  it('goes back to page one when a filter changes and drops a variety of another breed', () => {
    const view = { ...HERD_DEFAULTS, page: 5, breedId: 2, variety: 'Castor' };
    expect(withFilter(view, 'sex', 'buck')).toMatchObject({ page: 1, sex: 'buck', variety: 'Castor' });
    expect(withFilter(view, 'breedId', 3)).toMatchObject({ breedId: 3, variety: undefined });
    expect(withFilter(view, 'variety', '')).toMatchObject({ variety: undefined });
    expect(withFilter({ ...view, stubs: 'only' }, 'stubs', undefined).stubs).toBe('exclude');
  });

  it('names the filters in force', () => {
    const view = { ...HERD_DEFAULTS, q: 'BF', sex: 'doe' as const, breedId: 2, status: 'any' as const, ageClass: 'junior' as const, stubs: 'only' as const };
    expect(activeFilters(view, [{ id: 2, name: 'Mini Rex' }]).map((f) => f.label)).toEqual([
      '“BF”', 'Does', 'Mini Rex', 'Any status', 'Juniors today', 'Outside parents only',
    ]);
    expect(activeFilters(HERD_DEFAULTS, [])).toEqual([]);
  });
});
