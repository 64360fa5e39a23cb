import type { SeasonReport, Standing } from '@shared/contracts/analytics';
import type { CsvColumn } from '@shared/csv/to-csv';
import type { SortKeys } from '../panels/sort-rows';

export type LegsRow = SeasonReport['legs'][number];
export type SireRow = SeasonReport['topSires'][number];

export const STANDING_SORT: SortKeys<Standing> = {
  rank: (s) => s.rank,
  exhibitor: (s) => s.exhibitor,
  breed: (s) => s.breed,
  points: (s) => s.points,
  results: (s) => s.results,
  firsts: (s) => s.firsts,
  awards: (s) => s.awards,
};

export const STANDING_CSV: readonly CsvColumn<Standing>[] = [
  { header: 'Rank', value: (s) => s.rank },
  { header: 'Exhibitor', value: (s) => s.exhibitor },
  { header: 'Breed', value: (s) => s.breed },
  { header: 'Club member', value: (s) => (s.isMember ? 'yes' : 'no') },
  { header: 'Points', value: (s) => s.points },
  { header: 'Results', value: (s) => s.results },
  { header: 'Firsts', value: (s) => s.firsts },
  { header: 'Awards', value: (s) => s.awards },
];

export const LEGS_SORT: SortKeys<LegsRow> = {
  exhibitor: (l) => l.exhibitor,
  legs: (l) => l.legs,
  animals: (l) => l.animalsWithLegs,
  champions: (l) => l.grandChampionsCompleted,
};

export const SIRE_SORT: SortKeys<SireRow> = {
  rank: (s) => s.rank,
  sire: (s) => s.sire.earId,
  exhibitor: (s) => s.exhibitor,
  entries: (s) => s.entries,
  share: (s) => s.topK.share,
  index: (s) => s.placementIndex?.index ?? null,
  legs: (s) => s.legs,
};

/** A share as a whole percentage: 0.9565 → "96 %". */
export const percent = (share: number) => `${Math.round(share * 100)} %`;

/**
 * A placement index with its interval, when the interval holds the estimate; an interval that
 * does not (a fault upstream) is not shown rather than shown wrong. "1.63 (1.48–1.79)".
 */
export function indexText(index: SireRow['placementIndex']): string {
  if (!index) return '—';
  const fit = index.lower <= index.index && index.index <= index.upper;
  return fit ? `${index.index.toFixed(2)} (${index.lower.toFixed(2)}–${index.upper.toFixed(2)})` : index.index.toFixed(2);
}

/** The breeds named in standings, alphabetically, each once. O(n log n). */
export function breedsIn(rows: readonly Standing[]): string[] {
  return [...new Set(rows.map((r) => r.breed).filter((b): b is string => b !== null))].sort((a, b) => a.localeCompare(b, 'en'));
}
