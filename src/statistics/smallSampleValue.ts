import type { SmallSampleTest } from './harveyLeybourneNewbold.js';

/** The p-values a Diebold–Mariano result carries, raw and (when applied) small-sample corrected. */
export interface WithSmallSample {
  readonly pValue: number | null;
  readonly pValueTwoSided: number | null;
  readonly smallSample: Pick<SmallSampleTest, 'pValue' | 'pValueTwoSided'> | null;
}

/**
 * The p-value the test reports: the Harvey, Leybourne & Newbold (1997) corrected one when the
 * correction was applied (the `bartlett` and `uniform` estimators), else the plain one (`ewc`
 * and `ewc-ar1`, whose fixed-b Student t reference needs no correction; or a state without a statistic, null).
 * `which` picks the one-sided (upper tail: candidate worse) or the two-sided p-value.
 *
 * @example smallSampleValue({ pValue: 0.03, pValueTwoSided: 0.06,
 *   smallSample: { pValue: 0.04, pValueTwoSided: 0.08 } }) // 0.04
 * @example smallSampleValue({ pValue: 0.03, pValueTwoSided: 0.06, smallSample: null },
 *   'pValueTwoSided') // 0.06
 */
export function smallSampleValue(
  result: WithSmallSample,
  which: 'pValue' | 'pValueTwoSided' = 'pValue',
): number | null {
  return result.smallSample === null ? result[which] : result.smallSample[which];
}
