import { describe, expect, it } from 'vitest';
import { lmsZ } from './lms-z';

const cdcBirth = { L: 1.815151075, M: 3.530203168, S: 0.152385273 };

describe('lmsZ', () => {
  it('gives the z of the CDC percentiles at birth (infant boys, weight-for-age) to 1e-6', () => {
    expect(lmsZ(2.355450986, cdcBirth)).toBeCloseTo(-1.880793608, 6);
    expect(lmsZ(3.530203168, cdcBirth)).toBe(0);
    expect(lmsZ(4.446488308, cdcBirth)).toBeCloseTo(1.880793608, 6);
  });

  it('uses ln(x/M)/S at L = 0 (Cole & Green 1992)', () => {
    expect(lmsZ(2000 * Math.exp(0.2), { L: 0, M: 2000, S: 0.1 })).toBeCloseTo(2, 12);
  });

  it('rejects a non-positive measurement', () => {
    expect(() => lmsZ(0, cdcBirth)).toThrow('lmsZ requires a positive measurement (got 0)');
  });
});
