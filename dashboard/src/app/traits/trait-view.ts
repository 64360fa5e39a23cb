import { HeritabilityQuery } from '@shared/contracts/analytics';
import { queryParamsOf, queryViewFrom } from '../keepers/query-view';

/** The trait and the pooling, kept in the address: the API's own heritability query. */
export type TraitView = HeritabilityQuery;

export const traitViewFrom = (params: Record<string, string | undefined>): TraitView => queryViewFrom(HeritabilityQuery, params);
export const traitParams = (view: TraitView): Record<string, string> => queryParamsOf(HeritabilityQuery, view);
