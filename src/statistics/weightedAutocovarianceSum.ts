import { autocovarianceOfCentred, centred, checkMaxLag } from './autocovariance.js';

/**
 * The weight w(k) a kernel gives the autocovariance at lag k ≥ 1 (lag 0 always has weight 1).
 * A weight of exactly 0 means the lag is not computed at all.
 */
export type LagWeights = (k: number) => number;

/**
 * The weighted autocovariance sum that every kernel (lag-window) long-run variance estimator of
 * the project is (Newey & West 1987; Andrews 1991, eq. 2.2; the same split into "a weights
 * function" and "one sum" as the kernel covariance estimators of Python's arch):
 *
 *   ω̂² = γ̂_0 + 2 Σ_{k=1..maxLag} w(k) γ̂_k,
 *
 * with γ̂_k the autocovariances about the sample mean divided by n (`autocovariances`; x̄ from the
 * project's one `mean`). Lags with w(k) = 0 are skipped (their γ̂_k is never computed), so a
 * weights function that vanishes beyond a cut-off costs only the lags it keeps. Terms are added
 * in lag order, each as 2·w(k)·γ̂_k.
 *
 * Kernels on it: Bartlett (`bartlettWeights`), uniform (`uniformWeights`) and the stationary
 * bootstrap's exact variance (`stationaryBootstrapVariance`).
 *
 * @example weightedAutocovarianceSum(new Float64Array([1, 2, 3, 4]), 1, () => 0.5)
 *   // 1.25 + 2·0.5·0.3125 = 1.5625
 * @throws RangeError when the series is empty or maxLag is not an integer in 0..n−1.
 */
export function weightedAutocovarianceSum(
  x: Float64Array,
  maxLag: number,
  weight: LagWeights,
): number {
  checkMaxLag(x.length, maxLag);
  const u = centred(x);
  let sum = autocovarianceOfCentred(u, 0);
  for (let k = 1; k <= maxLag; k++) {
    const w = weight(k);
    if (w !== 0) sum += 2 * w * autocovarianceOfCentred(u, k);
  }
  return sum;
}
