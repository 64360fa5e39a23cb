import type { CommonAncestor, PairingsReport } from '@shared/contracts/analytics';
import type { CsvColumn } from '@shared/csv/to-csv';
import type { SortKeys } from '../panels/sort-rows';
import { formatInbreeding, inbreedingBand } from './inbreeding-bands';
import { animalLabel } from './pairing-heatmap-options';

export type Candidate = PairingsReport['candidates'][number];

/** A breeding value in standard deviations, signed: 0.3233 → "+0.32 SD"; null → "—". */
export function formatEbv(value: number | null): string {
  if (value === null) return '—';
  const rounded = Math.round(value * 100) / 100;
  return `${rounded > 0 ? '+' : rounded < 0 ? '−' : '±'}${Math.abs(rounded).toFixed(2)} SD`;
}

/** The accuracy r of a breeding value (0 = pedigree tells nothing, 1 = certain): 0.4512 → "accuracy 0.45". */
export function formatAccuracy(r: number | null): string {
  return r === null ? 'accuracy not known' : `accuracy ${r.toFixed(2)}`;
}

/**
 * The ancestors behind a pair's inbreeding, biggest share first, in words:
 * "BF056 Aster 46 %, BF053 Garnet 21 %". Ancestors outside the records are "an unrecorded ancestor".
 */
export function ancestorsText(ancestors: readonly CommonAncestor[]): string {
  return ancestors
    .map((c) => `${c.animal ? animalLabel(c.animal) : 'an unrecorded ancestor'} ${Math.round(c.share * 100)} %`)
    .join(', ');
}

export const CANDIDATE_SORT: SortKeys<Candidate> = {
  rank: (c) => c.rank,
  mate: (c) => c.mate.earId,
  line: (c) => c.mate.line,
  age: (c) => c.ageDays,
  inbreeding: (c) => c.expectedInbreeding,
  mateEbv: (c) => c.mateEbv,
  mateAccuracy: (c) => c.mateAccuracy,
  offspringEbv: (c) => c.expectedOffspringEbv,
};

export const CANDIDATE_CSV: readonly CsvColumn<Candidate>[] = [
  { header: 'Rank', value: (c) => c.rank },
  { header: 'Mate ear ID', value: (c) => c.mate.earId },
  { header: 'Mate name', value: (c) => c.mate.name },
  { header: 'Sex', value: (c) => c.mate.sex },
  { header: 'Variety', value: (c) => c.mate.variety },
  { header: 'Line', value: (c) => c.mate.line },
  { header: 'Age (days)', value: (c) => c.ageDays },
  { header: 'Expected inbreeding F', value: (c) => round(c.expectedInbreeding, 5) },
  { header: 'Inbreeding band', value: (c) => inbreedingBand(c.expectedInbreeding).label },
  { header: 'Mate breeding value (SD)', value: (c) => (c.mateEbv === null ? null : round(c.mateEbv, 3)) },
  { header: 'Mate breeding value accuracy (r)', value: (c) => (c.mateAccuracy === null ? null : round(c.mateAccuracy, 3)) },
  { header: 'Expected litter breeding value (SD)', value: (c) => (c.expectedOffspringEbv === null ? null : round(c.expectedOffspringEbv, 3)) },
  { header: 'Common ancestors (share of F)', value: (c) => ancestorsText(c.commonAncestors) },
  { header: 'Notes', value: (c) => c.notes.join(' ') },
];

export interface GridCell {
  doe: string;
  buck: string;
  f: number;
}

/** The heatmap as rows for its table and file: one row per doe × buck. O(does × bucks). */
export function gridCells(matrix: PairingsReport['matrix']): GridCell[] {
  return matrix.does.flatMap((d, i) => matrix.bucks.map((b, j) => ({ doe: animalLabel(d), buck: animalLabel(b), f: matrix.values[i]![j]! })));
}

export const GRID_CSV: readonly CsvColumn<GridCell>[] = [
  { header: 'Doe', value: (c) => c.doe },
  { header: 'Buck', value: (c) => c.buck },
  { header: 'Expected inbreeding F', value: (c) => round(c.f, 5) },
  { header: 'Expected inbreeding', value: (c) => formatInbreeding(c.f) },
];

function round(value: number, digits: number): number {
  const k = 10 ** digits;
  return Math.round(value * k) / k;
}
