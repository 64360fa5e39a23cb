import { PlacementQuery } from '@shared/contracts/analytics';
import { queryParamsOf, queryViewFrom, type QueryParams } from '../panels/query-view';

/** The report's filters, kept in the address: the API's own placement query. */
export type SireDamView = PlacementQuery;

export const sireDamViewFrom = (params: QueryParams): SireDamView => queryViewFrom(PlacementQuery, params);
export const sireDamParams = (view: SireDamView): Record<string, string> => queryParamsOf(PlacementQuery, view);

/** A filter changed; a new breed has other varieties, so the variety goes with it. */
export function withSireDamFilter<K extends keyof SireDamView>(view: SireDamView, key: K, value: SireDamView[K] | undefined): SireDamView {
  const next = { ...view, [key]: value === '' || value === null ? undefined : value } as SireDamView;
  if (key === 'breed' && value !== view.breed) next.variety = undefined;
  if (next.parent === undefined) next.parent = 'sire';
  return next;
}
