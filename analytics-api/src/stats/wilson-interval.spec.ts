import { describe, expect, it } from 'vitest';
import { wilsonInterval } from './wilson-interval';

describe('wilsonInterval', () => {
  it('matches Newcombe (1998) Table II, Wilson score without continuity correction (tol 1e-6)', () => {
    const a = wilsonInterval(81, 263);
    expect(a.estimate).toBeCloseTo(81 / 263, 12);
    expect(a.lower).toBeCloseTo(0.25528852, 6);
    expect(a.upper).toBeCloseTo(0.36620958, 6);
    const b = wilsonInterval(0, 20);
    expect(b.lower).toBe(0);
    expect(b.upper).toBeCloseTo(0.16112516, 6);
  });

  it('is symmetric: the interval for n − x mirrors the one for x', () => {
    const a = wilsonInterval(3, 17);
    const b = wilsonInterval(14, 17);
    expect(a.lower).toBeCloseTo(1 - b.upper, 14);
    expect(a.upper).toBeCloseTo(1 - b.lower, 14);
    expect(wilsonInterval(20, 20).upper).toBe(1);
  });

  it('rejects impossible counts', () => {
    expect(() => wilsonInterval(1, 0)).toThrow('wilsonInterval requires a positive integer n (got 0)');
    expect(() => wilsonInterval(5, 4)).toThrow('wilsonInterval requires successes to be an integer in 0..n (got 5 of 4)');
  });
});
