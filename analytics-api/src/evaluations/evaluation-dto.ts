import type { Evaluation } from '@shared/contracts/animals';
import type { EvaluationTrait } from '@shared/domain/breed';

/**
 * An evaluation row (raw query) with its total and the points possible over the traits scored,
 * by the breed's current template (a trait no longer in the template adds no possible points).
 */
export function evaluationDto(r: Record<string, unknown>, traits: readonly EvaluationTrait[]): Evaluation {
  const scores: Record<string, number> = typeof r.scores === 'string' ? JSON.parse(r.scores) : (r.scores as Record<string, number>);
  const points = new Map(traits.map((t) => [t.key, t.points]));
  const keys = Object.keys(scores);
  return {
    id: r.id as number, evaluatedOn: r.evaluated_on as string, evaluator: r.evaluator as string | null, scores,
    total: keys.reduce((s, k) => s + scores[k]!, 0), possible: keys.reduce((s, k) => s + (points.get(k) ?? 0), 0),
    notes: r.notes as string | null,
  };
}
