import type { Hypothesis } from '../decision/hypothesis.js';
import type { DieboldMarianoSummary } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import { type DieboldMarianoResult, dieboldMariano } from '../statistics/dieboldMariano.js';
import { standardNormalQuantile, studentTQuantile } from '../statistics/distributions.js';
import { harveyLeybourneNewboldFactor } from '../statistics/harveyLeybourneNewbold.js';
import { smallSampleValue } from '../statistics/smallSampleValue.js';

/**
 * Runs the Diebold–Mariano test on the tested differential and adds what the report and the
 * decision need: the p-value in the policy's direction and an interval for E[d].
 *
 * Which p-value decides: for `ewc`, Student t with ν degrees of freedom (fixed-b, Lazarus et
 * al. 2018); for `bartlett` / `uniform`, the Harvey, Leybourne & Newbold (1997) corrected
 * statistic against Student t with n − 1 df, since their normal reference over-rejects in short
 * samples (docs/design.md, "Long-run variance"; measured size in docs/validation.md). The lower-tail p-value is 1 − upper (continuous reference).
 * The interval inverts the same statistic: d̄ ± q · SE, with SE = √(ω̂²/n) divided by the HLN
 * factor where that correction is used. It is for E[L_c − L_b] (`difference`, no margin applied),
 * the quantity the report prints beside it; with a relative margin the test's differential is
 * L_c − (1 + r)·L_b, and the automatic lag is chosen on `difference` so that it does not depend
 * on the margin.
 */
export function runDieboldMariano(
  d: Float64Array,
  horizon: number,
  hypothesis: Hypothesis,
  settings: Settings,
  difference: Float64Array = d,
): DieboldMarianoSummary {
  const options = {
    estimator: settings.variance,
    lag: settings.lag,
    horizon,
    lagSeries: difference,
  };
  const result = dieboldMariano(d, { ...options, margin: hypothesis.boundary });
  const upper = smallSampleValue(result);
  const decisionPValue =
    upper === null ? null : hypothesis.rejectWhen === 'above' ? upper : 1 - upper;
  // The interval is for E[L_c − L_b], the difference printed beside it, at every margin.
  const unshifted =
    difference === d ? result : dieboldMariano(difference, { ...options, margin: 0 });
  return {
    state: result.state,
    estimator: result.estimator,
    requestedEstimator: result.requestedEstimator,
    statistic: result.statistic,
    pValue: result.pValue,
    pValueTwoSided: result.pValueTwoSided,
    decisionPValue,
    variance: result.variance,
    longRunVariance: result.longRunVariance,
    lag: result.lag,
    degreesOfFreedom: result.degreesOfFreedom,
    smallSample: result.smallSample,
    interval: meanInterval(unshifted, horizon, settings.confidence),
    lagSelection: result.lagSelection,
    notes: result.notes,
  };
}

/** d̄ ± q · SE at `level`, inverting the same statistic the test uses (see above). */
function meanInterval(
  result: DieboldMarianoResult,
  horizon: number,
  level: number,
): DieboldMarianoSummary['interval'] {
  if (result.variance === null || !(result.variance > 0) || result.statistic === null) return null;
  const tail = 1 - (1 - level) / 2;
  let se = Math.sqrt(result.variance);
  let q: number;
  if (result.smallSample !== null) {
    se /= harveyLeybourneNewboldFactor(result.n, horizon) ?? 1;
    q = studentTQuantile(tail, result.smallSample.degreesOfFreedom);
  } else if (result.degreesOfFreedom !== null) {
    q = studentTQuantile(tail, result.degreesOfFreedom);
  } else {
    q = standardNormalQuantile(tail);
  }
  return {
    level,
    lower: result.mean - q * se,
    upper: result.mean + q * se,
    method:
      result.smallSample !== null
        ? 'HLN-corrected t'
        : result.degreesOfFreedom !== null
          ? 'fixed-b t'
          : 'normal',
  };
}
