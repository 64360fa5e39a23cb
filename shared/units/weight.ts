/**
 * Weights are stored as integer grams and shown in the user's unit.
 *
 * Definitions: the international avoirdupois pound is exactly 0.45359237 kg and the ounce is
 * 1/16 lb = 28.349523125 g exactly (International Yard and Pound Agreement, 1959; NIST
 * Handbook 44, Appendix C).
 */
export const GRAMS_PER_POUND = 453.59237;
export const GRAMS_PER_OUNCE = GRAMS_PER_POUND / 16;

export type UnitSetting = 'lb-oz' | 'kg';
export const UNIT_SETTINGS: readonly UnitSetting[] = ['lb-oz', 'kg'];

export type ParsedWeight = { ok: true; grams: number } | { ok: false; message: string };

const NUMBER = String.raw`(\d+(?:\.\d+)?)`;
const POUND = String.raw`(?:lb|lbs|pound|pounds)`;
const OUNCE = String.raw`(?:oz|ozs|ounce|ounces)`;
const POUNDS_AND_OUNCES = new RegExp(String.raw`^(\d+)\s*${POUND}\s*${NUMBER}\s*${OUNCE}$`);
const POUNDS = new RegExp(String.raw`^${NUMBER}\s*${POUND}$`);
const OUNCES = new RegExp(String.raw`^${NUMBER}\s*${OUNCE}$`);
const KILOGRAMS = new RegExp(String.raw`^${NUMBER}\s*(?:kg|kgs|kilo|kilos|kilogram|kilograms)$`);
const GRAMS = new RegExp(String.raw`^${NUMBER}\s*(?:g|gr|gram|grams)$`);
const SHORTHAND = /^(\d+)-(\d{1,2}(?:\.\d+)?)$/;
const BARE_NUMBER = /^\d+(?:\.\d+)?$/;

function howToWrite(unitSetting: UnitSetting): string {
  return unitSetting === 'lb-oz'
    ? 'Write the unit: "5 lb 12 oz", "5-12", "2.6 kg" or "2600 g"'
    : 'Write the unit: "2.6 kg", "2600 g" or "5 lb 12 oz"';
}

function toGrams(exactGrams: number, text: string): ParsedWeight {
  const grams = Math.round(exactGrams);
  if (grams <= 0) return { ok: false, message: `"${text}" is not a weight above zero` };
  return { ok: true, grams };
}

/**
 * Reads a weight typed by a breeder: "5 lb 12 oz", "5lb 12oz", "5.75 lb", "12 oz", "2.6 kg",
 * "2600 g", and the lb-oz shorthand "5-12" (5 lb 12 oz) only when the unit setting is 'lb-oz'.
 * A bare number is refused because it could be pounds, kilograms or grams.
 * Result: grams = round(lb · 453.59237 + oz · 28.349523125), or kg · 1000, or g.
 * Cost O(length of text). Never throws: a refusal carries a message a breeder can act on.
 */
export function parseWeight(text: string, unitSetting: UnitSetting): ParsedWeight {
  const original = text.trim();
  // Unit abbreviations are often written with a full stop ("5 lbs. 12 oz.").
  const t = original.toLowerCase().replace(/([a-z])\./g, '$1').replace(/\s+/g, ' ');
  if (t === '') return { ok: false, message: 'no weight given' };
  if (t.startsWith('-')) return { ok: false, message: `"${original}" is not a weight above zero` };
  if (t.includes(',')) {
    return { ok: false, message: `"${original}" is not understood: use a decimal point, e.g. "2.6 kg"` };
  }

  let m = POUNDS_AND_OUNCES.exec(t);
  if (m) {
    const oz = Number(m[2]);
    if (oz >= 16) {
      return { ok: false, message: `"${original}": ounces must be under 16 (16 oz make 1 lb)` };
    }
    return toGrams(Number(m[1]) * GRAMS_PER_POUND + oz * GRAMS_PER_OUNCE, original);
  }
  if ((m = POUNDS.exec(t))) return toGrams(Number(m[1]) * GRAMS_PER_POUND, original);
  if ((m = OUNCES.exec(t))) return toGrams(Number(m[1]) * GRAMS_PER_OUNCE, original);
  if ((m = KILOGRAMS.exec(t))) return toGrams(Number(m[1]) * 1000, original);
  if ((m = GRAMS.exec(t))) return toGrams(Number(m[1]), original);
  if ((m = SHORTHAND.exec(t))) {
    if (unitSetting !== 'lb-oz') {
      return {
        ok: false,
        message: `"${original}": the shorthand pounds-ounces works only with the lb-oz unit setting. ${howToWrite(unitSetting)}`,
      };
    }
    const oz = Number(m[2]);
    if (oz >= 16) {
      return { ok: false, message: `"${original}": ounces must be under 16 (16 oz make 1 lb)` };
    }
    return toGrams(Number(m[1]) * GRAMS_PER_POUND + oz * GRAMS_PER_OUNCE, original);
  }
  if (BARE_NUMBER.test(t)) {
    return { ok: false, message: `"${original}" has no unit. ${howToWrite(unitSetting)}` };
  }
  return { ok: false, message: `"${original}" is not understood. ${howToWrite(unitSetting)}` };
}

/**
 * Shows grams in the user's unit: lb-oz rounded to the nearest ounce, carrying 16 oz into a
 * pound ("5 lb 12 oz"; "12 oz" under one pound), or kilograms with two decimals ("2.61 kg").
 * Cost O(1). Throws `formatWeight requires a finite, non-negative number of grams`.
 */
export function formatWeight(grams: number, unit: UnitSetting): string {
  if (!Number.isFinite(grams) || grams < 0) {
    throw new Error('formatWeight requires a finite, non-negative number of grams');
  }
  if (unit === 'kg') return `${(grams / 1000).toFixed(2)} kg`;
  const totalOunces = Math.round(grams / GRAMS_PER_OUNCE);
  const pounds = Math.floor(totalOunces / 16);
  const ounces = totalOunces % 16;
  return pounds === 0 ? `${ounces} oz` : `${pounds} lb ${ounces} oz`;
}
