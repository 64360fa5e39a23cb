import { KEEPER_COMPONENTS, KEEPER_COMPONENT_LABELS, type KeeperComponent } from '@shared/contracts/analytics';
import type { KeeperDecision } from '@shared/contracts/animals';
import type { CsvColumn } from '@shared/csv/to-csv';
import { formatWeight, type UnitSetting } from '@shared/units/weight';
import type { KeeperCandidate } from '@shared/domain/keeper-explanation';
import type { SortKeys } from '../panels/sort-rows';

export const DECISION_LABELS: Record<KeeperDecision, string> = { keep: 'Keep', sell: 'Sell', undecided: 'Undecided' };

const signed = (v: number, digits = 2) => `${v > 0 ? '+' : v < 0 ? '−' : ''}${Math.abs(v).toFixed(digits)}`;

/** A component's raw value as the table shows it (its unit said), or a dash when missing. */
export function componentValue(component: KeeperComponent, value: number | null): string {
  if (value === null) return '—';
  switch (component) {
    case 'breedingValue':
      return `${signed(value)} SD`;
    case 'ownEvaluation':
      return `${value.toFixed(0)} % of points`;
    case 'weightOnTarget':
      return `${Math.abs(value).toFixed(1)} % off ideal`;
    case 'parentsPlacementIndex':
      return `index ${value.toFixed(2)}`;
    case 'inbreeding':
      return `F ${(100 * value).toFixed(1)} %`;
  }
}

/** weight × z, the part of the index the component gives. */
export function contributionText(v: number): string {
  return signed(v);
}

export function partOf(c: KeeperCandidate, component: KeeperComponent) {
  return c.components.find((p) => p.component === component) ?? null;
}

/** "6 lb 2 oz (5 lb 10 oz – 6 lb 9 oz)", in the user's unit; '—' without a projection. */
export function projectedText(c: KeeperCandidate, unit: UnitSetting): string {
  const p = c.projectedSeniorWeight;
  if (!p) return '—';
  const w = (g: number) => formatWeight(Math.max(0, g), unit);
  return p.lower !== null && p.upper !== null ? `${w(p.grams)} (${w(p.lower)} – ${w(p.upper)})` : w(p.grams);
}

/** The board's sortable columns; ties (and a cleared sort) keep the rank order. */
export const KEEPER_SORT: SortKeys<KeeperCandidate> = {
  rank: (c) => c.rank,
  earId: (c) => c.animal.earId,
  projected: (c) => c.projectedSeniorWeight?.grams ?? null,
  ...Object.fromEntries(KEEPER_COMPONENTS.map((k) => [k, (c: KeeperCandidate) => partOf(c, k)?.contribution ?? 0])),
};

/** The board as a file: every number of the chart and the table, with the explanation. */
export function keeperCsvColumns(
  unit: UnitSetting, decisionOf: (c: KeeperCandidate) => KeeperDecision | null,
): CsvColumn<KeeperCandidate>[] {
  return [
    { header: 'Rank', value: (c) => c.rank },
    { header: 'Ear ID', value: (c) => c.animal.earId },
    { header: 'Name', value: (c) => c.animal.name },
    { header: 'Sex', value: (c) => c.animal.sex },
    { header: 'Breed', value: (c) => c.animal.breed },
    { header: 'Variety', value: (c) => c.animal.variety },
    { header: 'Age (days)', value: (c) => c.ageDays },
    { header: 'Index total', value: (c) => Number(c.total.toFixed(3)) },
    ...KEEPER_COMPONENTS.flatMap((component): CsvColumn<KeeperCandidate>[] => [
      { header: `${KEEPER_COMPONENT_LABELS[component]} value`, value: (c) => partOf(c, component)?.value ?? null },
      { header: `${KEEPER_COMPONENT_LABELS[component]} weight`, value: (c) => partOf(c, component)?.weight ?? 0 },
      { header: `${KEEPER_COMPONENT_LABELS[component]} contribution`, value: (c) => Number((partOf(c, component)?.contribution ?? 0).toFixed(3)) },
    ]),
    { header: 'Projected senior weight (grams)', value: (c) => (c.projectedSeniorWeight ? Math.round(c.projectedSeniorWeight.grams) : null) },
    { header: 'Projected senior weight', value: (c) => projectedText(c, unit) },
    { header: 'Disqualification risk', value: (c) => (c.disqualificationRisk ? 'yes' : 'no') },
    { header: 'Decision', value: (c) => { const d = decisionOf(c); return d ? DECISION_LABELS[d] : ''; } },
    { header: 'Explanation', value: (c) => c.explanation.join(' ') },
  ];
}
