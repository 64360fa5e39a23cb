import type { Sex } from '@shared/domain/terms';

export interface ParentFacts { earId: string; sex: Sex; birthDate: string | null }

/**
 * Why an animal cannot be recorded as a sire or dam, or null when it can: a sire must be a buck,
 * a dam a doe, and a parent must be born before its offspring (checked when both dates are known;
 * `childBorn` is the child's birth date, or a litter's bred date). Cost O(1). Never throws.
 */
export function parentProblem(role: 'sire' | 'dam', parent: ParentFacts, childBorn: string | null): string | null {
  const want: Sex = role === 'sire' ? 'buck' : 'doe';
  if (parent.sex !== want) return `${parent.earId} is a ${parent.sex}; a ${role} must be a ${want}`;
  if (childBorn && parent.birthDate && parent.birthDate >= childBorn) {
    return `${parent.earId} was born on ${parent.birthDate}, not before ${childBorn}; a ${role} must be born first`;
  }
  return null;
}
