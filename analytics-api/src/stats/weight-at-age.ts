export interface Weighing {
  ageDays: number;
  grams: number;
}

/**
 * Weight at a standard age (e.g. 56 days) from an animal's weight series, for use as a trait.
 * A weighing on the target day is used as is (several on that day: their mean). Otherwise the
 * weight is interpolated linearly between the last weighing before and the first after the
 * target, and only when both lie within `toleranceDays` of the target; with either side
 * missing or too far away the result is null — no extrapolation. O(w) for w weighings.
 *
 * @throws when targetDays or toleranceDays is not finite or negative, or a weighing has a
 *   non-finite age or a non-positive weight
 */
export function weightAtAge(series: readonly Weighing[], targetDays: number, toleranceDays = 10): number | null {
  if (!Number.isFinite(targetDays) || !(toleranceDays >= 0) || !Number.isFinite(toleranceDays)) {
    throw new Error('weightAtAge requires a finite target age and a non-negative tolerance');
  }
  let before: Weighing | null = null;
  let after: Weighing | null = null;
  let onTarget = 0;
  let onTargetCount = 0;
  for (const w of series) {
    if (!Number.isFinite(w.ageDays) || !(w.grams > 0)) throw new Error('weightAtAge requires finite ages and positive weights');
    if (w.ageDays === targetDays) {
      onTarget += w.grams;
      onTargetCount++;
    } else if (w.ageDays < targetDays) {
      if (before === null || w.ageDays > before.ageDays) before = w;
    } else if (after === null || w.ageDays < after.ageDays) {
      after = w;
    }
  }
  if (onTargetCount > 0) return onTarget / onTargetCount;
  if (before === null || after === null) return null;
  if (targetDays - before.ageDays > toleranceDays || after.ageDays - targetDays > toleranceDays) return null;
  const fraction = (targetDays - before.ageDays) / (after.ageDays - before.ageDays);
  return before.grams + fraction * (after.grams - before.grams);
}
