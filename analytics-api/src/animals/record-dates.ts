import { addDays } from '@shared/domain/calendar-date';
import { AppError } from '../http/app-error';

/** Today's calendar date in UTC, 'YYYY-MM-DD'. */
export function todayUtc(now: Date = new Date()): string {
  return now.toISOString().slice(0, 10);
}

/**
 * Refuses a record dated in the future. A breeder's "today" may already be tomorrow in UTC
 * (time zones run to UTC+14), so one day past UTC's today is still accepted.
 * Throws AppError 400 `<field>: <what> cannot be in the future`.
 */
export function refuseFutureDate(date: string, field: string, what: string, now: Date = new Date()): void {
  if (date > addDays(todayUtc(now), 1)) {
    throw new AppError('validation', `${what} cannot be in the future`, 400, { [field]: `${what} cannot be in the future` });
  }
}
