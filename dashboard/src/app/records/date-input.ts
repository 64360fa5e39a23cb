import type { ValidatorFn } from '@angular/forms';
import { parseIsoDate } from '@shared/domain/calendar-date';
import { localToday } from './describe-age';

/**
 * A date field's validator (the browser's date input gives 'YYYY-MM-DD' or ''): records are of
 * what happened, so a day after today is refused, as the API refuses it.
 */
export function pastDateValidator(required: boolean, today: () => string = localToday): ValidatorFn {
  return (control) => {
    const text = String(control.value ?? '').trim();
    if (text === '') return required ? { message: 'Give the date' } : null;
    if (!parseIsoDate(text)) return { message: 'Give a date as YYYY-MM-DD' };
    if (text > today()) return { message: `The date is after today (${today()})` };
    return null;
  };
}
