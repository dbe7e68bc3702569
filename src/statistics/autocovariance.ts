import { mean } from './mean.js';

/**
 * Sample autocovariances γ̂_0, …, γ̂_maxLag of a series about its sample mean:
 *
 *   γ̂_k = (1/n) Σ_{t=k+1..n} (x_t − x̄)(x_{t−k} − x̄).
 *
 * Conventions: always divides by n (not n − k), so the sequence is positive semi-definite; the
 * same definition as R's `acf(x, type = "covariance", demean = TRUE)` and statsmodels'
 * `acovf(x, adjusted = False, demean = True)` (Box & Jenkins 1976, §2.1.4). Cost O(n·(maxLag+1)).
 *
 * @example autocovariances(new Float64Array([1, 2, 3, 4]), 1) // Float64Array [1.25, 0.3125]
 * @throws RangeError when the series is empty or maxLag is not an integer in 0..n−1.
 */
export function autocovariances(x: Float64Array, maxLag: number): Float64Array {
  const n = x.length;
  if (n === 0) throw new RangeError('autocovariances: the series is empty');
  if (!Number.isInteger(maxLag) || maxLag < 0 || maxLag > n - 1) {
    throw new RangeError(
      `autocovariances: maxLag must be an integer in 0..${n - 1}, got ${maxLag}`,
    );
  }
  const centre = mean(x);
  const u = new Float64Array(n);
  for (let t = 0; t < n; t++) u[t] = x[t]! - centre;
  const gamma = new Float64Array(maxLag + 1);
  for (let k = 0; k <= maxLag; k++) {
    let sum = 0;
    for (let t = k; t < n; t++) sum += u[t]! * u[t - k]!;
    gamma[k] = sum / n;
  }
  return gamma;
}
