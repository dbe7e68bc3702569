import { autocovariances } from './autocovariance.js';

/**
 * Bartlett-kernel (Newey & West 1987) estimate of the long-run variance ω² = Σ_k γ_k of a series:
 *
 *   ω̂² = γ̂_0 + 2 Σ_{k=1..L} (1 − k/(L+1)) γ̂_k,
 *
 * with γ̂_k the autocovariances about the sample mean divided by n (see `autocovariances`).
 * Never negative in exact arithmetic (Newey & West 1987, Theorem 1). Equals R
 * `sandwich::NeweyWest(lm(x ~ 1), lag = L, prewhite = FALSE, adjust = FALSE) · n` and statsmodels'
 * HAC OLS with `maxlags = L, use_correction = False`, times n. Lag 0 gives γ̂_0.
 *
 * @example bartlettLongRunVariance(new Float64Array([1, 2, 3, 4]), 1) // 1.25 + 2·0.5·0.3125 = 1.5625
 * @throws RangeError when lag is not an integer in 0..n−1.
 */
export function bartlettLongRunVariance(x: Float64Array, lag: number): number {
  const gamma = autocovariances(x, lag);
  let sum = gamma[0]!;
  for (let k = 1; k <= lag; k++) sum += 2 * (1 - k / (lag + 1)) * gamma[k]!;
  return sum;
}
