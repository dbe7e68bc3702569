/**
 * Empirical coverage of prediction intervals: the share of observations inside their interval,
 *
 *   coverage = (1/n) Σ_i 1{l_i ≤ y_i ≤ u_i}.
 *
 * For a central (1 − α) interval it should be close to 1 − α. Coverage alone does not reward
 * narrow intervals, which is why it is reported next to the interval score (Gneiting & Raftery
 * 2007, who motivate the interval score by that gap).
 *
 * Conventions: both bounds count as inside (closed interval); a crossed interval (l_i > u_i)
 * covers nothing; an empty input has no coverage and gives null.
 *
 * @example intervalCoverage([1, 5, 9], [0, 0, 0], [4, 5, 8]) // 2/3 (5 lies on its upper bound)
 * @throws RangeError when the three arrays differ in length.
 */
export function intervalCoverage(
  actual: ArrayLike<number>,
  lower: ArrayLike<number>,
  upper: ArrayLike<number>,
): number | null {
  const n = actual.length;
  if (lower.length !== n || upper.length !== n) {
    throw new RangeError(
      `intervalCoverage: ${n} actuals, ${lower.length} lower and ${upper.length} upper bounds`,
    );
  }
  if (n === 0) return null;
  let inside = 0;
  for (let i = 0; i < n; i++) {
    const y = actual[i]!;
    if (lower[i]! <= y && y <= upper[i]!) inside++;
  }
  return inside / n;
}
