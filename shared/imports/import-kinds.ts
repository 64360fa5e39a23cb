import { AWARDS } from '../domain/awards';
import { DEFAULT_EVALUATION_TRAITS, type EvaluationTrait } from '../domain/breed';
import { AGE_CLASSES, ANIMAL_STATUSES, EAR_ID_MAX_LENGTH, SEXES } from '../domain/terms';

/**
 * Keeperline's own CSV import formats, as data: the columns of each kind with the header names a
 * show secretary or breeder might use instead (for suggesting a mapping). Header names and aliases
 * are kept in normalised form (see normaliseHeader).
 */
export const IMPORT_KIND_KEYS = ['animals', 'weights', 'litters', 'evaluations', 'results'] as const;
export type ImportKindKey = (typeof IMPORT_KIND_KEYS)[number];

export type FieldType = 'text' | 'date' | 'int' | 'weight' | 'grams' | 'enum' | 'boolean' | 'awards' | 'score';

export interface ImportField {
  /** The canonical column header, also the key of a mapped row. */
  key: string;
  label: string;
  required: boolean;
  type: FieldType;
  /** Other header names, normalised (lower case, single spaces). */
  aliases: string[];
  /** enum: the values stored. */
  values?: readonly string[];
  /** enum: other spellings accepted for a value, lower case → value. */
  valueAliases?: Record<string, string>;
  /** text: longest value accepted. */
  maxLength?: number;
  /** score: the trait's points (the highest score). */
  points?: number;
}

export interface ImportKindDefinition {
  key: ImportKindKey;
  label: string;
  fields: ImportField[];
  /** Groups of fields of which at least one must be mapped (e.g. weight or weight_g). */
  requiredOneOf: string[][];
}

/**
 * Lower case, '#' read as "no", runs of spaces, underscores, hyphens, dots and slashes made one
 * space, other punctuation dropped: "Ear_ID", "ear-id " and "Ear ID" all become "ear id".
 * O(length).
 */
export function normaliseHeader(header: string): string {
  return header
    .toLowerCase()
    .replace(/#/g, ' no ')
    .replace(/[_\-./\\]+/g, ' ')
    .replace(/[^\p{L}\p{N}&\s]/gu, '')
    .replace(/\s+/g, ' ')
    .trim();
}

const text = (key: string, label: string, aliases: string[], maxLength = 120, required = false): ImportField => ({
  key, label, required, type: 'text', aliases, maxLength,
});
const earId = (key: string, label: string, aliases: string[], required = false) =>
  text(key, label, aliases, EAR_ID_MAX_LENGTH, required);
const date = (key: string, label: string, aliases: string[], required = false): ImportField => ({
  key, label, required, type: 'date', aliases,
});
const int = (key: string, label: string, aliases: string[], required = false): ImportField => ({
  key, label, required, type: 'int', aliases,
});
const yesNo = (key: string, label: string, aliases: string[]): ImportField => ({
  key, label, required: false, type: 'boolean', aliases,
});
const notes = text('notes', 'Notes', ['note', 'comments', 'comment', 'remarks'], 2000);

export const SEX_FIELD: ImportField = {
  key: 'sex',
  label: 'Sex',
  required: true,
  type: 'enum',
  aliases: ['gender', 'buck doe', 'b d'],
  values: SEXES,
  valueAliases: { b: 'buck', m: 'buck', male: 'buck', d: 'doe', f: 'doe', female: 'doe', bucks: 'buck', does: 'doe' },
};

const animals: ImportKindDefinition = {
  key: 'animals',
  label: 'Animals and pedigrees',
  requiredOneOf: [],
  fields: [
    earId('ear_id', 'Ear ID (tattoo)', ['ear', 'tattoo', 'ear tattoo', 'ear no', 'tattoo no', 'id', 'animal id'], true),
    text('name', 'Name', ['animal name', 'call name']),
    SEX_FIELD,
    text('breed', 'Breed', ['breed name'], 80, true),
    text('variety', 'Variety', ['colour', 'color', 'var', 'colour variety', 'color variety']),
    date('born', 'Born', ['birth date', 'birthdate', 'date of birth', 'dob', 'birthday', 'kindled', 'born on']),
    earId('sire_ear_id', 'Sire ear ID', ['sire', 'sire id', 'sire ear', 'sire tattoo', 'father']),
    earId('dam_ear_id', 'Dam ear ID', ['dam', 'dam id', 'dam ear', 'dam tattoo', 'mother']),
    text('line', 'Line', ['line name', 'bloodline', 'strain']),
    {
      key: 'status',
      label: 'Status',
      required: false,
      type: 'enum',
      aliases: ['state'],
      values: ANIMAL_STATUSES,
      valueAliases: { alive: 'active', herd: 'active', kept: 'active', dead: 'deceased', died: 'deceased', cull: 'culled' },
    },
    text('registration_no', 'Registration number', ['registration', 'reg', 'reg no', 'registration number', 'registered']),
    yesNo('grand_champion', 'Grand champion', ['gc', 'grand', 'grand champion no']),
    text('breeder', 'Breeder (bred outside the herd)', ['bred by', 'breeder name', 'origin']),
    { key: 'weight', label: 'Latest weight', required: false, type: 'weight', aliases: ['latest weight', 'wt', 'adult weight'] },
    text('litter_code', 'Litter code', ['litter', 'litter id', 'litter no'], 40),
    yesNo('outside', 'Outside stub (parent not in the herd)', ['stub', 'outside parent', 'not in herd', 'external']),
    notes,
  ],
};

const weights: ImportKindDefinition = {
  key: 'weights',
  label: 'Weights',
  requiredOneOf: [['weight', 'weight_g']],
  fields: [
    earId('ear_id', 'Ear ID (tattoo)', ['ear', 'tattoo', 'ear tattoo', 'ear no', 'id', 'animal id'], true),
    date('weighed_on', 'Weighed on', ['date', 'weigh date', 'weight date', 'weighed', 'date weighed'], true),
    { key: 'weight', label: 'Weight (with unit)', required: false, type: 'weight', aliases: ['wt', 'weight lb oz', 'weight kg'] },
    { key: 'weight_g', label: 'Weight in grams', required: false, type: 'grams', aliases: ['grams', 'weight grams', 'weight in grams', 'g'] },
    notes,
  ],
};

const litters: ImportKindDefinition = {
  key: 'litters',
  label: 'Litters',
  requiredOneOf: [],
  fields: [
    text('litter_code', 'Litter code', ['litter', 'litter id', 'litter no', 'code'], 40, true),
    earId('sire_ear_id', 'Sire ear ID', ['sire', 'buck', 'sire id', 'sire tattoo'], true),
    earId('dam_ear_id', 'Dam ear ID', ['dam', 'doe', 'dam id', 'dam tattoo'], true),
    date('bred_on', 'Bred on', ['bred', 'bred date', 'date bred', 'mated', 'mating date', 'service date']),
    date('kindled_on', 'Kindled on', ['kindled', 'kindle date', 'date kindled', 'kindling date', 'born', 'birth date']),
    int('born_alive', 'Born alive', ['alive', 'live', 'born live', 'liveborn', 'number born alive']),
    int('born_dead', 'Born dead', ['dead', 'stillborn', 'number born dead']),
    int('weaned', 'Weaned', ['number weaned', 'weaned count', 'raised']),
    { key: 'weight_21d', label: 'Litter weight at 21 days', required: false, type: 'weight', aliases: ['21 day weight', '21d weight', 'litter weight 21d', 'litter weight', 'weight 21 days'] },
    notes,
  ],
};

/** The evaluations format: fixed columns plus one score column per trait of the template. */
function evaluations(traits: readonly EvaluationTrait[]): ImportKindDefinition {
  return {
    key: 'evaluations',
    label: 'Evaluations',
    requiredOneOf: [traits.map((t) => t.key)],
    fields: [
      earId('ear_id', 'Ear ID (tattoo)', ['ear', 'tattoo', 'ear tattoo', 'ear no', 'id', 'animal id'], true),
      date('evaluated_on', 'Evaluated on', ['date', 'evaluation date', 'scored on', 'date evaluated'], true),
      text('evaluator', 'Evaluator', ['scored by', 'evaluated by', 'by', 'judge']),
      ...traits.map((t): ImportField => ({
        key: t.key,
        label: `${t.label} (0–${t.points})`,
        required: false,
        type: 'score',
        aliases: [normaliseHeader(t.label)],
        points: t.points,
      })),
      notes,
    ],
  };
}

const results: ImportKindDefinition = {
  key: 'results',
  label: 'Show results',
  requiredOneOf: [],
  fields: [
    text('show_name', 'Show', ['show', 'show title', 'event'], 160, true),
    date('show_date', 'Show date', ['date', 'event date'], true),
    text('location', 'Location', ['venue', 'city', 'show location', 'town']),
    text('judge', 'Judge', ['judged by', 'judge name'], 120, true),
    text('sanction_no', 'Sanction number', ['sanction', 'sanction number']),
    earId('ear_id', 'Ear ID (tattoo)', ['ear', 'tattoo', 'ear tattoo', 'ear no', 'id']),
    text('exhibitor', 'Exhibitor', ['exhibitor name', 'owner', 'shown by', 'rabbitry'], 160, true),
    text('breed', 'Breed', ['breed name'], 80, true),
    text('variety', 'Variety', ['colour', 'color', 'var', 'group']),
    SEX_FIELD,
    {
      key: 'age_class',
      label: 'Age class',
      required: true,
      type: 'enum',
      aliases: ['class', 'age', 'class age'],
      values: AGE_CLASSES,
      valueAliases: { j: 'junior', jr: 'junior', i: 'intermediate', int: 'intermediate', inter: 'intermediate', s: 'senior', sr: 'senior' },
    },
    int('entries_in_class', 'Entries in class', ['entries', 'class size', 'shown', 'number in class', 'no in class', 'animals in class'], true),
    int('exhibitors_in_class', 'Exhibitors in class', ['exhibitors', 'no exhibitors', 'number of exhibitors'], true),
    int('placing', 'Placing', ['place', 'placement', 'rank', 'position'], true),
    { key: 'awards', label: 'Awards (BOV, BOSV, BOB, BOSB, BIS)', required: false, type: 'awards', aliases: ['award', 'wins', 'specials'], values: AWARDS },
  ],
};

/**
 * The definition of an import kind. Evaluations take the breed's evaluation traits (the
 * default template when none is given). O(number of fields).
 */
export function importKind(kind: ImportKindKey, traits: readonly EvaluationTrait[] = DEFAULT_EVALUATION_TRAITS): ImportKindDefinition {
  switch (kind) {
    case 'animals': return animals;
    case 'weights': return weights;
    case 'litters': return litters;
    case 'evaluations': return evaluations(traits);
    case 'results': return results;
  }
}
