import { GrowthQuery, type GrowthReferenceReport, type GrowthReport } from '@shared/contracts/analytics';
import { queryParamsOf, queryViewFrom, type QueryParams } from '../panels/query-view';

/** Breed, sex, chosen animals or litter and pooling, kept in the address: the API's growth query. */
export type GrowthView = GrowthQuery;

export const growthViewFrom = (params: QueryParams): GrowthView => queryViewFrom(GrowthQuery, params);
export const growthParams = (view: GrowthView): Record<string, string> => queryParamsOf(GrowthQuery, view);

/** The API takes up to 50 animals at once. */
export const MAX_CHOSEN = 50;

export function withAnimal(view: GrowthView, id: number): GrowthView {
  const animals = view.animals ?? [];
  return animals.includes(id) || animals.length >= MAX_CHOSEN ? view : { ...view, animals: [...animals, id] };
}

export function withoutAnimal(view: GrowthView, id: number): GrowthView {
  const animals = (view.animals ?? []).filter((a) => a !== id);
  return { ...view, animals: animals.length ? animals : undefined };
}

/** The reference drawn: the one of the breed and sex asked for, else of the sex asked for, else the first. */
export function referenceFor(report: GrowthReport, view: GrowthView): GrowthReferenceReport | null {
  const refs = report.references;
  return refs.find((r) => (view.breed === undefined || r.breed.id === view.breed) && (view.sex === undefined || r.sex === view.sex))
    ?? refs.find((r) => view.sex === undefined || r.sex === view.sex)
    ?? refs[0]
    ?? null;
}
