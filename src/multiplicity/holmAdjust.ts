import { ascendingOrder, testFamily } from './testFamily.js';

/**
 * Holm (1979) step-down adjusted p-values, controlling the family-wise error rate: with the m
 * computed p-values sorted ascending, p₍₁₎ ≤ … ≤ p₍ₘ₎,
 *
 *   p̃₍ᵢ₎ = min(1, max_{j ≤ i} (m − j + 1) · p₍ⱼ₎),
 *
 * and each adjusted value goes back to its input position. Rejecting every test with p̃ ≤ α is
 * Holm's sequentially rejective procedure at level α.
 *
 * Conventions: the output has the input's length and order; null (a test that could not be
 * computed) stays null and does not count in m (as in R's `p.adjust`, whose default n is the
 * number of non-missing p-values); tied p-values get equal adjusted values; the result is never
 * below the raw p-value, never above 1, and non-decreasing in the raw p-value. An empty family
 * gives an empty (or all-null) result; a family of one is returned unchanged.
 *
 * @example holmAdjust([0.01, 0.04, null, 0.03]) // [0.03, 0.06, null, 0.06]  (m = 3)
 * @throws RangeError when a p-value is not a number in [0, 1].
 */
export function holmAdjust(pValues: readonly (number | null)[]): (number | null)[] {
  const { positions, values } = testFamily(pValues, 'holmAdjust');
  const m = values.length;
  const adjusted: (number | null)[] = pValues.map(() => null);
  let running = 0;
  ascendingOrder(values).forEach((k, i) => {
    // i is the 0-based rank, so (m − rank + 1) = m − i.
    running = Math.max(running, Math.min(1, (m - i) * values[k]!));
    adjusted[positions[k]!] = running;
  });
  return adjusted;
}
