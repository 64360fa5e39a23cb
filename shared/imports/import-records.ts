import type { Award } from '../domain/awards';
import type { EvaluationTrait } from '../domain/breed';
import type { AgeClass, AnimalStatus, Sex } from '../domain/terms';
import type { UnitSetting } from '../units/weight';
import type { DateOrder } from './parse-date';

/** The typed record a valid row of each import kind becomes. Ear IDs are trimmed and upper-case. */
export interface AnimalImportRecord {
  earId: string;
  name: string | null;
  sex: Sex;
  breed: string;
  variety: string | null;
  born: string | null;
  sireEarId: string | null;
  damEarId: string | null;
  line: string | null;
  status: AnimalStatus | null;
  registrationNo: string | null;
  grandChampion: boolean | null;
  breeder: string | null;
  weightGrams: number | null;
  litterCode: string | null;
  outside: boolean;
  notes: string | null;
}

export interface WeightImportRecord {
  earId: string;
  weighedOn: string;
  grams: number;
  notes: string | null;
}

export interface LitterImportRecord {
  litterCode: string;
  sireEarId: string;
  damEarId: string;
  bredOn: string | null;
  kindledOn: string | null;
  bornAlive: number | null;
  bornDead: number | null;
  weaned: number | null;
  weight21dGrams: number | null;
  notes: string | null;
}

export interface EvaluationImportRecord {
  earId: string;
  evaluatedOn: string;
  evaluator: string | null;
  /** Trait key → score, for the traits the row scores. */
  scores: Record<string, number>;
  notes: string | null;
}

export interface ResultImportRecord {
  showName: string;
  showDate: string;
  location: string | null;
  judge: string;
  sanctionNo: string | null;
  earId: string | null;
  exhibitor: string;
  breed: string;
  variety: string | null;
  sex: Sex;
  ageClass: AgeClass;
  entriesInClass: number;
  exhibitorsInClass: number;
  placing: number;
  awards: Award[];
}

export interface ImportRecords {
  animals: AnimalImportRecord;
  weights: WeightImportRecord;
  litters: LitterImportRecord;
  evaluations: EvaluationImportRecord;
  results: ResultImportRecord;
}

export interface ImportContext {
  dateOrder: DateOrder;
  unitSetting: UnitSetting;
  /** 'YYYY-MM-DD'; dates after it are refused. */
  today: string;
  /** Evaluations: the template of the row's breed (default traits when absent). */
  traits?: readonly EvaluationTrait[];
  /** Evaluations: every trait the file's columns may name (see traitsToMap), for words about traits outside the row's template. */
  mappedTraits?: readonly EvaluationTrait[];
}

export interface RowIssue {
  /** The field key (canonical column) the issue is about. */
  field: string;
  message: string;
}

export interface RowValidation<T> {
  /** Present only when the row has no errors. */
  value?: T;
  errors: RowIssue[];
  /** Unusual but possible values; the row still imports. */
  warnings: RowIssue[];
}
