import * as z from 'zod';

/**
 * A panel's view (its filters) read from the address's query parameters with the API's own
 * field schemas: a value the schema refuses (a hand-edited or stale address) falls back to the
 * default for that key alone, so a shared link never breaks the page. Cost O(keys).
 */
export function viewFromQuery<V extends Record<string, unknown>>(
  fields: { [K in keyof V]: z.ZodType<V[K] | undefined> },
  defaults: V,
  params: Record<string, string | string[] | undefined>,
): V {
  const view = { ...defaults };
  for (const key of Object.keys(fields) as (keyof V)[]) {
    const raw = params[key as string];
    const text = Array.isArray(raw) ? raw[0] : raw;
    if (text === undefined || text === '') continue;
    const parsed = fields[key].safeParse(text);
    if (parsed.success && parsed.data !== undefined) view[key] = parsed.data;
  }
  return view;
}

/** The view's values that differ from the defaults, as strings: for the address and the API. O(keys). */
export function queryFromView<V extends Record<string, unknown>>(view: V, defaults: V): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of Object.entries(view)) {
    if (value === undefined || value === null || value === '' || value === defaults[key]) continue;
    out[key] = String(value);
  }
  return out;
}
