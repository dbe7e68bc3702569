import { bartlettLongRunVariance } from '../statistics/bartlettLongRunVariance.js';
import { standardNormalQuantile, studentTQuantile } from '../statistics/distributions.js';
import { ewcLongRunCovariance } from '../statistics/ewcLongRunCovariance.js';
import { harveyLeybourneNewboldFactor } from '../statistics/harveyLeybourneNewbold.js';
import { mean } from '../statistics/mean.js';
import type { LagRule } from '../statistics/neweyWestLag.js';
import { selectLag } from '../statistics/neweyWestLag.js';
import { uniformWeightSum } from '../statistics/uniformLongRunVariance.js';
import type { VarianceEstimator } from '../statistics/varianceEstimator.js';
import { roundingTolerance } from '../statistics/varianceTolerance.js';
import { fiellerSet } from './fiellerSet.js';
import {
  complementOfSet,
  type IntervalSet,
  intersectionOfSets,
  unionOfSets,
} from './intervalSet.js';
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
 * with the long-run covariance of (D, B) estimated once with the gate's estimator, its ν or its
 * lag chosen on D (`ewcLongRunCovariance` for `ewc` / `ewc-ar1`, from the cosine transforms of D
 * and B in one pass; `longRunCovariance`, by polarisation, for `bartlett` / `uniform`), the
 * condition is the Fieller (1954) quadratic
 * (`fiellerSet`) with c the (1 − tail) quantile of the gate's reference: Student t with ν df for
 * `ewc` and `ewc-ar1` (Lazarus et al. 2018; the test's own ν); for `bartlett` / `uniform` Student t with n − 1 df divided by the
 * Harvey–Leybourne–Newbold (1997) factor, or N(0, 1) when that correction is undefined (h ≥ n).
 *
 * `uniform` follows the gate's fallback margin by margin: where the uniform-weight ω(D − r·B) is
 * positive the gate uses it, elsewhere Bartlett at the same lag, so the set is the union of the
 * two Fieller sets each restricted to its region. `estimator` says `bartlett` when the uniform
 * weights are positive at no margin.
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
  let critical: number;
  const meanD = mean(d);
  const meanB = mean(baseline);
  const fieller = (v: { dd: number; db: number; bb: number }) =>
    fiellerSet({ meanD, meanB, varDD: v.dd / n, varDB: v.db / n, varBB: v.bb / n, critical });
  let covariance: { dd: number; db: number; bb: number };
  let set: IntervalSet;
  if (estimator === 'ewc' || estimator === 'ewc-ar1') {
    const nu = input.degreesOfFreedom;
    if (nu === null) return null;
    covariance = ewcLongRunCovariance(d, baseline, nu);
    critical = studentTQuantile(1 - tail, nu);
    if (!finite(covariance)) return null;
    set = fieller(covariance);
  } else {
    const lag = selectLag(d, input.lag, horizon).lag;
    const factor = harveyLeybourneNewboldFactor(n, horizon);
    critical =
      factor === null
        ? standardNormalQuantile(1 - tail)
        : studentTQuantile(1 - tail, n - 1) / factor;
    const bartlett = longRunCovariance(d, baseline, candidate, (x) =>
      bartlettLongRunVariance(x, lag),
    );
    if (!finite(bartlett)) return null;
    covariance = bartlett;
    set = fieller(bartlett);
    if (estimator === 'uniform') {
      const uniform = longRunCovariance(d, baseline, candidate, (x) => uniformWeightSum(x, lag));
      if (!finite(uniform)) return null;
      // Where ω_uniform(D − r·B) is positive beyond rounding the gate uses it, elsewhere
      // Bartlett: "positive" as in `isEffectivelyNonPositive`, ω > n·ε·γ̂_0, also quadratic in r.
      const gamma0 = longRunCovariance(d, baseline, candidate, (x) =>
        bartlettLongRunVariance(x, 0),
      );
      const tolerance = roundingTolerance(n);
      const positive = complementOfSet(
        fiellerSet({
          meanD: 0,
          meanB: 0,
          varDD: tolerance * gamma0.dd - uniform.dd,
          varDB: tolerance * gamma0.db - uniform.db,
          varBB: tolerance * gamma0.bb - uniform.bb,
          critical: 1,
        }),
      );
      if (positive.length === 0) estimator = 'bartlett';
      else {
        covariance = uniform;
        set = unionOfSets(
          intersectionOfSets(fieller(uniform), positive),
          intersectionOfSets(set, complementOfSet(positive)),
        );
      }
    }
  }
  return { set, estimator, critical, covariance };
}

function finite(v: { dd: number; db: number; bb: number }): boolean {
  return Number.isFinite(v.dd) && Number.isFinite(v.db) && Number.isFinite(v.bb);
}
