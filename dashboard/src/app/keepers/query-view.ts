import type * as z from 'zod';

/**
 * A panel's view read from the address's query with the API's own query schema: each key is
 * parsed alone, so a value the API would refuse (a hand-edited address) falls back to that key's
 * default and the rest of the view stays. O(keys).
 */
export function queryViewFrom<S extends z.ZodObject>(schema: S, params: Record<string, string | undefined>): z.infer<S> {
  const view: Record<string, unknown> = { ...schema.parse({}) };
  for (const [key, field] of Object.entries(schema.shape) as [string, z.ZodType][]) {
    const raw = params[key];
    if (raw === undefined || raw === '') continue;
    const parsed = field.safeParse(raw);
    if (parsed.success && parsed.data !== undefined) view[key] = parsed.data;
  }
  return view as z.infer<S>;
}

/**
 * Query parameters (for the address and the API) of the keys that differ from the schema's
 * defaults; lists are joined with commas. O(keys).
 */
export function queryParamsOf<S extends z.ZodObject>(schema: S, view: z.infer<S>): Record<string, string> {
  const defaults = schema.parse({}) as Record<string, unknown>;
  const out: Record<string, string> = {};
  for (const [key, value] of Object.entries(view as Record<string, unknown>)) {
    if (value === undefined || value === null || value === '') continue;
    if (Array.isArray(value)) {
      if (value.length) out[key] = value.join(',');
      continue;
    }
    if (value === defaults[key]) continue;
    out[key] = String(value);
  }
  return out;
}
