/**
 * Local linear regression smoother (Cleveland 1979's loess without robustness steps, degree 1):
 * at each xᵢ, a weighted least-squares line through the points with weights
 * wⱼ·(1 − (|xⱼ − xᵢ|/h)³)³ (tricube kernel, zero beyond h), evaluated at xᵢ. A linear trend
 * passes through unchanged. O(m²) for m points (m is small: age bands).
 *
 * @param weights prior weights (e.g. sample sizes), non-negative
 * @param bandwidth h > 0
 * @throws when the arrays differ in length or the bandwidth is not positive
 */
export function localLinearSmooth(x: readonly number[], y: readonly number[], weights: readonly number[], bandwidth: number): number[] {
  if (x.length !== y.length || x.length !== weights.length) throw new Error('localLinearSmooth requires x, y and weights of equal length');
  if (!(bandwidth > 0)) throw new Error(`localLinearSmooth requires a positive bandwidth (got ${bandwidth})`);
  return x.map((xi) => {
    let sw = 0;
    let sx = 0;
    let sy = 0;
    let sxx = 0;
    let sxy = 0;
    x.forEach((xj, j) => {
      const u = Math.abs(xj - xi) / bandwidth;
      if (u >= 1) return;
      const w = weights[j] * (1 - u ** 3) ** 3;
      const dx = xj - xi;
      sw += w;
      sx += w * dx;
      sy += w * y[j];
      sxx += w * dx * dx;
      sxy += w * dx * y[j];
    });
    const determinant = sw * sxx - sx * sx;
    // With a single effective abscissa the line is undetermined: use the weighted mean.
    if (!(determinant > 1e-12 * sw * sxx) ) return sw > 0 ? sy / sw : y[x.indexOf(xi)];
    return (sxx * sy - sx * sxy) / determinant;
  });
}
