import type { EvaluationTrait } from '@shared/domain/breed';
import { importKind, type ImportField, type ImportKindKey } from '@shared/imports/import-kinds';
import { suggestMapping } from '@shared/imports/suggest-mapping';

export interface MappingField {
  key: string;
  label: string;
  /** Required alone, or as one of a group of which one must be mapped. */
  required: boolean;
  group: string | null;
  /** A few words under the field: what its group asks for. */
  hint: string;
}

/** Evaluations: the trait columns the API offers for this herd (its breeds' templates); other kinds ignore it. */
type Traits = readonly EvaluationTrait[] | null | undefined;

/** The fields of a kind as the mapping step lists them, required ones first within the kind's order. O(fields). */
export function mappingFields(kind: ImportKindKey, traits?: Traits): MappingField[] {
  const definition = importKind(kind, traits ?? undefined);
  const grouped = new Map<string, { words: string; hint: string }>();
  for (const group of definition.requiredOneOf) {
    const fields = group.map((k) => definition.fields.find((f) => f.key === k));
    const words = group.map((k, i) => fields[i]?.label ?? k).join(' or ');
    // A template's trait scores make a long group: the hint says what it asks, not every name.
    const hint = fields.every((f) => f?.type === 'score') ? 'At least one score is needed.' : `One of: ${words}.`;
    for (const key of group) grouped.set(key, { words, hint });
  }
  return definition.fields.map((f: ImportField) => ({
    key: f.key,
    label: f.label,
    required: f.required || grouped.has(f.key),
    group: grouped.get(f.key)?.words ?? null,
    hint: grouped.get(f.key)?.hint ?? '',
  }));
}

/** The mapping as the API takes it: fields left on "not in this file" are left out. */
export function cleanMapping(mapping: Record<string, string | null | undefined>): Record<string, string> {
  return Object.fromEntries(Object.entries(mapping).filter((e): e is [string, string] => typeof e[1] === 'string' && e[1] !== ''));
}

/**
 * What still stops the check: required fields without a column, groups of which no field has
 * one, and columns chosen for two fields. In words for the breeder. O(fields).
 */
export function mappingProblems(kind: ImportKindKey, mapping: Record<string, string>, traits?: Traits): string[] {
  const definition = importKind(kind, traits ?? undefined);
  const problems: string[] = [];
  for (const f of definition.fields) {
    if (f.required && !mapping[f.key]) problems.push(`Choose the column for ${f.label}`);
  }
  for (const group of definition.requiredOneOf) {
    if (group.every((k) => !mapping[k])) {
      const words = group.map((k) => definition.fields.find((f) => f.key === k)?.label ?? k).join(' or ');
      problems.push(`Choose a column for ${words}`);
    }
  }
  const byHeader = new Map<string, string[]>();
  for (const [key, header] of Object.entries(mapping)) byHeader.set(header, [...(byHeader.get(header) ?? []), key]);
  for (const [header, keys] of byHeader) {
    if (keys.length > 1) {
      const labels = keys.map((k) => definition.fields.find((f) => f.key === k)?.label ?? k);
      problems.push(`Column “${header}” is chosen for ${labels.join(' and ')}`);
    }
  }
  return problems;
}

/** Headers of the file no field uses (they are not imported). */
export function unusedHeaders(headers: readonly string[], mapping: Record<string, string>): string[] {
  const used = new Set(Object.values(mapping));
  return headers.filter((h) => h !== '' && !used.has(h));
}

/** A field key's label for the problems table ("" for a problem of the whole row). */
export function fieldLabel(kind: ImportKindKey, key: string, traits?: Traits): string {
  if (!key) return 'whole row';
  return importKind(kind, traits ?? undefined).fields.find((f) => f.key === key)?.label ?? key;
}

/**
 * The kind a file's headers fit, when it is not the one chosen: the kind whose required fields
 * all find a header and that matches the most headers (the same matching as suggestMapping).
 * null when the chosen kind fits or nothing fits better. Cost O(kinds × (fields × aliases + headers)).
 */
export function betterKind(headers: readonly string[], chosen: ImportKindKey, kinds: readonly ImportKindKey[]): ImportKindKey | null {
  const fit = (kind: ImportKindKey) => {
    const s = suggestMapping(kind, headers);
    return { kind, complete: s.missingRequired.length === 0, matched: Object.keys(s.fields).length };
  };
  if (fit(chosen).complete) return null;
  const best = kinds.filter((k) => k !== chosen).map(fit).filter((f) => f.complete).sort((a, b) => b.matched - a.matched)[0];
  return best?.kind ?? null;
}
