import { AWARD_LABELS, type Award } from '@shared/domain/awards';
import { AGE_CLASS_LABELS, type AgeClass, type Sex } from '@shared/domain/terms';

/** 1st, 2nd, 3rd, 4th … 11th, 12th, 13th, 21st, 22nd. O(1). */
export function ordinal(n: number): string {
  const tens = n % 100;
  if (tens >= 11 && tens <= 13) return `${n}th`;
  return `${n}${['th', 'st', 'nd', 'rd'][n % 10] ?? 'th'}`;
}

/** "1st of 7": a placing only means something beside the size of its class. */
export function placingText(placing: number, entriesInClass: number): string {
  return `${ordinal(placing)} of ${entriesInClass}`;
}

/** A show class as the trade names it: "Mini Rex · Black · Junior buck". */
export function classLabel(r: { breed: string; variety: string | null; sex: Sex; ageClass: AgeClass }): string {
  return [r.breed, r.variety, `${AGE_CLASS_LABELS[r.ageClass]} ${r.sex}`].filter(Boolean).join(' · ');
}

/** Awards with their trade names spelled out: "BOV (Best of variety), BIS (Best in show)". */
export function awardsText(awards: readonly Award[]): string {
  return awards.map((a) => `${a} (${AWARD_LABELS[a]})`).join(', ');
}
