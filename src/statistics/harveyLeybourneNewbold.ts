import { studentTTwoSided, studentTUpperTail } from './distributions.js';

/**
 * The Harvey, Leybourne & Newbold (1997) small-sample factor for an h-step Diebold–Mariano
 * statistic over n loss differentials:
 *
 *   √((n + 1 − 2h + h(h − 1)/n) / n)  =  (1/n) √((n − h)(n − h + 1)).
 *
 * Positive exactly when h < n; returns null otherwise (the correction is undefined).
 *
 * @example harveyLeybourneNewboldFactor(100, 1) // √(100/100) = 1
 * @example harveyLeybourneNewboldFactor(10, 3)  // √((10 + 1 − 6 + 0.6)/10) ≈ 0.74833
 */
export function harveyLeybourneNewboldFactor(n: number, horizon: number): number | null {
  const ratio = (n + 1 - 2 * horizon + (horizon * (horizon - 1)) / n) / n;
  return ratio > 0 && horizon < n ? Math.sqrt(ratio) : null;
}

export interface SmallSampleTest {
  /** DM · factor. */
  readonly statistic: number;
  /** One-sided, upper tail of Student t with n − 1 df. */
  readonly pValue: number;
  readonly pValueTwoSided: number;
  /** n − 1. */
  readonly degreesOfFreedom: number;
}

/**
 * The Harvey, Leybourne & Newbold (1997) corrected statistic, DM · factor (see
 * `harveyLeybourneNewboldFactor`), compared with Student t with n − 1 degrees of freedom.
 * p-values: one-sided for large values (upper tail), and two-sided 2 F(−|x|).
 * Null when h ≥ n.
 *
 * @example harveyLeybourneNewbold(2, 100, 1) // { statistic: 2, pValue ≈ 0.02412, …, degreesOfFreedom: 99 }
 */
export function harveyLeybourneNewbold(
  statistic: number,
  n: number,
  horizon: number,
): SmallSampleTest | null {
  const factor = harveyLeybourneNewboldFactor(n, horizon);
  if (factor === null) return null;
  const corrected = statistic * factor;
  const degreesOfFreedom = n - 1;
  return {
    statistic: corrected,
    pValue: studentTUpperTail(corrected, degreesOfFreedom),
    pValueTwoSided: studentTTwoSided(corrected, degreesOfFreedom),
    degreesOfFreedom,
  };
}
