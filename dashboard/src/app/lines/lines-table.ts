import type { DistributionSummary } from '@shared/contracts/analytics';
import type { CsvColumn } from '@shared/csv/to-csv';
import { formatMeasure, SMALL_GROUP, type LineGroup, type LineMeasure } from './lines-chart-options';
import type { SortKeys } from '../panels/sort-rows';

/** One group's distribution of one measure: a row of the comparison table. */
export interface LineRow {
  measureKey: string;
  measure: string;
  unit: string;
  group: string;
  animals: number;
  summary: DistributionSummary | null;
  medianInterval: LineMeasure['groups'][number]['medianInterval'];
  small: boolean;
}

/** The table's rows: measure by measure, groups in the API's order; under `minN` values a group is small. O(measures × groups). */
export function lineRows(measures: readonly LineMeasure[], groups: readonly LineGroup[], minN = SMALL_GROUP): LineRow[] {
  const byKey = new Map(groups.map((g) => [g.key, g]));
  return measures.flatMap((m) =>
    m.groups.map((g) => ({
      measureKey: m.key,
      measure: m.label,
      unit: m.unit,
      group: byKey.get(g.key)?.label ?? g.key,
      animals: byKey.get(g.key)?.animals ?? 0,
      summary: g.summary,
      medianInterval: g.medianInterval,
      small: !g.summary || g.summary.n < minN,
    })),
  );
}

export const LINE_SORT: SortKeys<LineRow> = {
  measure: (r) => r.measure,
  group: (r) => r.group,
  n: (r) => r.summary?.n ?? null,
  median: (r) => r.summary?.median ?? null,
  q1: (r) => r.summary?.q1 ?? null,
  q3: (r) => r.summary?.q3 ?? null,
  mean: (r) => r.summary?.mean ?? null,
};

/** "45–58" in the measure's precision; a dash where the group has no interval (fewer than 6 values). */
export function medianIntervalText(r: Pick<LineRow, 'medianInterval' | 'summary' | 'unit'>): string {
  if (!r.medianInterval) return r.summary ? 'too few values' : '—';
  return `${formatMeasure(r.medianInterval.lower, r.unit)}–${formatMeasure(r.medianInterval.upper, r.unit)}`;
}

const stat = (key: keyof DistributionSummary) => (r: LineRow) => r.summary?.[key] ?? null;

/** The table as a file, its last column naming the threshold in force. */
export function lineCsv(minN: number): readonly CsvColumn<LineRow>[] {
  return [
    { header: 'Measure', value: (r) => r.measure },
    { header: 'Unit', value: (r) => r.unit },
    { header: 'Group', value: (r) => r.group },
    { header: 'Animals in group', value: (r) => r.animals },
    { header: 'n', value: stat('n') },
    { header: 'Minimum', value: stat('min') },
    { header: 'Lower quartile', value: stat('q1') },
    { header: 'Median', value: stat('median') },
    { header: 'Median 95 % lower', value: (r) => r.medianInterval?.lower ?? null },
    { header: 'Median 95 % upper', value: (r) => r.medianInterval?.upper ?? null },
    { header: 'Interval coverage', value: (r) => (r.medianInterval ? Math.round(r.medianInterval.coverage * 10000) / 10000 : null) },
    { header: 'Upper quartile', value: stat('q3') },
    { header: 'Maximum', value: stat('max') },
    { header: 'Mean', value: stat('mean') },
    { header: `Small group (n < ${minN})`, value: (r) => (r.small ? 'yes' : 'no') },
  ];
}
