/**
 * Hansen's (2005) test for superior predictive ability ("A test for superior predictive ability",
 * Journal of Business & Economic Statistics 23(4)), on resamples that the caller draws once for
 * all candidates (the stationary bootstrap of Politis & Romano 1994; see
 * src/candidates/sharedResampleDeviations.ts).
 *
 * Notation: X_k,t, k = 1..K, the performance of candidate k relative to the benchmark at time t
 * (for "no candidate beats the baseline": X_k,t = L_baseline,t − L_k,t, positive = k better);
 * X̄_k its mean; s_k the standard error of X̄_k (Hansen's ω̂_k/√n); X̄*_k,b − X̄_k the deviation
 * of resample b, the same blocks for every k.
 *
 * H0: E[X_k] ≤ 0 for every k. Statistic T = max(0, max_k X̄_k / s_k) (studentised, Hansen's
 * T^SPA_n divided by nothing: √n X̄_k/ω̂_k = X̄_k/s_k). Resample statistic, for centring g:
 * T*_b = max(0, max_k (X̄*_k,b − X̄_k + μ̂_k)/s_k) with μ̂_k = X̄_k − g(X̄_k):
 *   lower       μ̂ = min(X̄_k, 0)                               (g_l(x) = max(x, 0))
 *   consistent  μ̂ = X̄_k · 1{X̄_k < −s_k √(2 log log n)}        (g_c, Hansen's threshold)
 *   upper       μ̂ = 0                                          (g_u(x) = x; White's centring)
 * Since μ̂_lower ≤ μ̂_consistent ≤ μ̂_upper and T*_b grows with μ̂, the three p-values on shared
 * resamples satisfy p_lower ≤ p_consistent ≤ p_upper.
 *
 * Conventions: p = (1 + #{T*_b ≥ T})/(B + 1), the project's bootstrap p-value (decision 0005);
 * Hansen writes B⁻¹ #{T*_b > T}; the two differ by O(1/B). T = 0 (no candidate ahead) gives p = 1.
 * A candidate with s_k = 0 (X_k constant) contributes X̄_k/0 read as 0 when X̄_k = 0 and ±∞ by
 * its sign otherwise; its resample terms are then (μ̂_k)/0 read the same way. One-sided.
 */
export interface SuperiorPredictiveAbilityInput {
  /** X̄_k per candidate. */
  readonly means: readonly number[];
  /** s_k per candidate: standard error of X̄_k (≥ 0). */
  readonly standardErrors: readonly number[];
  /** X̄*_k,b − X̄_k per candidate, B values each, resample b on the same blocks for every k. */
  readonly deviations: readonly Float64Array[];
  /** n, the number of time points (for the threshold √(2 log log n)). */
  readonly n: number;
}

export interface SuperiorPredictiveAbilityResult {
  /** T = max(0, max_k X̄_k/s_k). */
  readonly statistic: number;
  readonly pValueLower: number;
  readonly pValueConsistent: number;
  readonly pValueUpper: number;
  /** Per candidate: the studentised mean X̄_k/s_k. */
  readonly studentised: readonly number[];
  /**
   * Per candidate, the single-step adjusted p-value (1 + #{T*_b ≥ max(0, X̄_k/s_k)})/(B + 1) under
   * the consistent centring: the SPA test's p-value had the statistic been candidate k's; the
   * leading candidate's equals pValueConsistent.
   */
  readonly adjustedPValues: readonly number[];
  readonly resamples: number;
}

export type SpaCentring = 'lower' | 'consistent' | 'upper';

export function superiorPredictiveAbility(
  input: SuperiorPredictiveAbilityInput,
): SuperiorPredictiveAbilityResult {
  const { means, standardErrors, deviations, n } = input;
  const k = means.length;
  if (k === 0 || standardErrors.length !== k || deviations.length !== k) {
    throw new RangeError(
      'superior predictive ability needs one mean, error and resample row per candidate',
    );
  }
  const resamples = deviations[0]!.length;
  const studentised = means.map((m, i) => ratio(m, standardErrors[i]!));
  const statistic = Math.max(0, ...studentised);
  const threshold = Math.sqrt(2 * Math.log(Math.log(n)));
  const shifts: Record<SpaCentring, number[]> = {
    lower: means.map((m) => Math.min(m, 0)),
    consistent: means.map((m, i) => (m < -standardErrors[i]! * threshold ? m : 0)),
    upper: means.map(() => 0),
  };
  const resampled = (centring: SpaCentring): Float64Array => {
    const shift = shifts[centring];
    const out = new Float64Array(resamples);
    for (let b = 0; b < resamples; b++) {
      let max = 0;
      for (let i = 0; i < k; i++) {
        const t = ratio(deviations[i]![b]! + shift[i]!, standardErrors[i]!);
        if (t > max) max = t;
      }
      out[b] = max;
    }
    return out;
  };
  const pValueAt = (stars: Float64Array, t: number): number => {
    let count = 0;
    for (let b = 0; b < resamples; b++) if (stars[b]! >= t) count++;
    return (1 + count) / (resamples + 1);
  };
  const consistent = resampled('consistent');
  return {
    statistic,
    pValueLower: pValueAt(resampled('lower'), statistic),
    pValueConsistent: pValueAt(consistent, statistic),
    pValueUpper: pValueAt(resampled('upper'), statistic),
    studentised,
    adjustedPValues: studentised.map((t) => pValueAt(consistent, Math.max(0, t))),
    resamples,
  };
}

/** x / s with s = 0 read as 0 (x = 0) or ±∞ (by the sign of x). */
function ratio(x: number, s: number): number {
  if (s > 0) return x / s;
  return x === 0 ? 0 : x > 0 ? Number.POSITIVE_INFINITY : Number.NEGATIVE_INFINITY;
}
