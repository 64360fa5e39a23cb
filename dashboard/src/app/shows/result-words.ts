import type { ShowDetail } from '@shared/contracts/shows';
import { AWARD_LABELS, type Award } from '@shared/domain/awards';
import { ordinal } from '@shared/domain/ordinal';
import { AGE_CLASS_LABELS, type AgeClass, type Sex } from '@shared/domain/terms';


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

const counted = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/**
 * A show's results in a line, and who judged what: "14 classes of 3 breeds · 52 results from 9
 * exhibitors, 40 matched to members' herds" and "R. Ambleforth: 9 classes (30 results)".
 */
export function showSummary(s: ShowDetail): { counts: string; judging: string[] } {
  const c = s.counts;
  if (s.results === 0) return { counts: 'No results recorded yet.', judging: [] };
  const parts = [
    `${counted(c.classes, 'class', 'classes')} of ${counted(c.breeds, 'breed')}`,
    `${counted(s.results, 'result')} from ${counted(c.exhibitors, 'exhibitor')}, ${c.matched} matched to members' herds`,
  ];
  if (c.ageClassMismatches) parts.push(`${counted(c.ageClassMismatches, 'age class', 'age classes')} to check against the birth date`);
  return {
    counts: `${parts.join(' · ')}.`,
    judging: s.judging.map((j) => `${j.judge ?? 'Judge not recorded'}: ${counted(j.classes, 'class', 'classes')} (${counted(j.results, 'result')})`),
  };
}
