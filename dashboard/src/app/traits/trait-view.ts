import { HeritabilityQuery } from '@shared/contracts/analytics';
import { queryParamsOf, queryViewFrom, type QueryParams } from '../panels/query-view';

/** The trait and the pooling, kept in the address: the API's own heritability query. */
export type TraitView = HeritabilityQuery;

export const traitViewFrom = (params: QueryParams): TraitView => queryViewFrom(HeritabilityQuery, params);
export const traitParams = (view: TraitView): Record<string, string> => queryParamsOf(HeritabilityQuery, view);
