import { ValidatorFn } from '@angular/forms';
import * as z from 'zod';

/**
 * A form validator from a field schema in shared/contracts, so the browser checks exactly what
 * the API will check, with the contract's own wording. The error is `{ message }`.
 */
export function zodValidator(schema: z.ZodType): ValidatorFn {
  return (control) => {
    const result = schema.safeParse(control.value, { error: plainWording });
    return result.success ? null : { message: result.error.issues[0]?.message ?? 'Check this value' };
  };
}

// Used only where the contract gives no wording of its own (zod prefers the schema's message).
function plainWording(issue: z.core.$ZodRawIssue): string | undefined {
  if (issue.code === 'too_small' && issue.origin === 'string') {
    return Number(issue.minimum) <= 1 ? 'This cannot be empty' : `Use at least ${issue.minimum} characters`;
  }
  if (issue.code === 'too_big' && issue.origin === 'string') return `Use at most ${issue.maximum} characters`;
  if (issue.code === 'invalid_format' && issue.format === 'email') return 'Enter an e-mail address';
  return undefined;
}
