import { describe, expect, it } from 'vitest';
import { weightAtAge } from './weight-at-age';

// Linear interpolation worked by hand.
describe('weightAtAge', () => {
  const series = [
    { ageDays: 28, grams: 600 },
    { ageDays: 49, grams: 1300 },
    { ageDays: 63, grams: 1720 },
  ];

  it('interpolates between the weighings either side of the target', () => {
    // 56 days: 1300 + (7/14)·420 = 1510
    expect(weightAtAge(series, 56)).toBe(1510);
    expect(weightAtAge([...series].reverse(), 56)).toBe(1510);
  });

  it('uses a weighing on the target day as is (the mean of several)', () => {
    expect(weightAtAge(series, 49)).toBe(1300);
    expect(weightAtAge([...series, { ageDays: 49, grams: 1320 }], 49)).toBe(1310);
  });

  it('is null when a side is missing or farther than the tolerance', () => {
    expect(weightAtAge(series, 70)).toBeNull(); // no weighing after: no extrapolation
    expect(weightAtAge(series, 20)).toBeNull();
    expect(weightAtAge(series, 40)).toBeNull(); // 12 days after 28, 9 before 49: 12 > 10
    expect(weightAtAge(series, 40, 12)).toBeCloseTo(600 + (12 / 21) * 700, 10);
  });

  it('rejects bad weighings and tolerances', () => {
    expect(() => weightAtAge([{ ageDays: 10, grams: 0 }], 10)).toThrow('weightAtAge requires finite ages and positive weights');
    expect(() => weightAtAge(series, 56, -1)).toThrow('weightAtAge requires a finite target age and a non-negative tolerance');
  });
});
