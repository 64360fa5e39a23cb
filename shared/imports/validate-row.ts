import { type Award, AWARDS } from '../domain/awards';
import { DEFAULT_EVALUATION_TRAITS } from '../domain/breed';
import { daysBetween } from '../domain/calendar-date';
import { GESTATION_DAYS } from '../domain/gestation';
import type { AgeClass, AnimalStatus, Sex } from '../domain/terms';
import { formatWeight, parseWeight } from '../units/weight';
import { type ImportField, importKind, type ImportKindDefinition, type ImportKindKey } from './import-kinds';
import type { ImportContext, ImportRecords, RowIssue, RowValidation } from './import-records';
import { parseDate } from './parse-date';

const AWARD_SEPARATORS = /[\s,|;]+/;
const INNER_SPACE = /\s\s|[^\S ]/;
const WHOLE_NUMBER = /^-?\d+$/;

function toEnum(cell: string, f: ImportField): { value: string | null; error: string | null } {
  const lower = cell.toLowerCase();
  const value = f.values?.includes(lower) ? lower : f.valueAliases?.[lower];
  if (value) return { value, error: null };
  const others = f.valueAliases ? ` (also ${Object.keys(f.valueAliases).join(', ')})` : '';
  return { value: null, error: `${f.label} "${cell}" is not understood: use ${f.values?.join(', ')}${others}` };
}
const YES = new Set(['yes', 'y', 'true', '1', 'x']);
const NO = new Set(['no', 'n', 'false', '0']);

/** A field's place in the row and the last cell it converted (cells repeat down a column). */
interface Slot {
  field: ImportField;
  column: number;
  lastCell: string | null;
  lastOutcome: { value: unknown; error: string | null } | null;
}

/** Shared by every row without issues, so that a clean row allocates no arrays. Never mutated. */
const NO_ISSUES: RowIssue[] = Object.freeze([]) as unknown as RowIssue[];

/**
 * Reads the cells of one row by field type, collecting errors against the field. Built once
 * per definition, context and column layout, then pointed at each row in turn: the field
 * lookup is made once, not per row.
 */
class RowReader {
  errors: RowIssue[] = NO_ISSUES;
  warnings: RowIssue[] = NO_ISSUES;
  private cells: readonly (string | undefined)[] = [];
  private readonly slots = new Map<string, Slot>();
  /** Mapped columns whose key is no field of the definition (traits of another breed's template), with their column. */
  readonly foreignColumns: [key: string, column: number][] = [];

  constructor(
    readonly definition: ImportKindDefinition,
    private readonly ctx: ImportContext,
    columns: ColumnIndex,
  ) {
    for (const f of definition.fields) this.slots.set(f.key, { field: f, column: columns[f.key] ?? -1, lastCell: null, lastOutcome: null });
    for (const [key, column] of Object.entries(columns)) if (!this.slots.has(key)) this.foreignColumns.push([key, column]);
  }

  start(cells: readonly (string | undefined)[]): void {
    this.cells = cells;
    this.errors = NO_ISSUES;
    this.warnings = NO_ISSUES;
  }

  /** The foreign columns this row fills. */
  filledForeignKeys(): string[] {
    return this.foreignColumns.filter(([, i]) => (this.cells[i] ?? '').trim() !== '').map(([key]) => key);
  }

  private slot(key: string): Slot {
    const s = this.slots.get(key);
    if (!s) throw new Error(`validateRow has no field ${key}`);
    return s;
  }

  field(key: string): ImportField {
    return this.slot(key).field;
  }

  error(field: string, message: string): null {
    if (this.errors === NO_ISSUES) this.errors = [];
    this.errors.push({ field, message });
    return null;
  }

  warn(field: string, message: string): void {
    if (this.warnings === NO_ISSUES) this.warnings = [];
    this.warnings.push({ field, message });
  }

  /** The trimmed cell, or null when empty (an error when the field is required). */
  raw(key: string): string | null {
    return this.cellOf(this.slot(key));
  }

  private cellOf(s: Slot): string | null {
    const cell = s.column < 0 ? '' : (this.cells[s.column] ?? '').trim();
    if (cell === '') return s.field.required ? this.error(s.field.key, `${s.field.label} is missing`) : null;
    return cell;
  }

  /**
   * A conversion that depends on the cell alone, remembered for the next row: dates, classes
   * and sexes repeat down a file, so most rows reuse the last outcome.
   */
  private converted<T>(key: string, convert: (cell: string, field: ImportField) => { value: T | null; error: string | null }): T | null {
    const s = this.slot(key);
    const cell = this.cellOf(s);
    if (cell === null) return null;
    if (s.lastCell !== cell || s.lastOutcome === null) {
      s.lastOutcome = convert(cell, s.field);
      s.lastCell = cell;
    }
    const { value, error } = s.lastOutcome;
    return error === null ? (value as T) : this.error(key, error);
  }

  text(key: string): string | null {
    const s = this.slot(key);
    const cell = this.cellOf(s);
    if (cell === null) return null;
    const max = s.field.maxLength;
    if (max !== undefined && cell.length > max) return this.error(key, `${s.field.label} is longer than ${max} characters`);
    return cell;
  }

  /** Ear IDs are compared without case or inner spacing, so they are stored upper-case. */
  earId(key: string): string | null {
    const cell = this.text(key);
    if (cell === null) return null;
    return (INNER_SPACE.test(cell) ? cell.replace(/\s+/g, ' ') : cell).toUpperCase();
  }

  date(key: string): string | null {
    return this.converted(key, this.toDate);
  }

  private readonly toDate = (cell: string) => {
    const parsed = parseDate(cell, this.ctx.dateOrder);
    if (!parsed.ok) return { value: null, error: parsed.message };
    if (parsed.date > this.ctx.today) return { value: null, error: `date ${parsed.date} is in the future` };
    return { value: parsed.date, error: null };
  };

  int(key: string, min = 0): number | null {
    const s = this.slot(key);
    const cell = this.cellOf(s);
    if (cell === null) return null;
    if (!WHOLE_NUMBER.test(cell)) return this.error(key, `${s.field.label} "${cell}" is not a whole number`);
    const n = Number(cell);
    if (n < min) return this.error(key, min === 0 ? `${s.field.label} cannot be negative` : `${s.field.label} must be at least ${min}`);
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
    return this.converted(key, toEnum) as T | null;
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
    return this.errors !== NO_ISSUES
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
    const traitKeys = r.definition.requiredOneOf[0]!;
    for (const key of traitKeys) {
      const s = r.score(key);
      if (s !== null) scores[key] = s;
    }
    for (const key of r.filledForeignKeys()) {
      const label = ctx.mappedTraits?.find((t) => t.key === key)?.label ?? key;
      const own = (ctx.traits ?? DEFAULT_EVALUATION_TRAITS).map((t) => t.label.toLowerCase()).join(', ');
      r.error(key, `${label} is not a trait of this animal's breed template (it scores ${own}): leave the cell empty`);
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
    // Without errors every required field is filled: the record is used as it stands (no copy per row).
    return r.result(() => rec as ImportRecords['results']);
  },
};

/** Where each field's cell sits in a row of the file: field key → column index. */
export type ColumnIndex = Readonly<Record<string, number>>;

/**
 * A checker for the rows of one file: built once for a kind, a context and the file's column
 * layout, then called with each row's cells. Each call checks one row and turns it into a
 * typed record; every problem is reported against its field in words a breeder understands;
 * `value` is present only when there are no errors. Warnings (such as an unusual gestation
 * length, 29–35 days being usual, common practice, no source) do not stop the row.
 * Building costs O(fields); a row O(fields). Throws only on a programming error (unknown field key).
 */
export function rowValidator<K extends ImportKindKey>(
  kind: K,
  ctx: ImportContext,
  columns: ColumnIndex,
): (cells: readonly (string | undefined)[]) => RowValidation<ImportRecords[K]> {
  const reader = new RowReader(importKind(kind, ctx.traits), ctx, columns);
  const validate = validators[kind] as (r: RowReader, ctx: ImportContext) => RowValidation<ImportRecords[K]>;
  return (cells) => {
    reader.start(cells);
    return validate(reader, ctx);
  };
}

/** Checks one mapped row (field key → cell text); see rowValidator. O(fields). */
export function validateRow<K extends ImportKindKey>(
  kind: K,
  mappedRow: Readonly<Record<string, string | undefined>>,
  ctx: ImportContext,
): RowValidation<ImportRecords[K]> {
  const keys = Object.keys(mappedRow);
  return rowValidator(kind, ctx, Object.fromEntries(keys.map((k, i) => [k, i])))(keys.map((k) => mappedRow[k]));
}
