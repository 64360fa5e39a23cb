import { addDays } from './calendar-date';

/** Gestation in days: average 31–32, range 29–35. Common practice, no source. */
export const GESTATION_DAYS = { earliest: 29, expectedFrom: 31, expectedTo: 32, latest: 35 } as const;

export interface KindlingWindow {
  earliest: string;
  expectedFrom: string;
  expectedTo: string;
  latest: string;
}

/**
 * The expected kindling window from the date a doe was bred: bred date + 29, 31, 32 and
 * 35 days. A nest box usually goes in a few days before the earliest date; a doe not kindled by
 * the latest date should be checked, with a vet where in doubt.
 * Cost O(1). Throws on a malformed date (`addDays requires an ISO date …`).
 */
export function kindlingWindow(bredOn: string): KindlingWindow {
  return {
    earliest: addDays(bredOn, GESTATION_DAYS.earliest),
    expectedFrom: addDays(bredOn, GESTATION_DAYS.expectedFrom),
    expectedTo: addDays(bredOn, GESTATION_DAYS.expectedTo),
    latest: addDays(bredOn, GESTATION_DAYS.latest),
  };
}
