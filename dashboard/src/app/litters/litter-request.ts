import type { Litter } from '@shared/contracts/litters';
import { formatWeight, type UnitSetting } from '@shared/units/weight';
import type { LitterChange, NewLitter } from './litters-api';

export interface LitterFormValue {
  code: string;
  sireEarId: string;
  damEarId: string;
  bredOn: string;
  kindledOn: string;
  bornAlive: number | null;
  bornDead: number | null;
  weaned: number | null;
  weight21d: string;
  notes: string;
}

const orNull = (text: string) => (text.trim() === '' ? null : text.trim());

/** The form's start: empty, or the litter as recorded (its weight written in the user's unit). */
export function litterFormValue(l: Litter | null, unit: UnitSetting): LitterFormValue {
  return {
    code: l?.code ?? '',
    sireEarId: l?.sireEarId ?? '',
    damEarId: l?.damEarId ?? '',
    bredOn: l?.bredOn ?? '',
    kindledOn: l?.kindledOn ?? '',
    bornAlive: l?.bornAlive ?? null,
    bornDead: l?.bornDead ?? null,
    weaned: l?.weaned ?? null,
    weight21d: l?.weight21dGrams ? formatWeight(l.weight21dGrams, unit) : '',
    notes: l?.notes ?? '',
  };
}

/** A new litter; a code left empty is made by the API from the dam and date. O(fields). */
export function newLitterRequest(v: LitterFormValue): NewLitter {
  return {
    ...(orNull(v.code) ? { code: v.code.trim() } : {}),
    sireEarId: orNull(v.sireEarId),
    damEarId: orNull(v.damEarId),
    bredOn: orNull(v.bredOn),
    kindledOn: orNull(v.kindledOn),
    bornAlive: v.bornAlive,
    bornDead: v.bornDead,
    weaned: v.weaned,
    weight21d: orNull(v.weight21d),
    notes: orNull(v.notes),
  };
}

/**
 * Only the fields changed since the form opened; the weight is sent only when its text changed,
 * so a rounded "2 lb 8 oz" never overwrites the grams recorded. O(fields).
 */
export function litterChange(v: LitterFormValue, before: Litter, unit: UnitSetting): LitterChange {
  const was = litterFormValue(before, unit);
  const next = newLitterRequest(v);
  const change: Record<string, unknown> = {};
  for (const key of Object.keys(was) as (keyof LitterFormValue)[]) {
    const norm = (x: unknown) => (typeof x === 'string' ? x.trim() : x);
    if (norm(v[key]) === norm(was[key])) continue;
    change[key] = key === 'code' ? v.code.trim() : next[key as keyof NewLitter] ?? null;
  }
  return change as LitterChange;
}
