import { KEEPER_COMPONENTS, KeepersQuery, TraitKey, type KeeperComponent } from '@shared/contracts/analytics';
import { queryValue, type QueryParams } from '../panels/query-view';

/** What the keeper board shows: the trait of the breeding value and each component's weight. */
export interface KeeperView {
  trait: string;
  weights: Record<KeeperComponent, number>;
}

/** The API's own defaults: every component weighs 1. */
export const KEEPER_DEFAULTS: KeeperView = {
  trait: KeepersQuery.parse({}).trait,
  weights: Object.fromEntries(KEEPER_COMPONENTS.map((c) => [c, 1])) as Record<KeeperComponent, number>,
};

/** The sliders' range: 0 leaves a component out, 5 lets it lead. */
export const KEEPER_WEIGHT_RANGE = { min: 0, max: 5, step: 0.5 } as const;

/**
 * The view from the address's query (`trait`, and `weights` in the API's own form
 * "weightOnTarget:3,inbreeding:0"), read with the API's schema; anything the API would refuse
 * falls back to the default for that key, and weights are held within the sliders' range. O(k).
 */
export function keeperViewFrom(params: QueryParams): KeeperView {
  const trait = TraitKey.safeParse(queryValue(params, 'trait') ?? '');
  const weights = KeepersQuery.shape.weights.safeParse(queryValue(params, 'weights') || undefined);
  const given = weights.success ? (weights.data ?? {}) : {};
  const clamp = (w: number) => Math.min(KEEPER_WEIGHT_RANGE.max, Math.max(KEEPER_WEIGHT_RANGE.min, w));
  return {
    trait: trait.success ? trait.data : KEEPER_DEFAULTS.trait,
    weights: Object.fromEntries(KEEPER_COMPONENTS.map((c) => [c, clamp(given[c] ?? 1)])) as Record<KeeperComponent, number>,
  };
}

/** The weights in the API's form, only those that differ from 1; '' when all are default. O(k). */
export function weightsParam(weights: Record<KeeperComponent, number>): string {
  return KEEPER_COMPONENTS.filter((c) => weights[c] !== 1).map((c) => `${c}:${weights[c]}`).join(',');
}

/** Query parameters for the address and the API: only what differs from the defaults. */
export function keeperParams(view: KeeperView): Record<string, string> {
  const out: Record<string, string> = {};
  if (view.trait !== KEEPER_DEFAULTS.trait) out['trait'] = view.trait;
  const weights = weightsParam(view.weights);
  if (weights) out['weights'] = weights;
  return out;
}
