import { autocovariances } from './autocovariance.js';
import { bartlettLongRunVariance } from './bartlettLongRunVariance.js';
import {
  standardNormalTwoSided,
  standardNormalUpperTail,
  studentTTwoSided,
  studentTUpperTail,
} from './distributions.js';
import { ar1PluginCosineTerms } from './ewcCosineTermsRule.js';
import { ewcLongRunVariance } from './ewcLongRunVariance.js';
import { harveyLeybourneNewbold } from './harveyLeybourneNewbold.js';
import { mean } from './mean.js';
import { type LagChoice, type LagRule, selectLag } from './neweyWestLag.js';
import { uniformLongRunVariance } from './uniformLongRunVariance.js';
import type { VarianceEstimator } from './varianceEstimator.js';
import { isEffectivelyNonPositive } from './varianceTolerance.js';

export interface DieboldMarianoOptions {
  estimator: VarianceEstimator;
  /** Lag rule for `bartlett` and `uniform`; ignored by `ewc`. */
  lag: LagRule;
  /** Forecast horizon h ≥ 1: sets the h − 1 lag floor and the small-sample correction. */
  horizon: number;
  /** Absolute margin δ in loss units: H0 is E[d] ≤ δ. */
  margin: number;
  /**
   * The series on which `bartlett` / `uniform` choose their lag and `ewc-ar1` its ν (default d).
   * The gate passes the unshifted differential L_c − L_b, so the lag or ν, and with it the test's
   * variance, is the same quadratic form at every relative margin (docs/decisions/0011-intervals-from-the-tests.md).
   */
  lagSeries?: Float64Array;
}

/**
 * - `ok`: the statistic was computed;
 * - `identical`: every d_t is 0 (the two forecasts lose the same at every row);
 * - `zero-variance`: d has no variation, or the long-run variance is 0 within rounding;
 * - `too-short`: fewer than `MINIMUM_LENGTH` values.
 */
export const DIEBOLD_MARIANO_STATES = ['ok', 'identical', 'zero-variance', 'too-short'] as const;
export type DieboldMarianoState = (typeof DIEBOLD_MARIANO_STATES)[number];

export interface DieboldMarianoResult {
  state: DieboldMarianoState;
  /** The estimator actually used (after any uniform → Bartlett fallback). */
  estimator: VarianceEstimator;
  requestedEstimator: VarianceEstimator;
  n: number;
  /** d̄, the mean loss differential (0 when n = 0). */
  mean: number;
  /** (d̄ − δ)/√(ω̂²/n). */
  statistic: number | null;
  /** One-sided, alternative E[d] > δ (the candidate worse by more than the margin). */
  pValue: number | null;
  pValueTwoSided: number | null;
  /** ω̂². */
  longRunVariance: number | null;
  /** ω̂²/n, the variance of d̄. */
  variance: number | null;
  /** The lag L of `bartlett` / `uniform`; null for `ewc`. */
  lag: number | null;
  /** ν for `ewc`; null for the normal reference. */
  degreesOfFreedom: number | null;
  /** Harvey–Leybourne–Newbold (1997), for `bartlett` / `uniform` only. */
  smallSample: {
    statistic: number;
    pValue: number;
    pValueTwoSided: number;
    degreesOfFreedom: number;
  } | null;
  lagSelection: {
    rule: LagRule['kind'];
    pilotLag?: number;
    bandwidth?: number;
    s0?: number;
    s1?: number;
  } | null;
  /** Plain-words notes: fallbacks, lag adjustments, why a state was reached. */
  notes: string[];
}

/**
 * The fewest loss differentials the test accepts: 3, the smallest n for which every estimator is
 * defined (the `ewc` estimator needs ν = 2 ≤ n − 1 cosine terms; the Bartlett and uniform ones a
 * centred series with at least one degree of freedom left for the small-sample t reference).
 */
export const MINIMUM_LENGTH = 3;

/**
 * The Diebold & Mariano (1995) test of equal predictive accuracy, one-sided against "the
 * candidate is worse than the baseline by more than the margin":
 *
 *   DM = (d̄ − δ) / √(ω̂²/n),   d_t = loss(candidate)_t − loss(baseline)_t,
 *
 * with ω̂² the long-run variance of d from the chosen estimator:
 * - `ewc` (Lazarus, Lewis, Stock & Watson 2018): DM compared with Student t, ν df; `ewc-ar1`
 *   the same with ν from the data (`ar1PluginCosineTerms`);
 * - `bartlett` (Newey & West 1987) or `uniform` (Diebold & Mariano 1995; falls back to Bartlett
 *   with the same lag when not positive): DM compared with N(0, 1), plus the Harvey, Leybourne &
 *   Newbold (1997) correction compared with Student t, n − 1 df. The lag comes from `selectLag`.
 *
 * Conventions: autocovariances divide by n; `pValue` is the upper tail P(T ≥ DM), the two-sided
 * one 2 P(T ≥ |DM|). Degenerate inputs give a state with null statistics, never NaN or a throw;
 * every number in the result is finite, so it is JSON-safe.
 *
 * @example dieboldMariano(new Float64Array([1, 2, 0, 3, 1]),
 *   { estimator: 'bartlett', lag: { kind: 'fixed', lag: 0 }, horizon: 1, margin: 0 })
 *   // mean 1.4, ω̂² = γ̂_0 = 1.04, statistic = 1.4/√(1.04/5) ≈ 3.0697, pValue ≈ 0.00107
 * @throws RangeError only for invalid arguments: a non-finite d_t or margin, a horizon that is not
 *   an integer ≥ 1, a fixed lag that is not an integer ≥ 0, or values so large that their squares
 *   overflow.
 */
export function dieboldMariano(
  d: Float64Array,
  options: DieboldMarianoOptions,
): DieboldMarianoResult {
  const { estimator: requestedEstimator, horizon, margin } = options;
  validate(d, options);
  const n = d.length;
  const base: DieboldMarianoResult = {
    state: 'ok',
    estimator: requestedEstimator,
    requestedEstimator,
    n,
    mean: n > 0 ? mean(d) : 0,
    statistic: null,
    pValue: null,
    pValueTwoSided: null,
    longRunVariance: null,
    variance: null,
    lag: null,
    degreesOfFreedom: null,
    smallSample: null,
    lagSelection: null,
    notes: [],
  };

  if (n < MINIMUM_LENGTH) {
    base.state = 'too-short';
    base.notes.push(
      `Only ${n} loss differential${n === 1 ? '' : 's'}; the Diebold–Mariano test needs at ` +
        `least ${MINIMUM_LENGTH}.`,
    );
    return base;
  }
  const constant = constantValue(d);
  if (constant === 0) {
    base.state = 'identical';
    base.mean = 0;
    base.notes.push(
      'Every loss differential is 0: both forecasts have the same loss on every row, so there ' +
        'is no difference to test.',
    );
    return base;
  }
  if (constant !== null) {
    base.state = 'zero-variance';
    base.mean = constant;
    base.notes.push(
      `Every loss differential equals ${constant}: the differential does not vary, so its ` +
        'variance is 0 and the statistic is undefined.',
    );
    return base;
  }

  const gamma0 = autocovariances(d, 0)[0]!;
  let longRunVariance: number;
  let estimator: VarianceEstimator = requestedEstimator;
  let lagChoice: LagChoice | null = null;
  if (requestedEstimator === 'ewc' || requestedEstimator === 'ewc-ar1') {
    let terms: number | undefined;
    if (requestedEstimator === 'ewc-ar1') {
      const choice = ar1PluginCosineTerms(options.lagSeries ?? d);
      terms = choice.terms;
      base.notes.push(
        `${terms} cosine terms chosen from the first-order autocorrelation ` +
          `${choice.autocorrelation.toFixed(3)} (AR(1) plug-in, Lazarus et al. 2018).`,
      );
    }
    const ewc = ewcLongRunVariance(d, terms);
    longRunVariance = ewc.value;
    base.degreesOfFreedom = ewc.degreesOfFreedom;
  } else {
    lagChoice = selectLag(options.lagSeries ?? d, options.lag, horizon);
    base.notes.push(...lagChoice.notes);
    base.lag = lagChoice.lag;
    base.lagSelection = describeLagChoice(lagChoice);
    if (requestedEstimator === 'bartlett') {
      longRunVariance = bartlettLongRunVariance(d, lagChoice.lag);
    } else {
      const uniform = uniformLongRunVariance(d, lagChoice.lag);
      longRunVariance = uniform.value;
      estimator = uniform.estimator;
      if (uniform.note !== null) base.notes.push(uniform.note);
    }
  }
  base.estimator = estimator;
  if (!Number.isFinite(longRunVariance)) {
    throw new RangeError(
      'dieboldMariano: the loss differentials are too large to square in double precision',
    );
  }
  base.longRunVariance = longRunVariance;
  base.variance = longRunVariance / n;

  if (isEffectivelyNonPositive(longRunVariance, gamma0, n)) {
    base.state = 'zero-variance';
    base.notes.push(
      `The long-run variance estimate is ${longRunVariance.toPrecision(6)}, zero within ` +
        'rounding, so the statistic is undefined.',
    );
    return base;
  }
  const statistic = (base.mean - margin) / Math.sqrt(base.variance);
  if (!Number.isFinite(statistic)) {
    base.state = 'zero-variance';
    base.notes.push('The variance of the mean is too small for a finite statistic.');
    return base;
  }
  base.statistic = statistic;
  if (estimator === 'ewc' || estimator === 'ewc-ar1') {
    const nu = base.degreesOfFreedom!;
    base.pValue = studentTUpperTail(statistic, nu);
    base.pValueTwoSided = studentTTwoSided(statistic, nu);
  } else {
    base.pValue = standardNormalUpperTail(statistic);
    base.pValueTwoSided = standardNormalTwoSided(statistic);
    base.smallSample = harveyLeybourneNewbold(statistic, n, horizon);
    if (base.smallSample === null) {
      base.notes.push(
        `The small-sample correction needs the horizon (${horizon}) below n (${n}); not computed.`,
      );
    }
  }
  return base;
}

function validate(d: Float64Array, options: DieboldMarianoOptions): void {
  const { horizon, margin, lag } = options;
  if (!Number.isInteger(horizon) || horizon < 1) {
    throw new RangeError(`dieboldMariano: the horizon must be an integer ≥ 1, got ${horizon}`);
  }
  if (!Number.isFinite(margin)) {
    throw new RangeError(`dieboldMariano: the margin must be finite, got ${margin}`);
  }
  if (lag.kind === 'fixed' && (!Number.isInteger(lag.lag) || lag.lag < 0)) {
    throw new RangeError(`dieboldMariano: a fixed lag must be an integer ≥ 0, got ${lag.lag}`);
  }
  for (let t = 0; t < d.length; t++) {
    if (!Number.isFinite(d[t]!)) {
      throw new RangeError(`dieboldMariano: loss differential ${t + 1} is ${d[t]}, not finite`);
    }
  }
}

/** The common value when every element is equal, else null. */
function constantValue(d: Float64Array): number | null {
  const first = d[0]!;
  for (let t = 1; t < d.length; t++) if (d[t] !== first) return null;
  return first === 0 ? 0 : first; // −0 reads as 0
}

function describeLagChoice(choice: LagChoice): NonNullable<DieboldMarianoResult['lagSelection']> {
  if (choice.bandwidth === undefined) return { rule: choice.rule };
  const { pilotLag, bandwidth, s0, s1 } = choice.bandwidth;
  return { rule: choice.rule, pilotLag, bandwidth, s0, s1 };
}
