import { describe, expect, it } from 'vitest';
import { refuseFutureDate, todayUtc } from './record-dates';

describe('record dates', () => {
  const now = new Date('2026-05-10T23:30:00Z');
  it('today is the UTC calendar day', () => {
    expect(todayUtc(now)).toBe('2026-05-10');
  });
  it('accepts up to one day past UTC today (a breeder east of UTC), refuses later dates naming the field', () => {
    expect(() => refuseFutureDate('2026-05-11', 'weighedOn', 'A weighing', now)).not.toThrow();
    expect(() => refuseFutureDate('2026-05-12', 'weighedOn', 'A weighing', now)).toThrow('A weighing cannot be in the future');
    try {
      refuseFutureDate('2027-01-01', 'weighedOn', 'A weighing', now);
    } catch (e) {
      expect((e as { status: number; details: unknown }).status).toBe(400);
      expect((e as { details: unknown }).details).toEqual({ weighedOn: 'A weighing cannot be in the future' });
    }
  });
});
