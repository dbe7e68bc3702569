import { autocovariances } from './autocovariance.js';
import { bartlettLongRunVariance } from './bartlettLongRunVariance.js';
import { isEffectivelyNonPositive } from './varianceTolerance.js';
import { type LagWeights, weightedAutocovarianceSum } from './weightedAutocovarianceSum.js';

/**
 * Uniform-weight (truncated-kernel) long-run variance, the estimator of Diebold & Mariano (1995):
 *
 *   ω̂² = γ̂_0 + 2 Σ_{k=1..L} γ̂_k,
 *
 * γ̂_k about the sample mean divided by n: the weighted sum `weightedAutocovarianceSum` with the
 * uniform weights (`uniformWeights`). Can be zero or negative (the truncated kernel is not
 * positive definite), which is why `uniformLongRunVariance` falls back to Bartlett. Equals R
 * `sandwich::vcovHAC(lm(x ~ 1), weights = rep(1, L + 1), prewhite = FALSE, adjust = FALSE) · n`.
 *
 * @example uniformWeightSum(new Float64Array([1, -1, 1, -1]), 1) // 1 + 2·(−0.75) = −0.5
 * @throws RangeError when lag is not an integer in 0..n−1.
 */
export function uniformWeightSum(x: Float64Array, lag: number): number {
  return weightedAutocovarianceSum(x, lag, uniformWeights(lag));
}

/**
 * The uniform (truncated) weights at lag L (Diebold & Mariano 1995): w(k) = 1 for 1 ≤ k ≤ L, and
 * 0 beyond L. Not positive definite: the sum can be negative.
 *
 * @example uniformWeights(3)(2) // 1
 */
export function uniformWeights(lag: number): LagWeights {
  return (k) => (k <= lag ? 1 : 0);
}

export interface UniformLongRunVariance {
  /** The estimate in force: the uniform-weight sum when positive, else Bartlett at the same lag. */
  readonly value: number;
  /** Which weights produced `value`. */
  readonly estimator: 'uniform' | 'bartlett';
  /** The lag used, the same for both weights: the fallback never changes it. */
  readonly lag: number;
  /** The uniform-weight sum itself, possibly zero or negative. */
  readonly uniformValue: number;
  /** A plain-words note when the fallback was taken, else null. */
  readonly note: string | null;
}

/**
 * The Diebold & Mariano (1995) uniform-weight long-run variance with the fallback the design
 * fixes: when the sum is not positive (zero or negative, within rounding: see
 * `isEffectivelyNonPositive`), use the Bartlett weights (Newey & West 1987) with the SAME lag and
 * say so in `note`.
 *
 * @example uniformLongRunVariance(new Float64Array([1, -1, 1, -1]), 1)
 *   // { value: 0.25, estimator: 'bartlett', lag: 1, uniformValue: -0.5, note: '…' }
 */
export function uniformLongRunVariance(x: Float64Array, lag: number): UniformLongRunVariance {
  const uniformValue = uniformWeightSum(x, lag);
  const gamma0 = autocovariances(x, 0)[0]!;
  if (!isEffectivelyNonPositive(uniformValue, gamma0, x.length)) {
    return { value: uniformValue, estimator: 'uniform', lag, uniformValue, note: null };
  }
  const value = bartlettLongRunVariance(x, lag);
  return {
    value,
    estimator: 'bartlett',
    lag,
    uniformValue,
    note:
      `The uniform-weight long-run variance at lag ${lag} is not positive ` +
      `(${uniformValue.toPrecision(6)}), so the Bartlett (Newey–West) weights were used ` +
      `instead, with the same lag ${lag}.`,
  };
}
