import { describe, expect, it } from 'vitest';
import { kindlingWindow } from './gestation';

// Gestation 31–32 days on average, 29–35 range (common practice, no source);
// dates counted by hand.
describe('kindlingWindow', () => {
  it('bred 2026-03-01 → 29/31/32/35 days on', () => {
    expect(kindlingWindow('2026-03-01')).toEqual({
      earliest: '2026-03-30',
      expectedFrom: '2026-04-01',
      expectedTo: '2026-04-02',
      latest: '2026-04-05',
    });
  });

  it('crosses a leap February', () => {
    expect(kindlingWindow('2024-01-31')).toEqual({
      earliest: '2024-02-29',
      expectedFrom: '2024-03-02',
      expectedTo: '2024-03-03',
      latest: '2024-03-06',
    });
  });

  it('refuses a malformed date', () => {
    expect(() => kindlingWindow('03/01/2026')).toThrow("addDays requires an ISO date 'YYYY-MM-DD'");
  });
});
