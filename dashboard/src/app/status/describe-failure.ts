import { HttpErrorResponse } from '@angular/common/http';
import { ZodError } from 'zod';
import { ApiError } from '@shared/contracts/errors';

/** What went wrong, in words for the breeder, with any per-field messages the API sent. */
export interface Failure {
  code: string;
  message: string;
  fields: Record<string, string>;
}

/**
 * Turns anything a call can fail with into a Failure. The API's own message wins (it knows
 * "wrong password" from "too many attempts"); otherwise the status decides the wording.
 */
export function describeFailure(err: unknown): Failure {
  if (err instanceof HttpErrorResponse) {
    const body = ApiError.safeParse(err.error);
    if (body.success) {
      const { code, message, details } = body.data.error;
      return { code, message, fields: stringFields(details) };
    }
    if (err.status === 0) {
      return { code: 'offline', message: 'Keeperline could not be reached. Check the connection and try again.', fields: {} };
    }
    return {
      code: `http-${err.status}`,
      message: `The server could not answer (HTTP ${err.status}). Try again in a moment.`,
      fields: {},
    };
  }
  if (err instanceof ZodError) {
    return {
      code: 'unexpected-answer',
      message: 'The server’s answer was not in the form this page expects. Reload the page; if it keeps happening, tell the site’s admin.',
      fields: {},
    };
  }
  return { code: 'unknown', message: 'Something went wrong. Try again in a moment.', fields: {} };
}

function stringFields(details: unknown): Record<string, string> {
  if (!details || typeof details !== 'object' || Array.isArray(details)) return {};
  return Object.fromEntries(
    Object.entries(details).filter((entry): entry is [string, string] => typeof entry[1] === 'string'),
  );
}
