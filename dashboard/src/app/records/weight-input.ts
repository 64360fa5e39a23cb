import type { ValidatorFn } from '@angular/forms';
import { formatWeight, parseWeight, type UnitSetting } from '@shared/units/weight';

/**
 * A weight field's validator: the text is read by the same parser as the API's, with the user's
 * unit setting, and refused with the parser's own message. An empty field is an error only when
 * the weight is required.
 */
export function weightValidator(unit: () => UnitSetting, required = true): ValidatorFn {
  return (control) => {
    const text = String(control.value ?? '').trim();
    if (text === '') return required ? { message: 'Give the weight, e.g. ' + example(unit()) } : null;
    const parsed = parseWeight(text, unit());
    return parsed.ok ? null : { message: parsed.message };
  };
}

/**
 * What the field will store, said back as the breeder types: "= 5 lb 12 oz (2608 g)". Empty
 * while the text is not (yet) a weight. O(length of text).
 */
export function weightEcho(text: string, unit: UnitSetting): string {
  const parsed = parseWeight(text ?? '', unit);
  if (!parsed.ok) return '';
  return `= ${formatWeight(parsed.grams, unit)} (${parsed.grams} g)`;
}

export function example(unit: UnitSetting): string {
  return unit === 'lb-oz' ? '"5 lb 12 oz" or "5-12"' : '"2.6 kg" or "2600 g"';
}
