import type { Hypothesis } from '../decision/hypothesis.js';
import type { DieboldMarianoSummary } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import { dieboldMariano } from '../statistics/dieboldMariano.js';
import { standardNormalQuantile, studentTQuantile } from '../statistics/distributions.js';
import { harveyLeybourneNewboldFactor } from '../statistics/harveyLeybourneNewbold.js';

/**
 * Runs the Diebold–Mariano test on the tested differential and adds what the report and the
 * decision need: the p-value in the policy's direction and an interval for E[d].
 *
 * Which p-value decides: for `ewc`, Student t with ν degrees of freedom (fixed-b, Lazarus et
 * al. 2018); for `bartlett` / `uniform`, the Harvey, Leybourne & Newbold (1997) corrected
 * statistic against Student t with n − 1 df, since their normal reference over-rejects in short
 * samples (docs/design.md, "Long-run variance"; measured size in docs/validation.md). The lower-tail p-value is 1 − upper (continuous reference).
 * The interval inverts the same statistic: d̄ ± q · SE, with SE = √(ω̂²/n) divided by the HLN
 * factor where that correction is used.
 */
export function runDieboldMariano(
  d: Float64Array,
  horizon: number,
  hypothesis: Hypothesis,
  settings: Settings,
): DieboldMarianoSummary {
  const result = dieboldMariano(d, {
    estimator: settings.variance,
    lag: settings.lag,
    horizon,
    margin: hypothesis.boundary,
  });
  const upper = result.smallSample?.pValue ?? result.pValue;
  const decisionPValue =
    upper === null ? null : hypothesis.rejectWhen === 'above' ? upper : 1 - upper;
  let interval: DieboldMarianoSummary['interval'] = null;
  if (result.variance !== null && result.variance > 0 && result.statistic !== null) {
    const level = settings.confidence;
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
    interval = {
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
    interval,
    lagSelection: result.lagSelection,
    notes: result.notes,
  };
}
