import { describe, expect, it } from 'vitest';
import { handReference } from './growth-reference-fixture';
import { lmsValue } from './lms-value';
import { normalCdf } from './normal-cdf';
import { projectSeniorWeight } from './project-senior-weight';
import { Z_95 } from './wilson-interval';

// Bands: weeks 0–7 (index 7 = days 49–56) and a senior band at days 168–175; invented LMS.
const young = { L: 0.5, M: 1500, S: 0.12 };
const senior = { L: 0.3, M: 4200, S: 0.1 };
const bands = Array.from({ length: 26 }, (_, b) => (b === 7 || b === 8 ? { lms: young, n: 200 } : b === 24 ? { lms: senior, n: 80 } : null));
const reference = handReference(bands);
const at = (z: number) => lmsValue(z, young);

describe('projectSeniorWeight', () => {
  it('carries the mean z of the latest weighings to the senior age', () => {
    // z of the three latest weighings 0.2, 0.5, 0.8 (the oldest, z = −1, is left out)
    const series = [
      { ageDays: 50, grams: at(-1) },
      { ageDays: 51, grams: at(0.2) },
      { ageDays: 53, grams: at(0.5) },
      { ageDays: 55, grams: at(0.8) },
    ];
    const result = projectSeniorWeight(reference, series, 170)!;
    expect(result.weighingsUsed).toBe(3);
    expect(result.z).toBeCloseTo(0.5, 9);
    expect(result.zSpread).toBeCloseTo(0.3, 9);
    expect(result.grams).toBeCloseTo(lmsValue(0.5, senior), 6);
    expect(result.percentile).toBeCloseTo(100 * normalCdf(0.5), 9);
    // half-width in z: 1.96·√(0.3²·(1 + 1/3) + (1 + 0.5²/2)/80)
    const half = Z_95 * Math.sqrt(0.09 * (4 / 3) + 1.125 / 80);
    expect(result.lower).toBeCloseTo(lmsValue(0.5 - half, senior), 6);
    expect(result.upper).toBeCloseTo(lmsValue(0.5 + half, senior), 6);
  });

  it('gives no interval from a single weighing', () => {
    const result = projectSeniorWeight(reference, [{ ageDays: 52, grams: at(0) }], 170)!;
    expect(result.grams).toBeCloseTo(senior.M, 6);
    expect(result.lower).toBeNull();
    expect(result.warnings).toEqual(['a single weighing: no interval (at least 2 are needed)']);
  });

  it('is null without usable weighings or a reference at the senior age', () => {
    expect(projectSeniorWeight(reference, [{ ageDays: 100, grams: 2000 }], 170)).toBeNull();
    expect(projectSeniorWeight(reference, [{ ageDays: 52, grams: 1500 }], 120)).toBeNull();
    expect(() => projectSeniorWeight(reference, [], 170, 0)).toThrow(/requires a positive integer count/);
  });
});
