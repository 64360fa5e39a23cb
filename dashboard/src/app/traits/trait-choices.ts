import { WEIGHT_TRAITS, WEIGHT_TRAIT_AGES } from '@shared/contracts/analytics';
import type { BreedRecord } from '@shared/contracts/breeds';

export interface TraitChoice {
  key: string;
  label: string;
  kind: 'weight' | 'evaluation';
}

/**
 * The traits a breeder can pick: weight at 8, 12 and 16 weeks, then every evaluation trait of
 * the catalogue's templates (the first label seen for a key wins). O(breeds × traits).
 */
export function traitChoices(breeds: readonly Pick<BreedRecord, 'evaluationTemplate'>[]): TraitChoice[] {
  const weights: TraitChoice[] = WEIGHT_TRAITS.map((key) => ({ key, label: `Weight at ${WEIGHT_TRAIT_AGES[key] / 7} weeks`, kind: 'weight' }));
  const evaluations = new Map<string, TraitChoice>();
  for (const breed of breeds) {
    for (const t of breed.evaluationTemplate.traits) {
      if (!evaluations.has(t.key)) evaluations.set(t.key, { key: t.key, label: t.label, kind: 'evaluation' });
    }
  }
  return [...weights, ...evaluations.values()];
}
