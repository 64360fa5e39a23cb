import { DEFAULT_EVALUATION_TRAITS, type EvaluationTrait } from '../domain/breed';

/** Keys the evaluations format uses for its own columns; a trait cannot take them. */
const FIXED_COLUMNS = new Set(['ear_id', 'evaluated_on', 'evaluator', 'notes']);

/**
 * The trait columns an evaluations file may map, from the evaluation templates of the breeds
 * the file can concern: each trait key once, labelled as the first template names it, with the
 * highest points any template gives it (every row is then checked against the template of its
 * own animal's breed). Keys that a fixed column of the format uses are left out. No templates:
 * the default traits. O(total traits).
 */
export function traitsToMap(templates: readonly (readonly EvaluationTrait[])[]): EvaluationTrait[] {
  const byKey = new Map<string, EvaluationTrait>();
  for (const traits of templates) {
    for (const t of traits) {
      if (FIXED_COLUMNS.has(t.key)) continue;
      const seen = byKey.get(t.key);
      byKey.set(t.key, seen ? { ...seen, points: Math.max(seen.points, t.points) } : { ...t });
    }
  }
  return byKey.size ? [...byKey.values()] : DEFAULT_EVALUATION_TRAITS.map((t) => ({ ...t }));
}
