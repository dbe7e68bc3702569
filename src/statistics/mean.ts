/**
 * Arithmetic mean x̄ = (1/n) Σ_{t=1..n} x_t: the project's one mean of a loss or differential
 * series (the reported d̄, the bootstrap's centre, the candidates' mean losses, every centring;
 * docs/design.md, "Mean and autocovariance").
 *
 * Computed in two passes: the plain sum divided by n, then corrected by the mean of the residuals
 * (x_t − x̄), which removes most of the rounding error of the first pass (the "corrected two-pass"
 * idea of Chan, Golub & LeVeque 1983; R's `mean()` corrects the same way). Both passes add left to
 * right. Divides by n.
 *
 * @example mean(new Float64Array([1, 2, 4])) // 2.3333333333333335
 * @throws RangeError for an empty series (the mean is undefined).
 */
export function mean(x: Float64Array): number {
  const n = x.length;
  if (n === 0) throw new RangeError('mean: the series is empty');
  let sum = 0;
  for (let t = 0; t < n; t++) sum += x[t]!;
  const first = sum / n;
  let residual = 0;
  for (let t = 0; t < n; t++) residual += x[t]! - first;
  return first + residual / n;
}
