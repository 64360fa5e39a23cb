import { CreateBreedRequest, type BreedRecord } from '@shared/contracts/breeds';
import type { WeightLimits } from '@shared/domain/breed';
import { AGE_CLASSES, type AgeClass, type ClassScheme, type Sex, SEXES } from '@shared/domain/terms';
import { formatWeight, parseWeight, type UnitSetting } from '@shared/units/weight';
import type { BreedChange } from './breeds-api';

export const LIMIT_KEYS = ['minGrams', 'idealGrams', 'maxGrams'] as const;
export type LimitKey = (typeof LIMIT_KEYS)[number];
export type LimitTexts = Record<LimitKey, string>;

export interface TraitValue {
  /** Kept for traits already scored (evaluations refer to it); made from the label for new ones. */
  key: string;
  label: string;
  points: number | null;
}

export interface BreedFormValue {
  name: string;
  classScheme: ClassScheme;
  varieties: string[];
  /** Limits as the admin types them, in their own unit; '' for "none". */
  limits: Record<Sex, Record<AgeClass, LimitTexts>>;
  traits: TraitValue[];
  source: string;
}

const emptyLimits = (): LimitTexts => ({ minGrams: '', idealGrams: '', maxGrams: '' });

/** A trait's key from its label: "Ears & crown" → "ears_crown". */
export function traitKeyOf(label: string): string {
  const key = label.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toLowerCase().replace(/[^a-z0-9]+/g, '_').replace(/^_+|_+$/g, '');
  return /^[a-z]/.test(key) ? key : `trait_${key || 'x'}`;
}

/** The editor's start: a stored breed with its weights written in the admin's unit, or a blank one. O(1). */
export function breedFormValue(b: BreedRecord | null, unit: UnitSetting): BreedFormValue {
  const limits = {} as BreedFormValue['limits'];
  for (const sex of SEXES) {
    limits[sex] = {} as Record<AgeClass, LimitTexts>;
    for (const c of AGE_CLASSES) {
      const stored = b?.weightLimits[sex][c] ?? null;
      limits[sex][c] = stored
        ? { minGrams: text(stored.minGrams, unit), idealGrams: text(stored.idealGrams, unit), maxGrams: text(stored.maxGrams, unit) }
        : emptyLimits();
    }
  }
  return {
    name: b?.name ?? '',
    classScheme: b?.classScheme ?? 'four-class',
    varieties: [...(b?.varieties ?? [])],
    limits,
    traits: (b?.evaluationTemplate.traits ?? []).map((t) => ({ ...t })),
    source: b?.source ?? 'From memory — check against the current official standard',
  };
}

function text(grams: number | null, unit: UnitSetting): string {
  return grams === null ? '' : formatWeight(grams, unit);
}

export type BreedFormResult = { ok: true; breed: BreedChange } | { ok: false; errors: Record<string, string> };

/**
 * The breed to send, or each problem keyed by its field path ("limits.doe.senior.maxGrams",
 * "traits.2.points", "name"…). Weights are read with the API's parser in the admin's unit; the
 * whole breed is then checked with the catalogue's own schema (limits in order, unique traits,
 * intermediate only for six-class breeds). A weight that round-trips to the stored grams keeps
 * the stored grams, so opening and saving changes nothing. Cost O(limits + traits).
 */
export function breedFromForm(v: BreedFormValue, unit: UnitSetting, before: BreedRecord | null = null): BreedFormResult {
  const errors: Record<string, string> = {};
  const classes = v.classScheme === 'six-class' ? AGE_CLASSES : (['junior', 'senior'] as const);
  const weightLimits = {} as BreedChange['weightLimits'];
  for (const sex of SEXES) {
    const perClass: Record<string, WeightLimits | null> = { intermediate: null };
    for (const c of classes) {
      const stored = before?.weightLimits[sex][c] ?? null;
      const limits: WeightLimits = { minGrams: null, idealGrams: null, maxGrams: null, ...(stored?.source ? { source: stored.source } : {}) };
      for (const k of LIMIT_KEYS) {
        const typed = v.limits[sex][c][k].trim();
        if (typed === '') continue;
        if (stored?.[k] != null && typed === formatWeight(stored[k]!, unit)) {
          limits[k] = stored[k]!;
          continue;
        }
        const parsed = parseWeight(typed, unit);
        if (parsed.ok) limits[k] = parsed.grams;
        else errors[`limits.${sex}.${c}.${k}`] = parsed.message;
      }
      const [min, ideal, max] = [limits.minGrams, limits.idealGrams, limits.maxGrams];
      const ordered = [min, ideal, max].filter((g): g is number => g !== null);
      if (ordered.some((g, i) => i > 0 && g < ordered[i - 1]!)) errors[`limits.${sex}.${c}.maxGrams`] = 'Minimum ≤ ideal ≤ maximum';
      perClass[c] = limits;
    }
    weightLimits[sex] = perClass as BreedChange['weightLimits'][Sex];
  }
  const traits = v.traits.map((t, i) => {
    if (!t.label.trim()) errors[`traits.${i}.label`] = 'Name the trait';
    if (t.points === null || !Number.isInteger(t.points) || t.points < 1) errors[`traits.${i}.points`] = 'Whole points, at least 1';
    return { key: t.key || traitKeyOf(t.label), label: t.label.trim(), points: t.points ?? 0 };
  });
  const keys = traits.map((t) => t.key);
  keys.forEach((k, i) => {
    if (keys.indexOf(k) !== i) errors[`traits.${i}.label`] = 'Another trait has this name';
  });
  if (traits.length === 0) errors['traits'] = 'Add at least one trait to score';
  if (!v.name.trim()) errors['name'] = 'Name the breed';
  const lower = v.varieties.map((x) => x.trim().toLowerCase());
  if (new Set(lower).size !== lower.length) errors['varieties'] = 'Each variety once';

  const breed: BreedChange = {
    name: v.name.trim(),
    classScheme: v.classScheme,
    varieties: v.varieties.map((x) => x.trim()).filter(Boolean),
    weightLimits,
    evaluationTemplate: { traits, ...(before?.evaluationTemplate.source ? { source: before.evaluationTemplate.source } : {}) },
    ...(v.source.trim() ? { source: v.source.trim() } : {}),
  };
  if (Object.keys(errors).length) return { ok: false, errors };
  const checked = CreateBreedRequest.safeParse(breed);
  if (!checked.success) return { ok: false, errors: { form: checked.error.issues[0]?.message ?? 'Check the breed' } };
  return { ok: true, breed };
}

/** Points of all traits: the template's full score. */
export function templatePoints(traits: readonly TraitValue[]): number {
  return traits.reduce((s, t) => s + (t.points ?? 0), 0);
}
