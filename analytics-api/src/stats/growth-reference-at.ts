import type { GrowthReference } from './growth-reference';
import { lastIndexAtOrBelow } from './last-index-at-or-below';
import type { Lms } from './lms';

export type GrowthReferencePoint =
  | { method: 'lms'; lms: Lms; n: number }
  | { method: 'empirical'; weights: number[]; n: number };

/**
 * The reference at one age: in an LMS band, L, M and S interpolated linearly in age between
 * this band's mean age and the neighbouring LMS band's on the side of `ageDays` (the band's
 * own values at the ends or next to an empirical band); in an empirical band, its weights.
 * n is the band's number of weights. O(log B) for B bands.
 *
 * @returns null outside the reference's ages or in a band without weights
 */
export function growthReferenceAt(reference: GrowthReference, ageDays: number): GrowthReferencePoint | null {
  const { bands } = reference;
  if (!(ageDays >= reference.fromDays && ageDays < reference.toDays)) return null;
  // Bands are contiguous: the last one starting at or before the age holds it.
  const b = lastIndexAtOrBelow(bands.length, (i) => bands[i]!.fromDays, ageDays);
  const band = bands[b]!;
  if (band.weights !== null) return { method: 'empirical', weights: band.weights, n: band.n };
  if (band.lms === null) return null;
  const neighbour = bands[ageDays < band.midDays ? b - 1 : b + 1];
  if (neighbour === undefined || neighbour.lms === null || neighbour.midDays === band.midDays) {
    return { method: 'lms', lms: band.lms, n: band.n };
  }
  const t = (ageDays - band.midDays) / (neighbour.midDays - band.midDays);
  const mix = (a: number, c: number): number => a + t * (c - a);
  return {
    method: 'lms',
    lms: { L: mix(band.lms.L, neighbour.lms.L), M: mix(band.lms.M, neighbour.lms.M), S: mix(band.lms.S, neighbour.lms.S) },
    n: band.n,
  };
}
