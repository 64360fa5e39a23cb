import type { Litter } from '@shared/contracts/litters';
import { daysBetween } from '@shared/domain/calendar-date';
import { formatWeight, type UnitSetting } from '@shared/units/weight';

/**
 * Breeding age by breed size, common practice (no source; breeders and vets differ): small breeds
 * are first bred at about 5–6 months, medium at 6–7, large and giant at 8–9; bucks often later.
 */
export const BREEDING_AGE_CAUTION =
  'Breeding age, as common practice has it: small breeds at about 5–6 months, medium breeds at 6–7 months, large and giant breeds at 8–9 months, bucks often a little later — judge each animal’s size and condition. A veterinarian answers health questions; local rules apply to sales and shows.';

/** Where a litter stands on a day, from its kindling window (bred date + 29…35 days, common practice). */
export function litterState(l: Pick<Litter, 'kindledOn' | 'kindlingWindow'>, today: string): string {
  if (l.kindledOn) return '';
  const w = l.kindlingWindow;
  if (!w) return '';
  if (today < w.earliest) {
    const days = daysBetween(today, w.expectedFrom);
    return `due in ${days} day${days === 1 ? '' : 's'}`;
  }
  if (today <= w.latest) return 'due now';
  return 'no kindling recorded';
}

/** "2026-12-05 – 12-06": the usual days, the year said once (or not at all, beside the bred date on a phone). */
export function expectedText(l: Pick<Litter, 'kindlingWindow'>, withYear = true): string {
  const w = l.kindlingWindow;
  if (!w) return '';
  const short = (d: string) => (d.slice(0, 4) === w.expectedFrom.slice(0, 4) ? d.slice(5) : d);
  return `${withYear ? w.expectedFrom : short(w.expectedFrom)} – ${short(w.expectedTo)}`;
}

/** "29–35 days: 12-03 to 12-09", the whole range a doe may kindle in. */
export function rangeText(l: Pick<Litter, 'kindlingWindow'>): string {
  const w = l.kindlingWindow;
  return w ? `range ${w.earliest} to ${w.latest}` : '';
}

export function weight21dText(l: Pick<Litter, 'weight21dGrams'>, unit: UnitSetting): string {
  return l.weight21dGrams === null ? '' : formatWeight(l.weight21dGrams, unit);
}

/** The ear IDs "Add kits" will give: prefix + first … prefix + (first + count − 1). */
export function kitEarIds(prefix: string, first: number, count: number): string[] {
  if (!Number.isInteger(first) || !Number.isInteger(count) || count < 1) return [];
  return Array.from({ length: Math.min(count, 20) }, (_, i) => `${prefix.trim()}${first + i}`);
}
