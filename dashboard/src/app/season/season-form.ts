import { DEFAULT_POINTS_FORMULA, PointsFormula, SeasonSettingsRequest } from '@shared/contracts/analytics';
import { AWARD_LABELS, AWARDS, type Award } from '@shared/domain/awards';

export type FormulaKind = 'default' | PointsFormula['kind'];

/** The season form as the breeder fills it in: numbers may be empty while typing. */
export interface SeasonFormValue {
  seasonStart: string;
  seasonEnd: string;
  kind: FormulaKind;
  /** Points of 1st, 2nd, … place: multipliers of the class size, or flat points. */
  places: (number | null)[];
  bonuses: Record<Award, number | null>;
}

const noBonuses = (): Record<Award, number | null> => Object.fromEntries(AWARDS.map((a) => [a, null])) as Record<Award, number | null>;

/** The form filled from the club's settings; a null formula is the default. O(places). */
export function seasonFormFrom(season: { seasonStart: string | null; seasonEnd: string | null }, formula: PointsFormula | null): SeasonFormValue {
  const shown = formula ?? DEFAULT_POINTS_FORMULA;
  const places = shown.kind === 'multiplied' ? shown.base : shown.table;
  return {
    seasonStart: season.seasonStart ?? '',
    seasonEnd: season.seasonEnd ?? '',
    kind: formula === null ? 'default' : formula.kind,
    places: [...places],
    bonuses: { ...noBonuses(), ...(shown.bonuses ?? {}) },
  };
}

export interface SeasonFormCheck {
  /** The request to send, when every field is right. */
  request: SeasonSettingsRequest | null;
  /** Messages by field: seasonStart, seasonEnd, places, places.2, bonuses.BOV. */
  errors: Record<string, string>;
}

const ordinal = (n: number) => `${n}${n % 10 === 1 && n % 100 !== 11 ? 'st' : n % 10 === 2 && n % 100 !== 12 ? 'nd' : n % 10 === 3 && n % 100 !== 13 ? 'rd' : 'th'}`;

/**
 * Checks the form with the API's own schema (SeasonSettingsRequest), so the page refuses exactly
 * what the API would, and files each message under the field it is about. Empty place points
 * are errors; empty bonuses are left out; the default formula is sent as null. O(fields).
 */
export function checkSeasonForm(value: SeasonFormValue): SeasonFormCheck {
  const errors: Record<string, string> = {};
  const file = (field: string, message: string) => void (errors[field] ??= message);
  // Dates and formula are checked apart, so the order of the dates is judged even while a place is empty.
  const dates = SeasonSettingsRequest.safeParse({ seasonStart: value.seasonStart, seasonEnd: value.seasonEnd, pointsFormula: null });
  if (!dates.success) for (const issue of dates.error.issues) file(String(issue.path[0] ?? 'form'), issue.message);

  let formula: PointsFormula | null = null;
  if (value.kind !== 'default') {
    const bonuses = Object.fromEntries(AWARDS.filter((a) => value.bonuses[a] !== null).map((a) => [a, value.bonuses[a]]));
    const points = value.kind === 'flat' ? { table: value.places } : { base: value.places };
    const parsed = PointsFormula.safeParse({ kind: value.kind, ...points, ...(Object.keys(bonuses).length ? { bonuses } : {}) });
    if (parsed.success) formula = parsed.data;
    else {
      for (const issue of parsed.error.issues) {
        const [part, key] = issue.path;
        if ((part === 'base' || part === 'table') && typeof key === 'number') {
          file(`places.${key}`, value.places[key] === null ? `Give the points for ${ordinal(key + 1)} place` : issue.message);
        } else if (part === 'base' || part === 'table') {
          file('places', issue.code === 'too_small' ? 'Give points for at least 1st place' : 'At most 20 places earn points');
        } else if (part === 'bonuses' && typeof key === 'string') {
          file(`bonuses.${key}`, issue.message);
        } else file('form', issue.message);
      }
    }
  }
  if (Object.keys(errors).length > 0 || !dates.success) return { request: null, errors };
  return { request: { ...dates.data, pointsFormula: formula }, errors };
}

/**
 * A points formula in words, one line per place and per bonus:
 * "1st: 6 × animals in the class", "Best of breed: + 10". O(places).
 */
export function describeFormula(formula: PointsFormula): string[] {
  const places = formula.kind === 'multiplied'
    ? formula.base.map((p, i) => `${ordinal(i + 1)}: ${p} × animals in the class`)
    : formula.table.map((p, i) => `${ordinal(i + 1)}: ${p} points`);
  const bonuses = AWARDS.filter((a) => formula.bonuses?.[a] !== undefined).map((a) => `${AWARD_LABELS[a]}: + ${formula.bonuses![a]}`);
  return [...places, ...bonuses];
}

/**
 * A points formula in one short phrase: "6/4/3/2/1 × animals in the class",
 * "flat 10/7/5 points, + 15 for best of breed". O(places).
 */
export function formulaSummary(formula: PointsFormula): string {
  const base = formula.kind === 'multiplied' ? `${formula.base.join('/')} × animals in the class` : `flat ${formula.table.join('/')} points`;
  const bonuses = AWARDS.filter((a) => formula.bonuses?.[a] !== undefined).map((a) => `+ ${formula.bonuses![a]} for ${AWARD_LABELS[a].toLowerCase()}`);
  return [base, ...bonuses].join(', ');
}

export { ordinal };
