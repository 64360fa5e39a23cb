import { describe, expect, it } from 'vitest';
import { parseDate } from './parse-date';

// Calendar facts checked by hand (2026 is not a leap year, 2028 is).
describe('parseDate', () => {
  it('always reads ISO dates', () => {
    expect(parseDate('2026-03-04', 'iso')).toEqual({ ok: true, date: '2026-03-04' });
    expect(parseDate(' 2026-03-04 ', 'mdy')).toEqual({ ok: true, date: '2026-03-04' });
    expect(parseDate('2026-02-29', 'iso').ok).toBe(false);
    expect(parseDate('2026-3-4', 'iso').ok).toBe(false);
  });

  it('reads M/D/YYYY and MM/DD/YY only when the order is mdy', () => {
    expect(parseDate('3/4/2026', 'mdy')).toEqual({ ok: true, date: '2026-03-04' });
    expect(parseDate('03/04/26', 'mdy')).toEqual({ ok: true, date: '2026-03-04' });
    expect(parseDate('2/29/2028', 'mdy')).toEqual({ ok: true, date: '2028-02-29' });
    expect(parseDate('2/29/2026', 'mdy').ok).toBe(false);
  });

  it('refuses slashed dates under ISO order as ambiguous', () => {
    const r = parseDate('03/04/2026', 'iso');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain('ambiguous');
  });

  it('explains a day/month/year date given as month/day/year', () => {
    expect(parseDate('13/04/2026', 'mdy')).toEqual({
      ok: false,
      message: 'date "13/04/2026" has no month 13: this file\'s dates are read as month/day/year',
    });
  });

  it('refuses text that is no date', () => {
    for (const t of ['', 'spring', '2026.03.04', '3/4', '04-03-2026']) expect(parseDate(t, 'mdy').ok, t).toBe(false);
  });
});
