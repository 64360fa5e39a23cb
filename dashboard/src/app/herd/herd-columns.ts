import type { HerdRow } from '@shared/contracts/animals';
import { AGE_CLASS_LABELS, ANIMAL_STATUS_LABELS, SEX_LABELS } from '@shared/domain/terms';
import { formatWeight, type UnitSetting } from '@shared/units/weight';
import { describeAge } from '../records/describe-age';
import type { HerdView } from './herd-view';

export interface CellContext {
  unit: UnitSetting;
  today: string;
}

export interface HerdColumn {
  key: string;
  header: string;
  /** The API's sort key, or null for columns the server cannot order by. */
  sort: HerdView['sort'] | null;
  cell: (row: HerdRow, ctx: CellContext) => string;
  numeric?: boolean;
}

/**
 * The herd table's columns in order. Age sorts by birth date: the oldest animal has the
 * earliest birth date, so "age ascending" is offered as birth date descending (see sortFor).
 */
export const HERD_COLUMNS: readonly HerdColumn[] = [
  { key: 'earId', header: 'Ear ID', sort: 'earId', cell: (r) => r.earId },
  { key: 'name', header: 'Name', sort: 'name', cell: (r) => r.name ?? '' },
  { key: 'sex', header: 'Sex', sort: 'sex', cell: (r) => SEX_LABELS[r.sex] },
  { key: 'breed', header: 'Breed', sort: 'breed', cell: (r) => r.breed ?? '' },
  { key: 'variety', header: 'Variety', sort: 'variety', cell: (r) => r.variety ?? '' },
  { key: 'age', header: 'Age', sort: 'birthDate', cell: (r, c) => describeAge(r.birthDate, c.today) },
  { key: 'ageClass', header: 'Class today', sort: null, cell: (r) => (r.ageClass ? AGE_CLASS_LABELS[r.ageClass] : '') },
  { key: 'line', header: 'Line', sort: 'line', cell: (r) => r.line ?? '' },
  { key: 'status', header: 'Status', sort: 'status', cell: (r) => (r.isStub ? 'Outside parent' : ANIMAL_STATUS_LABELS[r.status]) },
  {
    key: 'latestWeight',
    header: 'Latest weight',
    sort: 'latestWeight',
    numeric: true,
    cell: (r, c) => (r.latestWeightGrams === null ? '' : formatWeight(r.latestWeightGrams, c.unit)),
  },
  { key: 'legs', header: 'Legs', sort: null, numeric: true, cell: (r) => String(r.legs) },
  { key: 'grandChampion', header: 'GC', sort: null, cell: (r) => (r.grandChampion ? 'GC' : '') },
];

/** On a phone at the show table: who it is, how old, how heavy. */
export const PHONE_COLUMNS = ['earId', 'sex', 'age', 'latestWeight'];
export const DESKTOP_COLUMNS = HERD_COLUMNS.map((c) => c.key);

/**
 * The API order for a click on a column header. Age runs opposite to birth date, so the
 * direction flips for it; every other column sorts by its own key. O(columns).
 */
export function sortFor(columnKey: string, direction: 'asc' | 'desc'): Pick<HerdView, 'sort' | 'dir'> | null {
  const column = HERD_COLUMNS.find((c) => c.key === columnKey);
  if (!column?.sort) return null;
  const flip = columnKey === 'age';
  return { sort: column.sort, dir: flip ? (direction === 'asc' ? 'desc' : 'asc') : direction };
}

/** The header and direction the table shows for an API order (the inverse of sortFor). */
export function headerFor(view: Pick<HerdView, 'sort' | 'dir'>): { active: string; direction: 'asc' | 'desc' } {
  if (view.sort === 'birthDate') return { active: 'age', direction: view.dir === 'asc' ? 'desc' : 'asc' };
  return { active: HERD_COLUMNS.find((c) => c.sort === view.sort)?.key ?? 'earId', direction: view.dir };
}
