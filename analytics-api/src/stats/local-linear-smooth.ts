/**
 * Local linear regression smoother (Cleveland 1979's loess without robustness steps, degree 1):
 * at each xᵢ, a weighted least-squares line through the points with weights
 * wⱼ·(1 − (|xⱼ − xᵢ|/hᵢ)³)³ (tricube kernel, zero beyond hᵢ), evaluated at xᵢ. A linear trend
 * passes through unchanged. O(m²) for m points (m is small: age bands).
 *
 * @param weights prior weights (e.g. sample sizes), non-negative
 * @param bandwidth h > 0, or one hᵢ per point (a reach that varies along x, e.g. with the width of age bands)
 * @throws when the arrays differ in length or a bandwidth is not positive
 */
export function localLinearSmooth(x: readonly number[], y: readonly number[], weights: readonly number[], bandwidth: number | readonly number[]): number[] {
  if (x.length !== y.length || x.length !== weights.length) throw new Error('localLinearSmooth requires x, y and weights of equal length');
  const reach = typeof bandwidth === 'number' ? x.map(() => bandwidth) : bandwidth;
  if (reach.length !== x.length) throw new Error('localLinearSmooth requires one bandwidth per point');
  const bad = reach.find((h) => !(h > 0));
  if (bad !== undefined) throw new Error(`localLinearSmooth requires a positive bandwidth (got ${bad})`);
  return x.map((xi, i) => {
    const h = reach[i]!;
    let sw = 0;
    let sx = 0;
    let sy = 0;
    let sxx = 0;
    let sxy = 0;
    x.forEach((xj, j) => {
      const u = Math.abs(xj - xi) / h;
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
