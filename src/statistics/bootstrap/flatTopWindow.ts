/**
 * The flat-top (trapezoidal) lag window of Politis & Romano (1995), "Bias-corrected nonparametric
 * spectral estimation", J. Time Series Analysis 16(1): λ(s) = 1 for |s| ≤ ½, 2(1 − |s|) for
 * ½ < |s| ≤ 1, and 0 beyond. Used by Politis & White (2004) for the automatic block length.
 *
 * Example: flatTop(0.25) = 1, flatTop(0.75) = 0.5, flatTop(1) = 0, flatTop(−0.75) = 0.5.
 */
export function flatTop(s: number): number {
  const a = Math.abs(s);
  if (a <= 0.5) return 1;
  if (a <= 1) return 2 * (1 - a);
  return 0;
}
