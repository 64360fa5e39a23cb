/** A band of expected offspring inbreeding, as the planner's heatmap colours it. */
export interface InbreedingBand {
  /** 0 (none) … 4 (as close as full sibs or closer). */
  index: number;
  /** Lower and upper bounds of F; the upper is excluded, null for the last band. */
  from: number;
  to: number | null;
  label: string;
  /** The mating it compares with. */
  likeness: string;
}

/**
 * Bands of Wright's inbreeding coefficient F of the planned offspring, cut at the values of
 * familiar matings: first cousins 1/16, half sibs 1/8, full sibs or parent × offspring 1/4
 * (Falconer & Mackay 1996, Introduction to Quantitative Genetics, ch. 5 — from memory).
 * The first three cuts are the API's own levels (none / low / moderate / high).
 */
export const INBREEDING_BANDS: readonly InbreedingBand[] = [
  { index: 0, from: 0, to: 0, label: 'None', likeness: 'no common ancestor on record' },
  { index: 1, from: 0, to: 1 / 16, label: 'Under 6.25 %', likeness: 'less than first cousins' },
  { index: 2, from: 1 / 16, to: 1 / 8, label: '6.25–12.5 %', likeness: 'first cousins to half sibs' },
  { index: 3, from: 1 / 8, to: 1 / 4, label: '12.5–25 %', likeness: 'half sibs to full sibs' },
  { index: 4, from: 1 / 4, to: null, label: '25 % and over', likeness: 'as close as full sibs or parent × offspring' },
];

/** The band of an expected F (0 or less is "none"). O(1). Throws for NaN. */
export function inbreedingBand(f: number): InbreedingBand {
  if (Number.isNaN(f)) throw new Error('inbreedingBand requires a number');
  if (f <= 0) return INBREEDING_BANDS[0]!;
  return INBREEDING_BANDS.find((b) => b.index > 0 && (b.to === null || f < b.to))!;
}

/** F as a percentage for people: 0.3046875 → "30.5 %", 0 → "0 %". */
export function formatInbreeding(f: number): string {
  if (f === 0) return '0 %';
  const pct = f * 100;
  return `${pct < 1 ? pct.toFixed(2) : pct.toFixed(1)} %`;
}
