import type { BreedRow } from './analytics.repository';

/**
 * The usual cautions shown beside breeding advice (DESIGN §3.10). Common practice, no source;
 * the product supports the breeder's judgment and defers to vets, the official breed standard
 * and local rules.
 */
export const BREEDING_CAUTIONS: readonly string[] = [
  'Inbreeding tends to bring smaller litters and to intensify faults as well as virtues; line-breed with care.',
  'Breed a doe only once she is old and big enough for her breed; ask a veterinarian about any health question.',
  'Heat stresses rabbits above about 80 °F (27 °C): avoid breeding and travelling them in hot weather.',
  'Support the hindquarters whenever you handle or pose a rabbit.',
  'These figures support your judgment; they do not replace a judge, the official breed standard or a veterinarian.',
];

export const LINE_CAUTIONS: readonly string[] = [
  'A line’s figures also carry how its animals were fed, housed and shown; compare lines kept alike.',
  ...BREEDING_CAUTIONS,
];

export const KEEPER_CAUTIONS: readonly string[] = [
  'Weights and projections guide; check each animal on the scale and against the current official standard before a show.',
  'Contagious disease travels with show stock: quarantine animals coming back from shows, and follow local rules for sales and shows.',
  ...BREEDING_CAUTIONS.slice(0, 1),
  BREEDING_CAUTIONS[4]!,
];

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
