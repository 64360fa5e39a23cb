import { FormGroup } from '@angular/forms';

/**
 * Shows the API's per-field messages (a 400 "validation" answer) on the matching controls, in
 * the same `{ message }` shape the validators use. The next edit of a field clears its message.
 * Returns whether any message found a control.
 */
export function showFieldErrors(form: FormGroup, fields: Record<string, string>): boolean {
  let shown = false;
  for (const [name, message] of Object.entries(fields)) {
    const control = form.get(name);
    if (!control) continue;
    control.setErrors({ message });
    control.markAsDirty();
    shown = true;
  }
  return shown;
}
