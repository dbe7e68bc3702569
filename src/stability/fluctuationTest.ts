import type { LagRule } from '../statistics/neweyWestLag.js';
import { prewhitenedLongRunVariance } from '../statistics/prewhitenedLongRunVariance.js';
import { type FluctuationSides, fluctuationCriticalValue } from './fluctuationCriticalValues.js';
import { rollingStatistic } from './rollingStatistic.js';

/** Fewest time points for the fluctuation test (common practice: a few windows of a few points). */
export const FLUCTUATION_MIN_POINTS = 20;

export interface FluctuationOptions {
  /** Window size as a fraction of n, in [0.1, 0.9]. */
  readonly mu: number;
  readonly alpha: number;
  readonly sides: FluctuationSides;
  /** Lag rule of the Newey–West long-run variance (the project's `lag` setting). */
  readonly lag: LagRule;
  /** Largest forecast horizon, the floor h − 1 of the automatic lag. */
  readonly horizon: number;
}

/** Indices into the series: window k covers points k … k + windowSize − 1. */
export interface FluctuationResult {
  readonly statistic: number;
  readonly criticalValue: number;
  readonly windowSize: number;
  readonly rejected: boolean;
  /** First point of the window where the statistic peaks. */
  readonly peakWindow: number;
  /** Runs of points [from, to] (inclusive) covered by windows with F_k > the critical value. */
  readonly worseRuns: readonly (readonly [number, number])[];
  /** Lag of the Bartlett estimate on the prewhitened differential. */
  readonly lag: number;
  readonly longRunVariance: number;
  /** The rolling statistics F_k, k = 0 … n − windowSize. */
  readonly path: Float64Array;
}

/**
 * The fluctuation test of Giacomini & Rossi (2010): H0 E[d_t] = 0 at every t (equal accuracy
 * throughout, after the margin), against a candidate worse in some stretch (one-sided: reject
 * when max_k F_k > k_α) or against a difference of either sign somewhere (two-sided: reject when
 * max_k |F_k| > k_α). F_k are the rolling statistics over windows of m = round(μ·n) points
 * (`rollingStatistic`); σ̂² is one HAC estimate of the long-run variance of d on the whole
 * sample, as in the paper: the project's Newey–West (Bartlett) estimator with its lag rule
 * (Newey & West 1994 automatic lag by default, at least h − 1), after AR(1) prewhitening
 * (Andrews & Monahan 1992; `prewhitenedLongRunVariance`), which keeps the false-rejection rate
 * near α in the serially dependent designs of docs/validation.md where the plain kernel estimate
 * let it reach 7–8%. Any consistent HAC estimator gives the same limit, so k_α is from
 * Table I (`fluctuationCriticalValue`). Worse stretches use F_k > k_α in both cases.
 *
 * Returns null when the test cannot be run: fewer than FLUCTUATION_MIN_POINTS points, a window
 * of fewer than 2 points, a zero long-run variance, or α/μ outside the table.
 */
export function fluctuationTest(
  d: Float64Array,
  options: FluctuationOptions,
): FluctuationResult | null {
  const n = d.length;
  if (n < FLUCTUATION_MIN_POINTS) return null;
  const criticalValue = fluctuationCriticalValue(options.mu, options.alpha, options.sides);
  if (criticalValue === null) return null;
  const windowSize = Math.round(options.mu * n);
  if (windowSize < 2) return null;
  const { longRunVariance, lag } = prewhitenedLongRunVariance(d, options.lag, options.horizon);
  if (!(longRunVariance > 0)) return null;
  const path = rollingStatistic(d, windowSize, longRunVariance);
  let peakWindow = 0;
  let statistic = Number.NEGATIVE_INFINITY;
  for (let k = 0; k < path.length; k++) {
    const value = options.sides === 'one' ? path[k]! : Math.abs(path[k]!);
    if (value > statistic) {
      statistic = value;
      peakWindow = k;
    }
  }
  const worseRuns: [number, number][] = [];
  for (let k = 0; k < path.length; k++) {
    if (!(path[k]! > criticalValue)) continue;
    const from = k;
    const to = k + windowSize - 1;
    const last = worseRuns.at(-1);
    if (last !== undefined && from <= last[1] + 1) last[1] = to;
    else worseRuns.push([from, to]);
  }
  return {
    statistic,
    criticalValue,
    windowSize,
    rejected: statistic > criticalValue,
    peakWindow,
    worseRuns,
    lag,
    longRunVariance,
    path,
  };
}
