import { errorFunction } from 'simple-statistics';

/**
 * Standard normal distribution function Φ(z) = ½(1 + erf(z/√2)), with simple-statistics'
 * errorFunction (the Numerical Recipes Chebyshev fit, absolute error below about 1.2e-7).
 * O(1).
 */
export function normalCdf(z: number): number {
  return 0.5 * (1 + errorFunction(z / Math.SQRT2));
}
