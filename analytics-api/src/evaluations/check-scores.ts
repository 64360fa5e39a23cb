import type { EvaluationTrait } from '@shared/domain/breed';

/**
 * Problems with an evaluation's scores against the breed's template, by trait key: a key not in
 * the template, or a score above the trait's points (scores are 0…points; the schema refuses
 * negatives). Empty when the scores fit. Cost O(traits + scores). Never throws.
 */
export function checkScores(scores: Record<string, number>, traits: readonly EvaluationTrait[]): Record<string, string> {
  const byKey = new Map(traits.map((t) => [t.key, t]));
  const problems: Record<string, string> = {};
  for (const [key, score] of Object.entries(scores)) {
    const trait = byKey.get(key);
    if (!trait) problems[key] = `${key} is not a trait of this breed's evaluation template (traits: ${traits.map((t) => t.key).join(', ')})`;
    else if (score > trait.points) problems[key] = `${trait.label}: ${score} is more than the ${trait.points} points the trait carries`;
  }
  return problems;
}
