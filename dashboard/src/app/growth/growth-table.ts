import type { GrowthAnimal, GrowthReferenceReport } from '@shared/contracts/analytics';
import type { CsvColumn } from '@shared/csv/to-csv';
import { ordinal } from '@shared/domain/ordinal';
import { formatWeight, type UnitSetting } from '@shared/units/weight';
import type { SortKeys } from '../panels/sort-rows';
import { centileText, monthsText } from './growth-chart-options';

/** One weighing of a chosen animal, as the table lists it. */
export interface WeighingRow {
  animalId: number;
  earId: string;
  weighedOn: string;
  ageDays: number;
  grams: number;
  percentile: number | null;
}

/** Every chosen animal's weighings, youngest age first within each animal. O(weighings). */
export function weighingRows(animals: readonly GrowthAnimal[]): WeighingRow[] {
  return animals.flatMap((a) =>
    a.weighings.map((w) => ({ animalId: a.animal.id, earId: a.animal.earId, weighedOn: w.weighedOn, ageDays: w.ageDays, grams: w.grams, percentile: w.percentile })),
  );
}

/** The weighings table's sortable columns. */
export const WEIGHING_SORT: SortKeys<WeighingRow> = {
  earId: (r) => r.earId,
  weighedOn: (r) => r.weighedOn,
  ageDays: (r) => r.ageDays,
  grams: (r) => r.grams,
  percentile: (r) => r.percentile,
};

/** "12 weeks 3 days" (or "3 days"). */
export function ageText(days: number): string {
  const weeks = Math.floor(days / 7);
  const rest = days % 7;
  const d = `${rest} day${rest === 1 ? '' : 's'}`;
  if (weeks === 0) return d;
  const w = `${weeks} week${weeks === 1 ? '' : 's'}`;
  return rest === 0 ? w : `${w} ${d}`;
}

/** "4 lb 2 oz (3 lb 14 oz – 4 lb 6 oz)" in the user's unit, or a dash. */
export function projectionText(a: GrowthAnimal, unit: UnitSetting): string {
  const p = a.projection;
  if (!p) return '—';
  const w = (g: number) => formatWeight(Math.max(0, g), unit);
  return `${p.lower !== null && p.upper !== null ? `${w(p.grams)} (${w(p.lower)} – ${w(p.upper)})` : w(p.grams)} at ${monthsText(p.ageDays)}`;
}

export function weighingCsvColumns(unit: UnitSetting): CsvColumn<WeighingRow>[] {
  return [
    { header: 'Ear ID', value: (r) => r.earId },
    { header: 'Weighed on', value: (r) => r.weighedOn },
    { header: 'Age (days)', value: (r) => r.ageDays },
    { header: 'Weight (grams)', value: (r) => r.grams },
    { header: 'Weight', value: (r) => formatWeight(r.grams, unit) },
    { header: 'Centile', value: (r) => (r.percentile === null ? null : Number(r.percentile.toFixed(1))) },
  ];
}

type Band = GrowthReferenceReport['bands'][number];
const CENTILE_KEYS = ['p3', 'p10', 'p25', 'p50', 'p75', 'p90', 'p97'] as const;

export function bandCsvColumns(reference: GrowthReferenceReport): CsvColumn<Band>[] {
  return [
    { header: 'Breed', value: () => reference.breed.name },
    { header: 'Sex', value: () => reference.sex },
    { header: 'From (days)', value: (b) => b.fromDays },
    { header: 'To (days)', value: (b) => b.toDays },
    { header: 'Weights', value: (b) => b.n },
    { header: 'Method', value: (b) => b.method ?? 'no weights' },
    ...CENTILE_KEYS.map((k): CsvColumn<Band> => ({ header: `${centileLabel(k)} centile (grams)`, value: (b) => (b.centiles ? Math.round(b.centiles[k]) : null) })),
  ];
}

export const centileKeys = CENTILE_KEYS;
/** 'p3' → '3rd'. */
export const centileLabel = (key: (typeof CENTILE_KEYS)[number]) => ordinal(Number(key.slice(1)));
export { centileText };
