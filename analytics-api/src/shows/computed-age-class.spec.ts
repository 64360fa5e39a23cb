import { describe, expect, it } from 'vitest';
import { computedAgeClass } from './computed-age-class';

// Thresholds of shared/domain/age-class (common practice, no source): junior under 6 months,
// six-class intermediate 6 to under 8 months. Dates counted by hand.
describe('computedAgeClass', () => {
  it('follows the breed scheme on the show day', () => {
    expect(computedAgeClass('2025-10-01', '2026-03-31', 'four-class')).toBe('junior');
    expect(computedAgeClass('2025-10-01', '2026-04-01', 'four-class')).toBe('senior');
    expect(computedAgeClass('2025-10-01', '2026-04-01', 'six-class')).toBe('intermediate');
    expect(computedAgeClass('2025-10-01', '2026-06-01', 'six-class')).toBe('senior');
  });
  it('is unknown without a birth date or with one after the show', () => {
    expect(computedAgeClass(null, '2026-04-01', 'four-class')).toBeNull();
    expect(computedAgeClass('2026-05-01', '2026-04-01', 'four-class')).toBeNull();
  });
  it('uses the four-class scheme when the breed is unknown', () => {
    expect(computedAgeClass('2025-10-01', '2026-04-01', null)).toBe('senior');
  });
});
