import { mean, variance } from 'simple-statistics';
import { LMS_ZERO_POWER, type Lms } from './lms';

export interface LmsFit extends Lms {
  /** profile log-likelihood at L (up to a constant), for comparing fits */
  logLikelihood: number;
}

const POWER_RANGE = 3;
const GRID_STEP = 0.1;

/**
 * Maximum-likelihood Box-Cox fit of one sample, expressed as LMS (Box & Cox 1964; Cole &
 * Green 1992). After scaling by the geometric mean G (which removes the Jacobian), the profile
 * log-likelihood of the power is ℓ(L) = −(n/2)·ln σ̂²(L) with w = ((y/G)^L − 1)/L (ln(y/G) at
 * L = 0) and σ̂² its variance; L is maximised over [−3, 3] by a grid of step 0.1 refined by
 * golden-section search. Then μ = mean(w), M = G(1 + Lμ)^(1/L) (G·e^μ at L = 0) and
 * S = σ̂/(1 + Lμ): a normal w is exactly the LMS model z = ((y/M)^L − 1)/(L·S).
 * O(n·g) for g ≈ 100 likelihood evaluations.
 *
 * @throws when there are fewer than 3 values, a value is not positive, or all values are equal
 */
export function fitLms(values: readonly number[]): LmsFit {
  const n = values.length;
  if (n < 3) throw new Error(`fitLms requires at least 3 values (got ${n})`);
  if (values.some((y) => !(y > 0) || !Number.isFinite(y))) throw new Error('fitLms requires positive values');
  const logs = values.map(Math.log);
  const logG = mean(logs);
  const centred = logs.map((l) => l - logG); // ln(y/G)
  if (variance(centred) === 0) throw new Error('fitLms requires values that are not all equal');

  const transform = (L: number): number[] =>
    Math.abs(L) < LMS_ZERO_POWER ? centred : centred.map((l) => Math.expm1(L * l) / L);
  const profile = (L: number): number => -0.5 * n * Math.log(variance(transform(L)));

  let best = -POWER_RANGE;
  let bestValue = profile(best);
  for (let L = -POWER_RANGE + GRID_STEP; L <= POWER_RANGE + 1e-9; L += GRID_STEP) {
    const value = profile(L);
    if (value > bestValue) {
      best = L;
      bestValue = value;
    }
  }
  // Golden-section search on the grid cell either side of the best grid point.
  const ratio = (Math.sqrt(5) - 1) / 2;
  let lo = Math.max(-POWER_RANGE, best - GRID_STEP);
  let hi = Math.min(POWER_RANGE, best + GRID_STEP);
  let x1 = hi - ratio * (hi - lo);
  let x2 = lo + ratio * (hi - lo);
  let f1 = profile(x1);
  let f2 = profile(x2);
  while (hi - lo > 1e-7) {
    if (f1 > f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - ratio * (hi - lo);
      f1 = profile(x1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + ratio * (hi - lo);
      f2 = profile(x2);
    }
  }
  const L = (lo + hi) / 2;
  const w = transform(L);
  const mu = mean(w);
  const sigma = Math.sqrt(variance(w));
  const G = Math.exp(logG);
  if (Math.abs(L) < LMS_ZERO_POWER) return { L: 0, M: G * Math.exp(mu), S: sigma, logLikelihood: profile(L) };
  const scale = 1 + L * mu; // (M/G)^L
  return { L, M: G * scale ** (1 / L), S: sigma / scale, logLikelihood: profile(L) };
}
