import { parseWeight, type UnitSetting } from '@shared/units/weight';
import { AppError } from '../http/app-error';

/**
 * Grams from a weight as a breeder typed it, read with their unit setting (parseWeight).
 * Throws AppError 400 with the parser's own message under the field's name.
 */
export function readWeight(text: string, unit: UnitSetting, field: string): number {
  const parsed = parseWeight(text, unit);
  if (!parsed.ok) throw new AppError('validation', parsed.message, 400, { [field]: parsed.message });
  return parsed.grams;
}
