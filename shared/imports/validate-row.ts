import { type Award, AWARDS } from '../domain/awards';
import { daysBetween } from '../domain/calendar-date';
import { GESTATION_DAYS } from '../domain/gestation';
import type { AgeClass, AnimalStatus, Sex } from '../domain/terms';
import { formatWeight, parseWeight } from '../units/weight';
import { type ImportField, importKind, type ImportKindDefinition, type ImportKindKey } from './import-kinds';
import type { ImportContext, ImportRecords, RowIssue, RowValidation } from './import-records';
import { parseDate } from './parse-date';

const AWARD_SEPARATORS = /[\s,|;]+/;
const YES = new Set(['yes', 'y', 'true', '1', 'x']);
const NO = new Set(['no', 'n', 'false', '0']);

/** Reads the cells of one mapped row by field type, collecting errors against the field. */
class RowReader {
  readonly errors: RowIssue[] = [];
  readonly warnings: RowIssue[] = [];
  private readonly fields: Map<string, ImportField>;

  constructor(
    private readonly row: Readonly<Record<string, string | undefined>>,
    private readonly ctx: ImportContext,
    definition: ImportKindDefinition,
  ) {
    this.fields = new Map(definition.fields.map((f) => [f.key, f]));
  }

  field(key: string): ImportField {
    const f = this.fields.get(key);
    if (!f) throw new Error(`validateRow has no field ${key}`);
    return f;
  }

  error(field: string, message: string): null {
    this.errors.push({ field, message });
    return null;
  }

  warn(field: string, message: string): void {
    this.warnings.push({ field, message });
  }

  /** The trimmed cell, or null when empty (an error when the field is required). */
  raw(key: string): string | null {
    const f = this.field(key);
    const cell = (this.row[key] ?? '').trim();
    if (cell === '') return f.required ? this.error(key, `${f.label} is missing`) : null;
    return cell;
  }

  text(key: string): string | null {
    const cell = this.raw(key);
    if (cell === null) return null;
    const max = this.field(key).maxLength;
    if (max !== undefined && cell.length > max) return this.error(key, `${this.field(key).label} is longer than ${max} characters`);
    return cell;
  }

  /** Ear IDs are compared without case or inner spacing, so they are stored upper-case. */
  earId(key: string): string | null {
    return this.text(key)?.replace(/\s+/g, ' ').toUpperCase() ?? null;
  }

  date(key: string): string | null {
    const cell = this.raw(key);
    if (cell === null) return null;
    const parsed = parseDate(cell, this.ctx.dateOrder);
    if (!parsed.ok) return this.error(key, parsed.message);
    if (parsed.date > this.ctx.today) return this.error(key, `date ${parsed.date} is in the future`);
    return parsed.date;
  }

  int(key: string, min = 0): number | null {
    const cell = this.raw(key);
    if (cell === null) return null;
    const label = this.field(key).label;
    if (!/^-?\d+$/.test(cell)) return this.error(key, `${label} "${cell}" is not a whole number`);
    const n = Number(cell);
    if (n < min) return this.error(key, min === 0 ? `${label} cannot be negative` : `${label} must be at least ${min}`);
    return n;
  }

  weight(key: string): number | null {
    const cell = this.raw(key);
    if (cell === null) return null;
    const parsed = parseWeight(cell, this.ctx.unitSetting);
    return parsed.ok ? parsed.grams : this.error(key, `weight is not understood: ${parsed.message}`);
  }

  grams(key: string): number | null {
    const cell = this.raw(key);
    if (cell === null) return null;
    if (!/^\d+$/.test(cell) || Number(cell) === 0) {
      return this.error(key, `${this.field(key).label} "${cell}" must be a whole number of grams above zero`);
    }
    return Number(cell);
  }

  enumValue<T extends string>(key: string): T | null {
    const cell = this.raw(key);
    if (cell === null) return null;
    const f = this.field(key);
    const lower = cell.toLowerCase();
    const value = f.values?.includes(lower) ? lower : f.valueAliases?.[lower];
    if (value) return value as T;
    const others = f.valueAliases ? ` (also ${Object.keys(f.valueAliases).join(', ')})` : '';
    return this.error(key, `${f.label} "${cell}" is not understood: use ${f.values?.join(', ')}${others}`);
  }

  bool(key: string): boolean | null {
    const cell = this.raw(key);
    if (cell === null) return null;
    const lower = cell.toLowerCase();
    if (YES.has(lower)) return true;
    if (NO.has(lower)) return false;
    this.error(key, `${this.field(key).label} "${cell}" is not understood: use yes or no`);
    return null;
  }

  awards(key: string): Award[] {
    const cell = this.raw(key);
    if (cell === null) return [];
    const found: Award[] = [];
    for (const token of cell.split(AWARD_SEPARATORS).filter(Boolean)) {
      const award = token.toUpperCase() as Award;
      if (!AWARDS.includes(award)) {
        this.error(key, `award "${token}" is not understood: use ${AWARDS.join(', ')}`);
      } else if (!found.includes(award)) {
        found.push(award);
      }
    }
    return found;
  }

  score(key: string): number | null {
    const cell = this.raw(key);
    if (cell === null) return null;
    const f = this.field(key);
    if (!/^\d+(\.\d+)?$/.test(cell)) return this.error(key, `${f.label}: score "${cell}" is not a number from 0 up`);
    const n = Number(cell);
    if (f.points !== undefined && n > f.points) {
      return this.error(key, `${f.label}: score ${n} is more than the trait's ${f.points} points`);
    }
    return n;
  }

  result<T>(build: () => T): RowValidation<T> {
    return this.errors.length > 0
      ? { errors: this.errors, warnings: this.warnings }
      : { value: build(), errors: this.errors, warnings: this.warnings };
  }
}

type Validators = { [K in ImportKindKey]: (r: RowReader, ctx: ImportContext) => RowValidation<ImportRecords[K]> };

function differentAnimals(r: RowReader, self: string | null, sire: string | null, dam: string | null): void {
  if (self && sire === self) r.error('sire_ear_id', `the sire cannot be the animal itself (${self})`);
  if (self && dam === self) r.error('dam_ear_id', `the dam cannot be the animal itself (${self})`);
  if (sire && sire === dam) r.error('dam_ear_id', `sire and dam are the same ear ID (${sire})`);
}

const validators: Validators = {
  animals(r) {
    const earId = r.earId('ear_id');
    const sex = r.enumValue<Sex>('sex');
    const breed = r.text('breed');
    const sireEarId = r.earId('sire_ear_id');
    const damEarId = r.earId('dam_ear_id');
    differentAnimals(r, earId, sireEarId, damEarId);
    const rec = {
      name: r.text('name'),
      variety: r.text('variety'),
      born: r.date('born'),
      line: r.text('line'),
      status: r.enumValue<AnimalStatus>('status'),
      registrationNo: r.text('registration_no'),
      grandChampion: r.bool('grand_champion'),
      breeder: r.text('breeder'),
      weightGrams: r.weight('weight'),
      litterCode: r.text('litter_code'),
      outside: r.bool('outside') ?? false,
      notes: r.text('notes'),
    };
    return r.result(() => ({ earId: earId!, sex: sex!, breed: breed!, sireEarId, damEarId, ...rec }));
  },

  weights(r) {
    const earId = r.earId('ear_id');
    const weighedOn = r.date('weighed_on');
    const fromText = r.weight('weight');
    const fromGrams = r.grams('weight_g');
    const notes = r.text('notes');
    if (fromText === null && fromGrams === null && r.errors.every((e) => e.field !== 'weight' && e.field !== 'weight_g')) {
      r.error('weight', 'weight is missing (write it with its unit, e.g. "5 lb 12 oz", or give weight_g in grams)');
    }
    // The two columns may round differently (an ounce is 28.3 g), so only a clear difference is an error.
    if (fromText !== null && fromGrams !== null && Math.abs(fromText - fromGrams) > 15) {
      r.error('weight_g', `weight ${formatWeight(fromText, 'lb-oz')} (${fromText} g) and weight_g ${fromGrams} g disagree`);
    }
    return r.result(() => ({ earId: earId!, weighedOn: weighedOn!, grams: (fromGrams ?? fromText)!, notes }));
  },

  litters(r) {
    const litterCode = r.text('litter_code');
    const sireEarId = r.earId('sire_ear_id');
    const damEarId = r.earId('dam_ear_id');
    differentAnimals(r, null, sireEarId, damEarId);
    const bredOn = r.date('bred_on');
    const kindledOn = r.date('kindled_on');
    const bornAlive = r.int('born_alive');
    const bornDead = r.int('born_dead');
    const weaned = r.int('weaned');
    const weight21dGrams = r.weight('weight_21d');
    const notes = r.text('notes');
    if (bredOn && kindledOn) {
      const days = daysBetween(bredOn, kindledOn);
      if (days < 0) {
        r.error('kindled_on', `kindled on ${kindledOn}, before the bred date ${bredOn}`);
      } else if (days < GESTATION_DAYS.earliest || days > GESTATION_DAYS.latest) {
        r.warn('kindled_on', `kindled ${days} days after breeding; ${GESTATION_DAYS.earliest}–${GESTATION_DAYS.latest} days is usual — check both dates`);
      }
    }
    if (weaned !== null && bornAlive !== null && weaned > bornAlive) {
      r.error('weaned', `weaned ${weaned} is more than the ${bornAlive} born alive`);
    }
    if (weight21dGrams !== null && bornAlive === 0) {
      r.error('weight_21d', 'a 21-day litter weight is given for a litter with none born alive');
    }
    return r.result(() => ({
      litterCode: litterCode!, sireEarId: sireEarId!, damEarId: damEarId!, bredOn, kindledOn, bornAlive, bornDead, weaned, weight21dGrams, notes,
    }));
  },

  evaluations(r, ctx) {
    const earId = r.earId('ear_id');
    const evaluatedOn = r.date('evaluated_on');
    const evaluator = r.text('evaluator');
    const notes = r.text('notes');
    const scores: Record<string, number> = {};
    const traitKeys = importKind('evaluations', ctx.traits).requiredOneOf[0]!;
    for (const key of traitKeys) {
      const s = r.score(key);
      if (s !== null) scores[key] = s;
    }
    if (Object.keys(scores).length === 0 && r.errors.every((e) => !traitKeys.includes(e.field))) {
      r.error(traitKeys[0]!, 'no trait is scored: give at least one score');
    }
    return r.result(() => ({ earId: earId!, evaluatedOn: evaluatedOn!, evaluator, scores, notes }));
  },

  results(r) {
    const rec = {
      showName: r.text('show_name'),
      showDate: r.date('show_date'),
      location: r.text('location'),
      judge: r.text('judge'),
      sanctionNo: r.text('sanction_no'),
      earId: r.earId('ear_id'),
      exhibitor: r.text('exhibitor'),
      breed: r.text('breed'),
      variety: r.text('variety'),
      sex: r.enumValue<Sex>('sex'),
      ageClass: r.enumValue<AgeClass>('age_class'),
      entriesInClass: r.int('entries_in_class', 1),
      exhibitorsInClass: r.int('exhibitors_in_class', 1),
      placing: r.int('placing', 1),
      awards: r.awards('awards'),
    };
    const { placing, entriesInClass: entries, exhibitorsInClass: exhibitors, awards } = rec;
    if (placing !== null && entries !== null && placing > entries) {
      r.error('placing', `placing ${placing} is greater than the ${entries} entries in the class`);
    }
    if (exhibitors !== null && entries !== null && exhibitors > entries) {
      r.error('exhibitors_in_class', `${exhibitors} exhibitors is more than the ${entries} entries in the class`);
    }
    if (awards.includes('BOV') && awards.includes('BOSV')) r.error('awards', 'one animal cannot be both BOV and BOSV');
    if (awards.includes('BOB') && awards.includes('BOSB')) r.error('awards', 'one animal cannot be both BOB and BOSB');
    if (awards.length > 0 && placing !== null && placing !== 1) {
      r.error('awards', `awards above the class go to class winners, but this animal placed ${placing}`);
    }
    return r.result(() => ({
      ...rec,
      showName: rec.showName!, showDate: rec.showDate!, judge: rec.judge!, exhibitor: rec.exhibitor!, breed: rec.breed!,
      sex: rec.sex!, ageClass: rec.ageClass!, entriesInClass: entries!, exhibitorsInClass: exhibitors!, placing: placing!,
    }));
  },
};

/**
 * Checks one mapped row of an import file (field key → cell text) and turns it into a typed
 * record. Every problem is reported against its field in words a breeder understands;
 * `value` is present only when there are no errors. Warnings (such as an unusual gestation
 * length, 29–35 days being usual, common practice, no source) do not stop the row.
 * Cost O(number of fields). Throws only on a programming error (unknown field key).
 */
export function validateRow<K extends ImportKindKey>(
  kind: K,
  mappedRow: Readonly<Record<string, string | undefined>>,
  ctx: ImportContext,
): RowValidation<ImportRecords[K]> {
  const reader = new RowReader(mappedRow, ctx, importKind(kind, ctx.traits));
  return validators[kind](reader, ctx);
}
