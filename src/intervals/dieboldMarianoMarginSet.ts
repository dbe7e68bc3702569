import { bartlettLongRunVariance } from '../statistics/bartlettLongRunVariance.js';
import type { LagRule, VarianceEstimator } from '../statistics/dieboldMariano.js';
import { standardNormalQuantile, studentTQuantile } from '../statistics/distributions.js';
import { ewcLongRunVariance } from '../statistics/ewcLongRunVariance.js';
import { harveyLeybourneNewboldFactor } from '../statistics/harveyLeybourneNewbold.js';
import { mean } from '../statistics/mean.js';
import { selectLag } from '../statistics/neweyWestLag.js';
import { uniformWeightSum } from '../statistics/uniformLongRunVariance.js';
import { fiellerSet } from './fiellerSet.js';
import type { IntervalSet } from './intervalSet.js';
import { longRunCovariance } from './longRunCovariance.js';

export interface DieboldMarianoMarginSet {
  /** The relative margins r at which neither one-sided test rejects at `tail`. */
  readonly set: IntervalSet;
  /** The estimator whose matrix was used (uniform falls back to Bartlett when not positive). */
  readonly estimator: VarianceEstimator;
  /** c in the Fieller inequality (t or normal quantile, divided by the HLN factor if used). */
  readonly critical: number;
  readonly covariance: { readonly dd: number; readonly db: number; readonly bb: number };
}

/**
 * Inverts the gate's Diebold–Mariano test over the relative margin: the set of r at which the
 * one-sided tests of E[L_c − (1 + r)·L_b] = 0 in either direction, each at tail probability
 * `tail`, do not reject. With D = L_c − L_b and B = L_b the tested differential is D − r·B, and
 * with the long-run covariance of (D, B) estimated once (`longRunCovariance`, with the gate's
 * estimator, its ν or its lag chosen on D), the condition is the Fieller (1954) quadratic
 * (`fiellerSet`) with c the (1 − tail) quantile of the gate's reference: Student t with ν df for
 * `ewc` (Lazarus et al. 2018); for `bartlett` / `uniform` Student t with n − 1 df divided by the
 * Harvey–Leybourne–Newbold (1997) factor, or N(0, 1) when that correction is undefined (h ≥ n).
 *
 * `uniform` uses its own matrix when that makes ω(D − r·B) positive for every r (then the gate
 * never falls back to Bartlett at any margin); otherwise the Bartlett matrix at the same lag.
 *
 * Returns null when n < 3 or a covariance is not finite.
 */
export function dieboldMarianoMarginSet(input: {
  readonly candidate: Float64Array;
  readonly baseline: Float64Array;
  readonly estimator: VarianceEstimator;
  readonly lag: LagRule;
  /** ν of the ewc estimator (the one the gate's test used). */
  readonly degreesOfFreedom: number | null;
  readonly horizon: number;
  readonly tail: number;
}): DieboldMarianoMarginSet | null {
  const { candidate, baseline, horizon, tail } = input;
  const n = baseline.length;
  if (n < 3) return null;
  const d = new Float64Array(n);
  for (let t = 0; t < n; t++) d[t] = candidate[t]! - baseline[t]!;
  let estimator = input.estimator;
  let covariance: { dd: number; db: number; bb: number };
  let critical: number;
  if (estimator === 'ewc') {
    const nu = input.degreesOfFreedom;
    if (nu === null) return null;
    covariance = longRunCovariance(d, baseline, candidate, (x) => ewcLongRunVariance(x, nu).value);
    critical = studentTQuantile(1 - tail, nu);
  } else {
    const lag = selectLag(d, input.lag, horizon).lag;
    const bartlett = () =>
      longRunCovariance(d, baseline, candidate, (x) => bartlettLongRunVariance(x, lag));
    if (estimator === 'uniform') {
      const uniform = longRunCovariance(d, baseline, candidate, (x) => uniformWeightSum(x, lag));
      const positive = uniform.bb > 0 && uniform.dd * uniform.bb - uniform.db * uniform.db > 0;
      covariance = positive ? uniform : bartlett();
      if (!positive) estimator = 'bartlett';
    } else {
      covariance = bartlett();
    }
    const factor = harveyLeybourneNewboldFactor(n, horizon);
    critical =
      factor === null
        ? standardNormalQuantile(1 - tail)
        : studentTQuantile(1 - tail, n - 1) / factor;
  }
  const { dd, db, bb } = covariance;
  if (![dd, db, bb].every(Number.isFinite)) return null;
  const set = fiellerSet({
    meanD: mean(d),
    meanB: mean(baseline),
    varDD: dd / n,
    varDB: db / n,
    varBB: bb / n,
    critical,
  });
  return { set, estimator, critical, covariance };
}
