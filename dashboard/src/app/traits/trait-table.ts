import type { HeritabilityEstimate, HeritabilityReport } from '@shared/contracts/analytics';
import type { CsvColumn } from '@shared/csv/to-csv';
import { METHOD_LABELS } from './trait-chart-options';

/** What n counts for each method: families (regressions) or offspring records (half-sib). */
export function sampleText(e: HeritabilityEstimate): string {
  if (e.anova) return `${e.anova.sires} sires, ${e.anova.offspring} offspring`;
  return `${e.n} ${e.method === 'midparent-offspring' ? 'matings' : e.method === 'sire-offspring' ? 'sires' : 'dams'}`;
}

export const intervalText = (e: HeritabilityEstimate) => `${e.lower.toFixed(2)} to ${e.upper.toFixed(2)}`;

/** Whether the estimate lies inside the published range (null when none is published). */
export function withinRange(e: HeritabilityEstimate, report: HeritabilityReport): boolean | null {
  const r = report.plausibleRange;
  return r ? e.h2 >= r.lower && e.h2 <= r.upper : null;
}

const round = (v: number | null | undefined) => (v === null || v === undefined ? null : Number(v.toFixed(4)));

export function estimateCsvColumns(report: HeritabilityReport): CsvColumn<HeritabilityEstimate>[] {
  return [
    { header: 'Trait', value: () => report.trait.label },
    { header: 'Scope', value: () => report.scope.description },
    { header: 'Method', value: (e) => METHOD_LABELS[e.method] },
    { header: 'h2', value: (e) => round(e.h2) },
    { header: 'Standard error', value: (e) => round(e.se) },
    { header: '95 % lower', value: (e) => round(e.lower) },
    { header: '95 % upper', value: (e) => round(e.upper) },
    { header: 'n', value: (e) => e.n },
    { header: 'Sample', value: (e) => sampleText(e) },
    { header: 'Slope', value: (e) => round(e.slope) },
    { header: 'Slope standard error', value: (e) => round(e.slopeSe) },
    { header: 'Preferred', value: (e) => (report.preferred?.method === e.method ? 'yes' : 'no') },
    { header: 'Published range', value: () => (report.plausibleRange ? `${report.plausibleRange.lower}–${report.plausibleRange.upper}` : '') },
    { header: 'Notes', value: (e) => e.warnings.join(' ') },
  ];
}

export type ScatterPoint = HeritabilityReport['scatter']['points'][number];
export function pointCsvColumns(report: HeritabilityReport): CsvColumn<ScatterPoint>[] {
  return [
    { header: 'Ear ID', value: (p) => p.earId },
    { header: 'Rabbitry id', value: (p) => p.rabbitryId },
    { header: 'Animal id', value: (p) => p.animalId },
    { header: 'Midparent (SD)', value: (p) => round(p.x) },
    { header: 'Offspring (SD)', value: (p) => round(p.y) },
    { header: 'Trait', value: () => report.trait.label },
  ];
}
