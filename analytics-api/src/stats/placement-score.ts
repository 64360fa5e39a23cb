import { checkPlacing } from './placing';

/**
 * Class-size-adjusted placement score (n − p)/(n − 1): 1 for first place, 0 for last, the
 * same scale whatever the class size; its expectation under random placing is ½. O(1).
 *
 * A class of one animal carries no comparison, so it scores null (callers leave it out).
 *
 * @param placing 1 = first
 * @param entries animals placed in the class
 * @throws when placing or entries is not a positive integer, or placing > entries
 */
export function placementScore(placing: number, entries: number): number | null {
  checkPlacing(placing, entries, 'placementScore');
  return entries === 1 ? null : (entries - placing) / (entries - 1);
}
