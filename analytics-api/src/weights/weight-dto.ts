import type { Weight } from '@shared/contracts/animals';
import { formatWeight, type UnitSetting } from '@shared/units/weight';

/** A weight_record row (raw query) as the API shows it, in the reader's unit. */
export function weightDto(r: Record<string, unknown>, unit: UnitSetting): Weight {
  const grams = r.grams as number;
  return { id: r.id as number, weighedOn: r.weighed_on as string, grams, display: formatWeight(grams, unit), notes: r.notes as string | null };
}
