import * as z from 'zod';
import { PairingsQuery } from '@shared/contracts/analytics';
import { queryParamsOf, queryViewFrom, type QueryParams } from '../panels/query-view';

/** What the planner shows: the animal planned for (none yet), the trait of the breeding values, how many mates. */
const PairingView = z.object({
  animal: PairingsQuery.shape.animal.nullable().default(null),
  trait: PairingsQuery.shape.trait,
  limit: PairingsQuery.shape.limit,
});
export type PairingView = z.infer<typeof PairingView>;

export const PAIRING_LIMITS = [10, 20, 50, 100];

/** The view from the address, each key checked with the API's own schema. O(keys). */
export const pairingViewFrom = (params: QueryParams): PairingView => queryViewFrom(PairingView, params);

/** The address's query parameters (and the API's) of a view. */
export const pairingParams = (view: PairingView): Record<string, string> => queryParamsOf(PairingView, view);
