import type { Evaluation } from '@shared/contracts/animals';
import type { EvaluationTrait } from '@shared/domain/breed';

export interface ScoringSheet {
  /** One column per evaluation, oldest first. */
  evaluations: { id: number; evaluatedOn: string; evaluator: string | null; notes: string | null }[];
  /** One row per trait of the breed's template, then any trait scored earlier that the template has dropped. */
  rows: { key: string; label: string; points: number | null; scores: (number | null)[] }[];
  totals: { total: number; possible: number }[];
  /** The template's full points (100 for the default template). */
  templatePoints: number;
}

/**
 * A breeder's scoring sheet: traits down the side with their points, evaluations across, each
 * column's total over the traits scored and the points those traits could earn (as the API counts
 * them). Cost O(traits × evaluations).
 */
export function scoringSheet(traits: readonly EvaluationTrait[], evaluations: readonly Evaluation[]): ScoringSheet {
  const sorted = [...evaluations].sort((a, b) => a.evaluatedOn.localeCompare(b.evaluatedOn) || a.id - b.id);
  const known = new Set(traits.map((t) => t.key));
  const dropped = [...new Set(sorted.flatMap((e) => Object.keys(e.scores)))].filter((k) => !known.has(k));
  const rows = [
    ...traits.map((t) => ({ key: t.key, label: t.label, points: t.points as number | null })),
    ...dropped.map((k) => ({ key: k, label: `${k.replace(/_/g, ' ')} (no longer in the template)`, points: null })),
  ].map((r) => ({ ...r, scores: sorted.map((e) => e.scores[r.key] ?? null) }));
  return {
    evaluations: sorted.map(({ id, evaluatedOn, evaluator, notes }) => ({ id, evaluatedOn, evaluator, notes })),
    rows,
    totals: sorted.map((e) => ({ total: e.total, possible: e.possible })),
    templatePoints: traits.reduce((s, t) => s + t.points, 0),
  };
}

/** "28.5" or "30": scores may be halves. */
export function scoreText(score: number | null): string {
  return score === null ? '–' : String(Math.round(score * 10) / 10);
}
