import { BREEDING_CAUTIONS as BREEDING, KEEPER_CAUTIONS as KEEPING, LINE_CAUTIONS as LINES, withJudgmentReminder } from '@shared/domain/cautions';
import type { BreedRow } from './analytics.repository';

/** The usual cautions as reports send them (DESIGN §3.10): the texts live once, in shared/domain/cautions. */
export const BREEDING_CAUTIONS = withJudgmentReminder(BREEDING);
export const KEEPER_CAUTIONS = withJudgmentReminder(KEEPING);
export const LINE_CAUTIONS = withJudgmentReminder(LINES);

/**
 * Minimum age for breeding by breed size (common practice, no source): small breeds (ideal
 * senior weight under 3 kg) about 5 months, medium (under 5 kg) 6 months, large and giant 8
 * months. Taken from the larger of the breed's buck and doe ideals (or maxima); 6 months when unknown.
 */
export function breedingAgeDays(breed: BreedRow | undefined): number {
  const limits = breed?.weightLimits;
  const sizes = limits ? [limits.buck?.senior, limits.doe?.senior].map((l) => l?.idealGrams ?? l?.maxGrams ?? null).filter((g): g is number => g !== null) : [];
  if (sizes.length === 0) return 183;
  const grams = Math.max(...sizes);
  if (grams < 3000) return 152;
  if (grams < 5000) return 183;
  return 243;
}
