import { PairingsQuery, WEIGHT_TRAIT_AGES, WEIGHT_TRAITS } from '@shared/contracts/analytics';
import type { BreedRecord } from '@shared/contracts/breeds';
import { queryFromView, viewFromQuery } from '../lines/query-view';

/** What the planner shows: the animal planned for, the trait of the breeding values, how many mates. */
export interface PairingView extends Record<string, unknown> {
  animal: number | null;
  trait: string;
  limit: number;
}

const { limit, trait } = PairingsQuery.parse({ animal: 1 });
export const PAIRING_DEFAULTS: PairingView = { animal: null, trait, limit };
export const PAIRING_LIMITS = [10, 20, 50, 100];

/** The view from the address, each key checked with the API's own schema. O(keys). */
export function pairingViewFrom(params: Record<string, string | undefined>): PairingView {
  const s = PairingsQuery.shape;
  return viewFromQuery<PairingView>({ animal: s.animal, trait: s.trait, limit: s.limit }, PAIRING_DEFAULTS, params);
}

/** The address's query parameters (and the API's) of a view. */
export function pairingParams(view: PairingView): Record<string, string> {
  return queryFromView(view, PAIRING_DEFAULTS);
}

export interface TraitChoice {
  key: string;
  label: string;
}

/**
 * Traits a pairing can be judged on: the standard-age weights, the show placement score and the
 * evaluation traits of the animal's breed (every breed's when the breed is unknown), each once.
 * O(breeds × traits).
 */
export function traitChoices(breeds: readonly Pick<BreedRecord, 'id' | 'evaluationTemplate'>[], breedId: number | null): TraitChoice[] {
  const weights = WEIGHT_TRAITS.map((key) => ({ key, label: `Weight at ${WEIGHT_TRAIT_AGES[key] / 7} weeks` }));
  const evaluation = breeds
    .filter((b) => breedId === null || b.id === breedId)
    .flatMap((b) => b.evaluationTemplate.traits.map((t) => ({ key: t.key, label: `${t.label} (evaluation)` })));
  const seen = new Set<string>();
  return [...weights, { key: 'placement_score', label: 'Placement score at shows' }, ...evaluation].filter((t) => !seen.has(t.key) && !!seen.add(t.key));
}
