import { HerdQuery } from '@shared/contracts/animals';
import type { BreedRecord } from '@shared/contracts/breeds';
import { AGE_CLASS_LABELS, ANIMAL_STATUS_LABELS, SEX_LABELS, type AnimalStatus } from '@shared/domain/terms';

/**
 * What the herd table shows: its page, order and filters. Kept in the address, so Back returns
 * to it. The screen opens on the animals still in the herd (status active); "any" shows sold,
 * deceased and culled ones too — a choice the API expresses by leaving the status out.
 */
export type HerdView = Omit<HerdQuery, 'format' | 'status'> & { status: AnimalStatus | 'any' };
export type HerdFilterKey = 'q' | 'sex' | 'breedId' | 'variety' | 'status' | 'ageClass' | 'line' | 'stubs';

const { format: _format, ...apiDefaults } = HerdQuery.parse({});
export const HERD_DEFAULTS: HerdView = { ...apiDefaults, status: 'active' };
export const HERD_PAGE_SIZES = [25, 50, 100, 200];
const FILTER_KEYS: readonly HerdFilterKey[] = ['q', 'sex', 'breedId', 'variety', 'status', 'ageClass', 'line', 'stubs'];

/**
 * Reads the view from the address's query parameters with the API's own schema; a value the
 * API would refuse (a hand-edited address) falls back to the default for that key alone.
 * Cost O(keys).
 */
export function herdViewFrom(params: Record<string, string | undefined>): HerdView {
  const view: Record<string, unknown> = { ...HERD_DEFAULTS };
  const shape = HerdQuery.shape;
  for (const key of Object.keys(shape).filter((k) => k !== 'format') as (keyof typeof shape)[]) {
    const raw = params[key];
    if (raw === undefined || raw === '') continue;
    if (key === 'status' && raw === 'any') {
      view[key] = 'any';
      continue;
    }
    const parsed = shape[key].safeParse(raw);
    if (parsed.success && parsed.data !== undefined) view[key] = parsed.data;
  }
  return view as HerdView;
}

/** The address's query parameters: only what differs from the screen's defaults. */
export function herdParams(view: HerdView): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of Object.entries(view)) {
    if (value === undefined || value === null || value === '') continue;
    if (value === HERD_DEFAULTS[key as keyof HerdView]) continue;
    out[key] = String(value);
  }
  return out;
}

/** The API's query parameters: as the address, with the status said outright (none for "any"). */
export function herdApiParams(view: HerdView): Record<string, string> {
  const { status: _status, ...rest } = herdParams(view);
  return view.status === 'any' ? rest : { ...rest, status: view.status };
}

/** The CSV of the whole filtered table in its order (the API ignores paging for CSV). */
export function herdCsvUrl(rabbitryId: string, view: HerdView): string {
  const params = new URLSearchParams({ ...herdApiParams({ ...view, page: 1, pageSize: HERD_DEFAULTS.pageSize }), format: 'csv' });
  return `/api/rabbitries/${encodeURIComponent(rabbitryId)}/animals?${params}`;
}

export interface ActiveFilter {
  key: HerdFilterKey;
  label: string;
}

/** The filters in force beyond the defaults, in words, for the chips above the table. O(filters + breeds). */
export function activeFilters(view: HerdView, breeds: readonly Pick<BreedRecord, 'id' | 'name'>[]): ActiveFilter[] {
  const words: Record<HerdFilterKey, (v: never) => string> = {
    q: (v: string) => `“${v}”`,
    sex: (v: keyof typeof SEX_LABELS) => SEX_LABELS[v] + 's',
    breedId: (v: number) => breeds.find((b) => b.id === v)?.name ?? `Breed ${v}`,
    variety: (v: string) => v,
    status: (v: AnimalStatus | 'any') => (v === 'any' ? 'Any status' : ANIMAL_STATUS_LABELS[v]),
    ageClass: (v: keyof typeof AGE_CLASS_LABELS) => `${AGE_CLASS_LABELS[v]}s today`,
    line: (v: string) => `Line ${v}`,
    stubs: (v: 'include' | 'only') => (v === 'only' ? 'Outside parents only' : 'With outside parents'),
  };
  return FILTER_KEYS.filter((k) => view[k] !== undefined && view[k] !== HERD_DEFAULTS[k]).map((key) => ({
    key,
    label: words[key](view[key] as never),
  }));
}

/**
 * A filter changed: back to the first page; the breed's varieties differ, so its variety goes;
 * a removed status or outside-parents filter returns to the screen's default.
 */
export function withFilter<K extends HerdFilterKey>(view: HerdView, key: K, value: HerdView[K] | undefined): HerdView {
  const next: HerdView = { ...view, page: 1, [key]: value === '' ? undefined : value };
  if (key === 'breedId' && value !== view.breedId) next.variety = undefined;
  if (key === 'stubs' && value === undefined) next.stubs = HERD_DEFAULTS.stubs;
  if (key === 'status' && value === undefined) next.status = HERD_DEFAULTS.status;
  return next;
}
