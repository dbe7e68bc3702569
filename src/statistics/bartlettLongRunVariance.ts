import { type LagWeights, weightedAutocovarianceSum } from './weightedAutocovarianceSum.js';

/**
 * Bartlett-kernel (Newey & West 1987) estimate of the long-run variance ω² = Σ_k γ_k of a series:
 *
 *   ω̂² = γ̂_0 + 2 Σ_{k=1..L} (1 − k/(L+1)) γ̂_k,
 *
 * with γ̂_k the autocovariances about the sample mean divided by n (see `autocovariances`): the
 * weighted sum `weightedAutocovarianceSum` with the Bartlett weights (`bartlettWeights`).
 * Never negative in exact arithmetic (Newey & West 1987, Theorem 1). Equals R
 * `sandwich::NeweyWest(lm(x ~ 1), lag = L, prewhite = FALSE, adjust = FALSE) · n` and statsmodels'
 * HAC OLS with `maxlags = L, use_correction = False`, times n. Lag 0 gives γ̂_0.
 *
 * @example bartlettLongRunVariance(new Float64Array([1, 2, 3, 4]), 1) // 1.25 + 2·0.5·0.3125 = 1.5625
 * @throws RangeError when lag is not an integer in 0..n−1.
 */
export function bartlettLongRunVariance(x: Float64Array, lag: number): number {
  return weightedAutocovarianceSum(x, lag, bartlettWeights(lag));
}

/**
 * The Bartlett (triangular) weights at lag L (Newey & West 1987): w(k) = 1 − k/(L + 1) for
 * 1 ≤ k ≤ L, and 0 beyond L. Bandwidth L + 1 in Andrews' (1991) notation.
 *
 * @example bartlettWeights(3)(1) // 0.75
 */
export function bartlettWeights(lag: number): LagWeights {
  return (k) => (k <= lag ? 1 - k / (lag + 1) : 0);
}
