import { stationaryBootstrapVariance } from '../statistics/bootstrap/stationaryBootstrapVariance.js';
import { mean } from '../statistics/mean.js';
import { type RealityCheckResult, realityCheck } from '../statistics/realityCheck.js';
import {
  type SuperiorPredictiveAbilityResult,
  superiorPredictiveAbility,
} from '../statistics/superiorPredictiveAbility.js';

/**
 * Which null the superior-predictive-ability test takes:
 * - 'none-better': no candidate beats the baseline (Hansen 2005), X_k = L_baseline − L_k;
 * - 'none-worse': no candidate is worse than the baseline (the mirror, for a regression gate),
 *   X_k = L_k − L_baseline.
 */
export const SPA_HYPOTHESES = ['none-better', 'none-worse'] as const;
export type SpaHypothesis = (typeof SPA_HYPOTHESES)[number];

/**
 * The margin as the policies apply it (docs/design.md, "Margins"): X_k = ±(f·L_baseline − L_k) − s,
 * with f = 1 ± r for a relative margin r (1 + r for 'none-worse': "worse by more than r";
 * 1 − r for 'none-better': "better by more than r") and s = δ for an absolute margin δ.
 */
export interface SpaMargin {
  readonly factor: number;
  readonly shift: number;
}

export interface SuperiorAbilityTest {
  readonly hypothesis: SpaHypothesis;
  readonly spa: SuperiorPredictiveAbilityResult;
  readonly realityCheck: RealityCheckResult;
}

/**
 * The SPA test and White's reality check of k candidates against the baseline, on the shared
 * resamples of every model's mean loss (`sharedResampleDeviations`: row 0 the baseline, rows
 * 1..k the candidates). The standard error of X̄_k is the exact stationary-bootstrap one,
 * √Var*(X̄*_k) from Politis & Romano's (1994) Lemma 1 (`stationaryBootstrapVariance`) at the
 * block length of the resamples: the kernel estimator Hansen (2005, Section 2.5) pairs with the
 * stationary bootstrap. The deviations of X_k are differences of the models' deviations (the mean
 * is linear), so no extra resampling is needed.
 */
export function superiorAbilityTest(
  baseline: Float64Array,
  candidates: readonly Float64Array[],
  deviations: readonly Float64Array[],
  expectedBlockLength: number,
  hypothesis: SpaHypothesis,
  margin: SpaMargin = { factor: 1, shift: 0 },
): SuperiorAbilityTest {
  const sign = hypothesis === 'none-better' ? 1 : -1;
  const { factor, shift } = margin;
  const n = baseline.length;
  const base = deviations[0]!;
  const performance = candidates.map((c) => {
    const x = new Float64Array(n);
    for (let t = 0; t < n; t++) x[t] = sign * (factor * baseline[t]! - c[t]!) - shift;
    return x;
  });
  const resampled = candidates.map((_, k) => {
    const own = deviations[k + 1]!;
    const x = new Float64Array(own.length);
    for (let b = 0; b < x.length; b++) x[b] = sign * (factor * base[b]! - own[b]!);
    return x;
  });
  const means = performance.map(mean);
  const standardErrors = performance.map((x) =>
    Math.sqrt(Math.max(0, stationaryBootstrapVariance(x, expectedBlockLength))),
  );
  return {
    hypothesis,
    spa: superiorPredictiveAbility({ means, standardErrors, deviations: resampled, n }),
    realityCheck: realityCheck(means, resampled, n),
  };
}
