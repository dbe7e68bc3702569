/**
 * Whether a long-run variance estimate is zero or negative once rounding is allowed for.
 *
 * A value is treated as zero when it is at most n·ε·γ̂_0 (ε = 2⁻⁵², `Number.EPSILON`): the
 * worst-case rounding error of a length-n sum of terms of size γ̂_0, so anything below it carries
 * no information (common practice for numerical zero tests; the bound is the standard one for
 * recursive summation, Higham 2002, §4.2). A series with γ̂_0 = 0 is constant, so any estimate
 * is zero.
 *
 * @example isEffectivelyNonPositive(1e-30, 1, 100) // true
 * @example isEffectivelyNonPositive(0.5, 1, 100)   // false
 */
export function isEffectivelyNonPositive(
  longRunVariance: number,
  gamma0: number,
  n: number,
): boolean {
  return !(longRunVariance > roundingTolerance(n) * gamma0);
}

/** n·ε: the relative rounding bound of a length-n sum, the factor of γ̂_0 in the zero test above. */
export function roundingTolerance(n: number): number {
  return n * Number.EPSILON;
}
