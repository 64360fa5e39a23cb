import { WEIGHT_TRAITS, WEIGHT_TRAIT_AGES } from '@shared/contracts/analytics';
import type { BreedRecord } from '@shared/contracts/breeds';

export interface TraitChoice {
  key: string;
  label: string;
  kind: 'weight' | 'placement' | 'evaluation';
}

/**
 * The traits an analysis can be asked for: weight at 8, 12 and 16 weeks, the show placement score,
 * then the evaluation traits of the breed's template (every breed's when `breedId` is null), each
 * key once with the first label seen. O(breeds × traits).
 */
export function traitChoices(breeds: readonly Pick<BreedRecord, 'id' | 'evaluationTemplate'>[], breedId: number | null = null): TraitChoice[] {
  const weights: TraitChoice[] = WEIGHT_TRAITS.map((key) => ({ key, label: `Weight at ${WEIGHT_TRAIT_AGES[key] / 7} weeks`, kind: 'weight' }));
  const evaluations = new Map<string, TraitChoice>();
  for (const breed of breeds) {
    if (breedId !== null && breed.id !== breedId) continue;
    for (const t of breed.evaluationTemplate.traits) {
      if (!evaluations.has(t.key)) evaluations.set(t.key, { key: t.key, label: `${t.label} (evaluation)`, kind: 'evaluation' });
    }
  }
  return [...weights, { key: 'placement_score', label: 'Placement score at shows', kind: 'placement' }, ...evaluations.values()];
}
