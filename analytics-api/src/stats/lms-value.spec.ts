import { describe, expect, it } from 'vitest';
import { lmsValue } from './lms-value';
import { lmsZ } from './lms-z';

// CDC weight-for-age, infant boys, age 0 (CDC growth-chart LMS file): published 3rd, 50th and
// 97th percentiles 2.355450986, 3.530203168, 4.446488308 kg.
const cdcBirth = { L: 1.815151075, M: 3.530203168, S: 0.152385273 };

describe('lmsValue', () => {
  it('reproduces the CDC percentiles at birth to 1e-6', () => {
    expect(lmsValue(-1.880793608, cdcBirth)).toBeCloseTo(2.355450986, 6);
    expect(lmsValue(0, cdcBirth)).toBe(3.530203168);
    expect(lmsValue(1.880793608, cdcBirth)).toBeCloseTo(4.446488308, 6);
  });

  it('uses M·exp(S·z) at L = 0 (the log-normal limit)', () => {
    expect(lmsValue(1.5, { L: 0, M: 2000, S: 0.1 })).toBeCloseTo(2000 * Math.exp(0.15), 9);
    expect(lmsValue(1.5, { L: 1e-9, M: 2000, S: 0.1 })).toBeCloseTo(2000 * Math.exp(0.15), 6);
  });

  it('is the inverse of lmsZ', () => {
    for (const lms of [cdcBirth, { L: -1.2, M: 1500, S: 0.2 }, { L: 0, M: 900, S: 0.08 }]) {
      for (const z of [-2.5, -1, 0, 0.3, 2.2]) expect(lmsZ(lmsValue(z, lms), lms)).toBeCloseTo(z, 10);
    }
  });

  it('throws where the transform has no value', () => {
    expect(() => lmsValue(-5, { L: 2, M: 1, S: 0.2 })).toThrow(/lmsValue is undefined where 1 \+ L·S·z ≤ 0/);
    expect(() => lmsValue(0, { L: 1, M: 0, S: 0.2 })).toThrow('lmsValue requires a finite L and positive M and S');
  });
});
