import { studentTTwoSided, studentTUpperTail } from './distributions.js';

/**
 * The Harvey, Leybourne & Newbold (1997) small-sample factor for an h-step Diebold–Mariano
 * statistic over n loss differentials:
 *
 *   √((n + 1 − 2h + h(h − 1)/n) / n)  =  (1/n) √((n − h)(n − h + 1)).
 *
 * Computed in the product form, which avoids the cancellation of the sum when h is close to n.
 * Positive exactly when h < n; returns null otherwise (the correction is undefined).
 *
 * @example harveyLeybourneNewboldFactor(100, 1) // √(99/100) ≈ 0.99499
 * @example harveyLeybourneNewboldFactor(10, 3)  // √((10 + 1 − 6 + 0.6)/10) ≈ 0.74833
 */
export function harveyLeybourneNewboldFactor(n: number, horizon: number): number | null {
  if (!(horizon < n)) return null;
  return Math.sqrt((n - horizon) * (n - horizon + 1)) / n;
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
 * @example harveyLeybourneNewbold(2, 100, 1) // { statistic: 2√0.99 ≈ 1.98997, pValue ≈ 0.02468, …, degreesOfFreedom: 99 }
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
