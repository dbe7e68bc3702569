import { mean } from './mean.js';

/**
 * Sample autocovariances γ̂_0, …, γ̂_maxLag of a series about its sample mean:
 *
 *   γ̂_k = (1/n) Σ_{t=k+1..n} (x_t − x̄)(x_{t−k} − x̄).
 *
 * Conventions: always divides by n (not n − k), so the sequence is positive semi-definite; the
 * same definition as R's `acf(x, type = "covariance", demean = TRUE)` and statsmodels'
 * `acovf(x, adjusted = False, demean = True)` (Box & Jenkins 1976, §2.1.4). x̄ is the project's
 * one mean (`mean`). Cost O(n·(maxLag+1)).
 *
 * @example autocovariances(new Float64Array([1, 2, 3, 4]), 1) // Float64Array [1.25, 0.3125]
 * @throws RangeError when the series is empty or maxLag is not an integer in 0..n−1.
 */
export function autocovariances(x: Float64Array, maxLag: number): Float64Array {
  checkMaxLag(x.length, maxLag);
  const u = centred(x);
  const gamma = new Float64Array(maxLag + 1);
  for (let k = 0; k <= maxLag; k++) gamma[k] = autocovarianceOfCentred(u, k);
  return gamma;
}

/** The series minus its mean, u_t = x_t − x̄ (x̄ from `mean`). */
export function centred(x: Float64Array): Float64Array {
  const n = x.length;
  const centre = mean(x);
  const u = new Float64Array(n);
  for (let t = 0; t < n; t++) u[t] = x[t]! - centre;
  return u;
}

/**
 * γ̂_k = (1/n) Σ_{t=k..n−1} u_t u_{t−k} (0-based) of an already centred series u: the one lag
 * product of every autocovariance in the project (summed left to right, divided by n).
 */
export function autocovarianceOfCentred(u: Float64Array, k: number): number {
  let sum = 0;
  for (let t = k; t < u.length; t++) sum += u[t]! * u[t - k]!;
  return sum / u.length;
}

/** Throws the RangeError of `autocovariances` for an empty series or a lag outside 0..n−1. */
export function checkMaxLag(n: number, maxLag: number): void {
  if (n === 0) throw new RangeError('autocovariances: the series is empty');
  if (!Number.isInteger(maxLag) || maxLag < 0 || maxLag > n - 1) {
    throw new RangeError(
      `autocovariances: maxLag must be an integer in 0..${n - 1}, got ${maxLag}`,
    );
  }
}
