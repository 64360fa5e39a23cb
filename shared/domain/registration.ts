import { formatWeight, type UnitSetting } from '../units/weight';
import { addMonths, requireIsoDate } from './calendar-date';
import { JUNIOR_UNTIL_MONTHS } from './age-class';
import type { Breed } from './breed';
import type { Sex } from './terms';

/** An ancestor as recorded (in the herd or as an outside stub); parents are nested. */
export interface PedigreeNode {
  earId: string | null;
  variety: string | null;
  weightGrams: number | null;
  sire?: PedigreeNode | null;
  dam?: PedigreeNode | null;
}

export interface RegistrationCandidate {
  birthDate: string | null;
  sex: Sex;
  latestWeightGrams: number | null;
  sire: PedigreeNode | null;
  dam: PedigreeNode | null;
}

export interface RegistrationReadiness {
  ready: boolean;
  /** Each gap in words a breeder reads, e.g. "dam's sire: no weight recorded". */
  missing: string[];
}

/** Three generations: 2 parents, 4 grandparents, 8 great-grandparents = 14 ancestors. */
export const PEDIGREE_GENERATIONS = 3;

function checkAncestors(node: PedigreeNode | null | undefined, path: string, isSire: boolean, generation: number, missing: string[]): void {
  if (!node) {
    const above = PEDIGREE_GENERATIONS - generation;
    missing.push(above > 0 ? `${path}: not recorded, nor ${isSire ? 'his' : 'her'} parents` : `${path}: not recorded`);
    return;
  }
  const gaps = [
    node.earId?.trim() ? null : 'ear ID',
    node.variety?.trim() ? null : 'variety',
    node.weightGrams ? null : 'weight',
  ].filter((g): g is string => g !== null);
  if (gaps.length > 0) missing.push(`${path}: no ${gaps.join(', no ')} recorded`);
  if (generation < PEDIGREE_GENERATIONS) {
    checkAncestors(node.sire, `${path}'s sire`, true, generation + 1, missing);
    checkAncestors(node.dam, `${path}'s dam`, false, generation + 1, missing);
  }
}

/**
 * Whether an animal is ready to register (common practice, no source; the registrar's current
 * rules decide): at least 6 months old on `onDate`, latest weight at least the breed's senior
 * minimum for its sex (when the catalogue gives one; otherwise a weight must be recorded), and a
 * complete three-generation pedigree — all 14 ancestors recorded, each with ear ID, variety and
 * weight. A missing ancestor is reported once, with its own missing parents folded in.
 * Cost O(14). Throws `registrationReadiness requires an ISO date 'YYYY-MM-DD' (got …)`.
 */
export function registrationReadiness(
  candidate: RegistrationCandidate,
  breed: Breed,
  onDate: string,
  unit: UnitSetting = 'lb-oz',
): RegistrationReadiness {
  requireIsoDate(onDate, 'registrationReadiness');
  const missing: string[] = [];

  if (!candidate.birthDate) {
    missing.push('age: no birth date recorded');
  } else {
    const eligibleFrom = addMonths(candidate.birthDate, JUNIOR_UNTIL_MONTHS);
    if (onDate < eligibleFrom) missing.push(`age: under ${JUNIOR_UNTIL_MONTHS} months (old enough on ${eligibleFrom})`);
  }

  const minimum = breed.weightLimits[candidate.sex].senior.minGrams;
  if (!candidate.latestWeightGrams) {
    missing.push('weight: no weight recorded');
  } else if (minimum !== null && candidate.latestWeightGrams < minimum) {
    missing.push(
      `weight: latest ${formatWeight(candidate.latestWeightGrams, unit)} is under the senior minimum of ${formatWeight(minimum, unit)} for a ${candidate.sex}`,
    );
  }

  checkAncestors(candidate.sire, 'sire', true, 1, missing);
  checkAncestors(candidate.dam, 'dam', false, 1, missing);
  return { ready: missing.length === 0, missing };
}
