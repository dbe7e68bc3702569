import { sampleStandardDeviation } from './sampleStandardDeviation.js';

/**
 * Basic (reverse-percentile) bootstrap interval, one-sided bound and p-values for E[d], from the
 * resample deviations T_b = d̄*_b − d̄ (Davison & Hinkley 1997, "Bootstrap Methods and their
 * Application": ch. 5 for the basic interval with the (B + 1)-order-statistic rule, ch. 4 for the
 * Monte Carlo p-value (1 + #)/(B + 1)).
 *
 * Everything is computed on the reflected resamples U_b = d̄ − T_b (= 2d̄ − d̄*_b), sorted
 * ascending U_(1) ≤ … ≤ U_(B):
 *
 * - Quantile rule. For a tail probability a, k(a) = the largest integer k in 0..B with
 *   k/(B + 1) ≤ a, evaluated in floating point exactly as written (so k(0.05) = 500 for
 *   B = 9,999). The lower end at tail a is U_(k(a)) = d̄ − T_(B+1−k(a)), i.e. the empirical
 *   (1 − a)-quantile of T taken as its (B + 1)(1 − a)-th order statistic — the rule of Davison &
 *   Hinkley; the upper end is U_(B+1−k(a)). k = 0 means the level needs more resamples and is
 *   refused (RangeError).
 * - Tail probability α = 1 − c rounded to 15 significant digits (`tailProbability`), which
 *   recovers the decimal a user wrote: in binary 1 − 0.9 is 0.09999999999999998, and without the
 *   rounding 2/20 = 0.1 would count as above α = "0.1".
 * - Two-sided interval at level c (a = α/2):
 *   [U_(k(a)), U_(B+1−k(a))] = [d̄ − q_{1−α/2}(T), d̄ − q_{α/2}(T)].
 * - One-sided lower bound at level c: L = U_(k(α)).
 * - One-sided p-value for H0: E[d] ≤ δ against "candidate worse by more than δ":
 *   p = (1 + #{U_b ≤ δ})/(B + 1), which is docs/design.md's (1 + #{d̄*_b − d̄ ≥ d̄ − δ})/(B + 1).
 * - Two-sided p-value: min(1, 2·min(p, (1 + #{U_b ≥ δ})/(B + 1))).
 *
 * Consistency, exact in floating point (tested): p ≤ α ⇔ δ < L, and
 * pTwoSided ≤ α ⇔ δ ∉ [lower, upper] (δ < lower or δ > upper). Proof of the first: with
 * c = #{U_b ≤ δ}, p ≤ α ⇔ (1 + c)/(B + 1) ≤ α ⇔ 1 + c ≤ k(α) (the division is the same
 * expression and monotone) ⇔ fewer than k(α) of the U_b are ≤ δ ⇔ δ < U_(k(α)). The two-sided
 * case is the same argument on each tail with a = α/2 (doubling is exact in binary).
 *
 * Example: B = 19, U sorted = (1, 2, …, 19), c = 0.9: α = 0.1, k(0.05) = 1 so the interval is
 * [U_(1), U_(19)] = [1, 19]; k(0.1) = 2 so L = 2; δ = 1.5 gives p = (1 + 1)/20 = 0.1 ≤ α and
 * indeed 1.5 < L.
 */
export interface BasicBootstrapInference {
  readonly interval: { readonly level: number; readonly lower: number; readonly upper: number };
  /** Rejects "E[d] ≤ δ" at tail probability `alpha` exactly when δ < lower (and pValue ≤ alpha). */
  readonly oneSidedLower: {
    readonly level: number;
    readonly alpha: number;
    readonly lower: number;
  };
  readonly pValue: number;
  /** (1 + #{U_b ≥ δ})/(B + 1): one-sided for the opposite alternative, E[d] < δ. */
  readonly pValueBelow: number;
  readonly pValueTwoSided: number;
}

/** A basic (reverse-percentile) two-sided interval at `level`. */
export type BasicInterval = { level: number; lower: number; upper: number; method: 'basic' };

/** A one-sided basic lower bound at `level`, with α = 1 − level. */
export type BasicLowerBound = { level: number; alpha: number; lower: number; method: 'basic' };

/** α = 1 − level, rounded to 15 significant digits (see above): 0.9 → 0.1, 0.95 → 0.05. */
export function tailProbability(level: number): number {
  return Number((1 - level).toPrecision(15));
}

/** k(a): the largest k in 0..B with k/(B + 1) ≤ a, in floating point as written. */
export function tailOrderStatistic(tail: number, resamples: number): number {
  const denominator = resamples + 1;
  let k = Math.min(resamples, Math.max(0, Math.floor(tail * denominator)));
  while (k < resamples && (k + 1) / denominator <= tail) k++;
  while (k > 0 && k / denominator > tail) k--;
  return k;
}

/** The fewest resamples B for which a two-sided interval at `level` exists (k(α/2) ≥ 1). */
export function minimumResamples(level: number): number {
  const alpha = tailProbability(level);
  let resamples = Math.max(1, Math.floor(2 / alpha) - 1);
  while (tailOrderStatistic(alpha / 2, resamples) < 1) resamples++;
  while (resamples > 1 && tailOrderStatistic(alpha / 2, resamples - 1) >= 1) resamples--;
  return resamples;
}

/**
 * U_(1..B), the reflected resamples U_b = θ̂ − T_b in ascending order, from the estimate θ̂ and the
 * resample deviations T_b = θ*_b − θ̂: what `basicBootstrapInference` reads.
 *
 * @example reflectedSorted(2, Float64Array.of(0.5, -1, 0)) // Float64Array [1.5, 2, 3]
 */
export function reflectedSorted(estimate: number, deviations: Float64Array): Float64Array {
  const reflected = new Float64Array(deviations.length);
  for (let b = 0; b < deviations.length; b++) reflected[b] = estimate - deviations[b]!;
  return reflected.sort();
}

/**
 * @param reflectedSorted U_(1..B), ascending (see above).
 * @param margin δ, the allowed excess of the candidate's mean loss.
 * @param level c in (0, 1), for the two-sided interval and the one-sided bound.
 */
export function basicBootstrapInference(
  reflectedSorted: Float64Array,
  margin: number,
  level: number,
): BasicBootstrapInference {
  const resamples = reflectedSorted.length;
  const alpha = tailProbability(level);
  const kTwo = tailOrderStatistic(alpha / 2, resamples);
  const kOne = tailOrderStatistic(alpha, resamples);
  if (kTwo < 1) {
    throw new RangeError(
      `${resamples} resamples are too few for a ${level} interval (need at least ${minimumResamples(level)})`,
    );
  }
  let atOrBelow = 0;
  let atOrAbove = 0;
  for (let b = 0; b < resamples; b++) {
    const u = reflectedSorted[b]!;
    if (u <= margin) atOrBelow++;
    if (u >= margin) atOrAbove++;
  }
  const pValue = (1 + atOrBelow) / (resamples + 1);
  const pAbove = (1 + atOrAbove) / (resamples + 1);
  return {
    interval: {
      level,
      lower: reflectedSorted[kTwo - 1]!,
      upper: reflectedSorted[resamples - kTwo]!,
    },
    oneSidedLower: { level, alpha, lower: reflectedSorted[kOne - 1]! },
    pValue,
    pValueBelow: pAbove,
    pValueTwoSided: Math.min(1, 2 * Math.min(pValue, pAbove)),
  };
}

/** What a bootstrap result reports from its deviations: the standard error and the basic inference. */
export interface BasicSummary {
  readonly standardError: number;
  readonly interval: BasicInterval;
  readonly oneSidedLower: BasicLowerBound;
  readonly pValue: number;
  readonly pValueBelow: number;
  readonly pValueTwoSided: number;
}

/**
 * From the estimate θ̂ and the resample deviations T_b = θ*_b − θ̂: the standard error of the θ*
 * (`sampleStandardDeviation`, divisor B − 1) and the basic interval, one-sided lower bound and
 * p-values against the boundary `margin` at `level` (`basicBootstrapInference` on
 * `reflectedSorted(θ̂, T)`).
 */
export function basicSummary(
  estimate: number,
  deviations: Float64Array,
  margin: number,
  level: number,
): BasicSummary {
  const inference = basicBootstrapInference(reflectedSorted(estimate, deviations), margin, level);
  return {
    standardError: sampleStandardDeviation(deviations),
    interval: { ...inference.interval, method: 'basic' },
    oneSidedLower: { ...inference.oneSidedLower, method: 'basic' },
    pValue: inference.pValue,
    pValueBelow: inference.pValueBelow,
    pValueTwoSided: inference.pValueTwoSided,
  };
}
