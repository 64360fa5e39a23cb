import type * as z from 'zod';

/** Query parameters as the router hands them: a repeated key comes as a list. */
export type QueryParams = Record<string, string | readonly string[] | undefined>;

/** One parameter's value; a repeated key counts once, by its first value. */
export function queryValue(params: QueryParams, key: string): string | undefined {
  const given = params[key];
  return typeof given === 'string' ? given : given?.[0];
}

/**
 * A panel's view (its filters) read from the address's query with a zod object schema — the API's
 * own query schema, or a panel's view schema with a default for every key. Each key is parsed
 * alone, so a value the schema refuses (a hand-edited or stale address) falls back to that key's
 * default and the rest of the view stays. O(keys).
 */
export function queryViewFrom<S extends z.ZodObject>(schema: S, params: QueryParams): z.infer<S> {
  const view: Record<string, unknown> = { ...schema.parse({}) };
  for (const [key, field] of Object.entries(schema.shape) as [string, z.ZodType][]) {
    const raw = queryValue(params, key);
    if (raw === undefined || raw === '') continue;
    const parsed = field.safeParse(raw);
    if (parsed.success && parsed.data !== undefined) view[key] = parsed.data;
  }
  return view as z.infer<S>;
}

/**
 * Query parameters (for the address and the API) of the keys that differ from the schema's
 * defaults; empty values are left out and lists are joined with commas. O(keys).
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
