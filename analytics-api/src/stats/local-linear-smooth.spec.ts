import { describe, expect, it } from 'vitest';
import { localLinearSmooth } from './local-linear-smooth';
import { mulberry32, randomNormal } from './random';

describe('localLinearSmooth', () => {
  it('passes a straight line through unchanged, whatever the weights', () => {
    const x = [0, 7, 14, 21, 28, 35];
    const y = x.map((t) => 3 + 0.5 * t);
    expect(localLinearSmooth(x, y, [5, 1, 9, 2, 2, 7], 15).map((v) => v.toFixed(10))).toEqual(y.map((v) => v.toFixed(10)));
  });

  it('reduces noise around a smooth curve', () => {
    const rng = mulberry32(3);
    const x = Array.from({ length: 40 }, (_, i) => i);
    const truth = x.map((t) => Math.sin(t / 8));
    const noisy = truth.map((v) => v + 0.1 * randomNormal(rng));
    const smooth = localLinearSmooth(x, noisy, x.map(() => 1), 4);
    const error = (values: number[]) => values.reduce((s, v, i) => s + (v - truth[i]) ** 2, 0);
    expect(error(smooth)).toBeLessThan(0.6 * error(noisy));
  });

  it('takes one bandwidth per point: a line still passes unchanged, and each point reaches only its own neighbours', () => {
    const x = [0, 7, 14, 42, 70];
    const line = x.map((v) => 3 + 0.5 * v);
    expect(localLinearSmooth(x, line, [1, 1, 1, 1, 1], [14, 14, 14, 56, 56]).map((v) => Math.round(v * 1e9) / 1e9)).toEqual(line);
    // With a reach of 1 day every point is alone; one of 100 days mixes the same values.
    const bumpy = [1, 5, 1, 5, 1];
    expect(localLinearSmooth(x, bumpy, [1, 1, 1, 1, 1], [1, 1, 1, 1, 1])).toEqual(bumpy);
    expect(localLinearSmooth(x, bumpy, [1, 1, 1, 1, 1], [1, 1, 100, 1, 1])[2]).not.toBe(1);
    expect(() => localLinearSmooth(x, bumpy, [1, 1, 1, 1, 1], [1, 1])).toThrow('localLinearSmooth requires one bandwidth per point');
  });

  it('leaves an isolated point as it is', () => {
    expect(localLinearSmooth([0, 100], [1, 5], [1, 1], 10)).toEqual([1, 5]);
  });

  it('rejects mismatched arrays and a bad bandwidth', () => {
    expect(() => localLinearSmooth([1], [1, 2], [1], 1)).toThrow('localLinearSmooth requires x, y and weights of equal length');
    expect(() => localLinearSmooth([1], [1], [1], 0)).toThrow('localLinearSmooth requires a positive bandwidth (got 0)');
  });
});
