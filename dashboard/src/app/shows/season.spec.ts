import type { Show } from '@shared/contracts/shows';
import { showsInSeason } from './season';

const show = (id: number, showDate: string): Show => ({
  id, name: `Show ${id}`, showDate, location: null, hostClub: null, judges: [], sanctionNo: null, results: 0,
});

describe('showsInSeason', () => {
  const shows = [show(1, '2025-12-31'), show(2, '2026-01-01'), show(3, '2026-12-31'), show(4, '2027-01-02')];
  it('keeps the shows on and between the season’s first and last day', () => {
    expect(showsInSeason(shows, '2026-01-01', '2026-12-31').map((s) => s.id)).toEqual([2, 3]);
    expect(showsInSeason(shows, '2026-06-01', null).map((s) => s.id)).toEqual([3, 4]);
    expect(showsInSeason(shows, null, null)).toHaveLength(4);
  });
});
