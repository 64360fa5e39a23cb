import type { Show } from '@shared/contracts/shows';

/** The shows dated within a club's season (both ends included); every show when the club has no season. O(shows). */
export function showsInSeason(shows: readonly Show[], seasonStart: string | null, seasonEnd: string | null): Show[] {
  return shows.filter((s) => (!seasonStart || s.showDate >= seasonStart) && (!seasonEnd || s.showDate <= seasonEnd));
}
