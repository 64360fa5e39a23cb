import type { z } from 'zod';
import { AppError } from './app-error';

/**
 * Parses input with a shared contract; a failure is a 400 whose details name each field, so
 * forms can show the message beside the right input.
 */
export function validate<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const parsed = schema.safeParse(input);
  if (parsed.success) return parsed.data;
  const details: Record<string, string> = {};
  for (const issue of parsed.error.issues) {
    const field = issue.path.join('.') || '_';
    details[field] ??= issue.message;
  }
  const fields = Object.keys(details).join(', ');
  throw new AppError('validation', `Check these fields: ${fields}`, 400, details);
}

/** Route parameters are positive integers; anything else is simply not found. */
export function idParam(value: unknown, what: string): number {
  const n = typeof value === 'string' && /^\d{1,10}$/.test(value) ? Number(value) : NaN;
  if (!Number.isSafeInteger(n) || n <= 0) throw new AppError('not-found', `${what} was not found`, 404);
  return n;
}
