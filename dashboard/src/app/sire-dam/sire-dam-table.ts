import type { ParentPlacement, PlacementReport } from '@shared/contracts/analytics';
import type { CsvColumn } from '@shared/csv/to-csv';
import type { SortKeys } from '../panels/sort-rows';

const pct = (v: number) => `${(100 * v).toFixed(0)} %`;

/** "82 % (74–87 %)": a share with its 95 % interval. */
export function shareText(p: { share: number; lower: number; upper: number }): string {
  return `${pct(p.share)} (${(100 * p.lower).toFixed(0)}–${pct(p.upper)})`;
}

/**
 * "1.26 (1.12–1.40)", or a dash without results in classes of more than k. An interval that
 * does not hold its own estimate (a fault upstream) is not shown as if it were one.
 */
export function indexText(p: ParentPlacement): string {
  const i = p.placementIndex;
  if (!i) return '—';
  const holds = i.lower <= i.index + 1e-9 && i.index <= i.upper + 1e-9;
  return holds ? `${i.index.toFixed(2)} (${i.lower.toFixed(2)}–${i.upper.toFixed(2)})` : `${i.index.toFixed(2)} (no interval)`;
}

/** "0.77 ± 0.08": mean class-size-adjusted score with its standard error. */
export function scoreText(p: ParentPlacement): string {
  const s = p.meanPlacementScore;
  if (!s) return '—';
  return s.se === null ? s.mean.toFixed(2) : `${s.mean.toFixed(2)} ± ${s.se.toFixed(2)}`;
}

/** The table's sortable columns (the report's rank order when cleared). */
export const PARENT_SORT: SortKeys<ParentPlacement> = {
  rank: (p) => p.rank,
  earId: (p) => p.parent.earId,
  entries: (p) => p.entries,
  offspring: (p) => p.offspringShown,
  share: (p) => p.topK.share,
  shrunk: (p) => p.shrunkenShare,
  index: (p) => p.placementIndex?.index ?? null,
  score: (p) => p.meanPlacementScore?.mean ?? null,
  legs: (p) => p.legs,
};

const round = (v: number | null | undefined, digits = 4) => (v === null || v === undefined ? null : Number(v.toFixed(digits)));

/** Every number of the report's table, one parent a row. */
export function sireDamCsvColumns(report: PlacementReport): CsvColumn<ParentPlacement>[] {
  const k = report.k;
  return [
    { header: 'Rank', value: (p) => p.rank },
    { header: `${report.parentKind === 'dam' ? 'Dam' : report.parentKind === 'grandsire' ? 'Grandsire' : 'Sire'} ear ID`, value: (p) => p.parent.earId },
    { header: 'Name', value: (p) => p.parent.name },
    { header: 'Breed', value: (p) => p.parent.breed },
    { header: 'Variety', value: (p) => p.parent.variety },
    { header: 'Outside parent', value: (p) => (p.parent.isStub ? 'yes' : 'no') },
    { header: 'Offspring results', value: (p) => p.entries },
    { header: 'Offspring shown', value: (p) => p.offspringShown },
    { header: `Placed top ${k}`, value: (p) => p.topK.count },
    { header: `Top-${k} share`, value: (p) => round(p.topK.share) },
    { header: 'Share 95 % lower', value: (p) => round(p.topK.lower) },
    { header: 'Share 95 % upper', value: (p) => round(p.topK.upper) },
    { header: 'Shrunken share', value: (p) => round(p.shrunkenShare) },
    { header: 'Placement index', value: (p) => round(p.placementIndex?.index) },
    { header: 'Index 95 % lower', value: (p) => round(p.placementIndex?.lower) },
    { header: 'Index 95 % upper', value: (p) => round(p.placementIndex?.upper) },
    { header: 'Mean placement score', value: (p) => round(p.meanPlacementScore?.mean) },
    { header: 'Score standard error', value: (p) => round(p.meanPlacementScore?.se) },
    { header: 'Legs', value: (p) => p.legs },
    { header: 'Grand champions', value: (p) => p.grandChampions },
    { header: 'Notes', value: (p) => p.warnings.join(' ') },
  ];
}
