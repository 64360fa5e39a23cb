import type { EvaluationTrait } from '../domain/breed';
import { importKind, type ImportKindKey, normaliseHeader } from './import-kinds';

export interface MappingSuggestion {
  /** Field key → the file's header suggested for it. */
  fields: Record<string, string>;
  /** Headers no field claimed. */
  unmatchedHeaders: string[];
  /** Required fields (and required groups, as "a or b") no header matched. */
  missingRequired: string[];
}

/**
 * Suggests which column of a file feeds which field: headers are normalised (case, spaces,
 * underscores, hyphens; see normaliseHeader) and matched first to field keys, then to each
 * field's aliases in the order the fields are defined; each header is used once.
 * Cost O(fields × aliases + headers).
 */
export function suggestMapping(kind: ImportKindKey, headers: readonly string[], traits?: readonly EvaluationTrait[]): MappingSuggestion {
  const definition = importKind(kind, traits);
  const byNormal = new Map<string, string>();
  for (const h of headers) {
    const n = normaliseHeader(h);
    if (n !== '' && !byNormal.has(n)) byNormal.set(n, h);
  }
  const used = new Set<string>();
  const fields: Record<string, string> = {};
  const claim = (fieldKey: string, normal: string) => {
    const header = byNormal.get(normal);
    if (header === undefined || used.has(header) || fields[fieldKey] !== undefined) return;
    fields[fieldKey] = header;
    used.add(header);
  };
  for (const f of definition.fields) claim(f.key, normaliseHeader(f.key));
  for (const f of definition.fields) for (const alias of f.aliases) claim(f.key, alias);

  const missingRequired = definition.fields.filter((f) => f.required && fields[f.key] === undefined).map((f) => f.key);
  for (const group of definition.requiredOneOf) {
    if (group.every((k) => fields[k] === undefined)) missingRequired.push(group.join(' or '));
  }
  return { fields, unmatchedHeaders: headers.filter((h) => !used.has(h)), missingRequired };
}
