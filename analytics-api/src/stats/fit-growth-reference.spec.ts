import { describe, expect, it } from 'vitest';
import { fitGrowthReference } from './fit-growth-reference';
import { GROWTH_CENTILES } from './growth-reference';
import { lmsValue } from './lms-value';
import { normalQuantile } from './normal-quantile';
import { mulberry32, randomNormal } from './random';

// Invented growth curve for the simulation: M = 60 + 25·t g, S = 0.15 − 0.0005·t, L = 0.5.
const truth = (t: number) => ({ L: 0.5, M: 60 + 25 * t, S: 0.15 - 0.0005 * t });

function simulate(perBand: number, weeks: number, seed: number) {
  const rng = mulberry32(seed);
  const points: { ageDays: number; grams: number }[] = [];
  for (let week = 0; week < weeks; week++) {
    for (let k = 0; k < perBand; k++) {
      const ageDays = week * 7 + Math.floor(rng() * 7);
      points.push({ ageDays, grams: lmsValue(randomNormal(rng), truth(ageDays)) });
    }
  }
  return points;
}

// Hyndman & Fan (1996) type 7 check data: quartiles 7.25, 9, 14.5.
const hyndmanFan = [3, 6, 7, 8, 8, 10, 13, 15, 16, 20];

describe('fitGrowthReference', () => {
  it('recovers the centiles of a simulated LMS population to within 3%', () => {
    const reference = fitGrowthReference(simulate(300, 12, 1), { toDays: 84 });
    expect(reference.bands).toHaveLength(12);
    expect(reference.warnings).toEqual([]);
    for (const band of reference.bands) {
      expect(band.n).toBe(300);
      expect(band.fallback).toBeNull();
      for (const p of GROWTH_CENTILES) {
        const expected = lmsValue(normalQuantile(p / 100), truth(band.midDays));
        expect(band.centiles![p] / expected).toBeGreaterThan(0.97);
        expect(band.centiles![p] / expected).toBeLessThan(1.03);
      }
    }
  });

  it('brings the median closer to the truth by smoothing across bands', () => {
    const reference = fitGrowthReference(simulate(40, 12, 2), { toDays: 84 });
    const error = (pick: 'raw' | 'lms') =>
      reference.bands.reduce((sum, b) => sum + Math.log(b[pick]!.M / truth(b.midDays).M) ** 2, 0);
    expect(error('lms')).toBeLessThan(error('raw'));
  });

  it('falls back to type-7 empirical centiles in a band with too few weights (Hyndman & Fan 1996)', () => {
    const points = [...simulate(60, 2, 3), ...hyndmanFan.map((grams) => ({ ageDays: 15, grams }))];
    const reference = fitGrowthReference(points, { toDays: 21 });
    const band = reference.bands[2];
    expect(band.n).toBe(10);
    expect(band.fallback).toBe('empirical');
    expect(band.lms).toBeNull();
    expect(band.weights).toEqual(hyndmanFan);
    expect(band.centiles![25]).toBe(7.25);
    expect(band.centiles![50]).toBe(9);
    expect(band.centiles![75]).toBe(14.5);
    expect(reference.warnings).toEqual(['band 14–21 days has 10 weights: empirical centiles, no LMS fit']);
    expect(reference.bands[0].fallback).toBeNull();
  });

  it('takes bands of unequal width: the same answer as bandDays for equal edges, the truth recovered for wide ones', () => {
    const points = simulate(60, 12, 6);
    const weekly = fitGrowthReference(points, { toDays: 84 });
    const edged = fitGrowthReference(points, { edges: Array.from({ length: 13 }, (_, i) => 7 * i) });
    expect(edged).toEqual(weekly);
    // Weekly to 4 weeks, then 4-week bands: each wide band's centiles still within 3 % of the truth at its mean age.
    const wide = fitGrowthReference(simulate(300, 12, 7), { edges: [0, 7, 14, 21, 28, 56, 84] });
    expect(wide.bands.map((b) => [b.fromDays, b.toDays])).toEqual([[0, 7], [7, 14], [14, 21], [21, 28], [28, 56], [56, 84]]);
    for (const band of wide.bands.slice(4)) {
      expect(band.n).toBe(1200);
      for (const p of GROWTH_CENTILES) {
        const ratio = band.centiles![p] / lmsValue(normalQuantile(p / 100), truth(band.midDays));
        expect(ratio).toBeGreaterThan(0.97);
        expect(ratio).toBeLessThan(1.03);
      }
    }
    expect(() => fitGrowthReference(points, { edges: [0, 7, 7] })).toThrow('fitGrowthReference requires at least 2 ascending, finite band edges');
  });

  it('leaves out weighings outside the range, with a warning', () => {
    const reference = fitGrowthReference([...simulate(30, 1, 4), { ageDays: 400, grams: 3000 }], { toDays: 7 });
    expect(reference.warnings).toEqual(['1 weighings outside 0–7 days were left out']);
  });

  it('rejects invalid weighings and options', () => {
    expect(() => fitGrowthReference([{ ageDays: 500, grams: 10 }])).toThrow('fitGrowthReference requires weighings within the age range');
    expect(() => fitGrowthReference([{ ageDays: 5, grams: 0 }])).toThrow('fitGrowthReference requires finite ages and positive weights');
    expect(() => fitGrowthReference([], { bandDays: 0 })).toThrow(/requires bandDays > 0/);
  });
});
