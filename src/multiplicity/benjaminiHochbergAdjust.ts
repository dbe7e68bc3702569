import { ascendingOrder, testFamily } from './testFamily.js';

/**
 * Benjamini & Hochberg (1995) step-up adjusted p-values, controlling the false discovery rate
 * (for independent or positively dependent tests): with the m computed p-values sorted ascending,
 * p₍₁₎ ≤ … ≤ p₍ₘ₎,
 *
 *   p̃₍ᵢ₎ = min(1, min_{j ≥ i} (m / j) · p₍ⱼ₎),
 *
 * and each adjusted value goes back to its input position. Rejecting every test with p̃ ≤ q is
 * the Benjamini–Hochberg procedure at false discovery rate q.
 *
 * Conventions: the output has the input's length and order; null (a test that could not be
 * computed) stays null and does not count in m (as in R's `p.adjust`, whose default n is the
 * number of non-missing p-values); tied p-values get equal adjusted values; the result is never
 * below the raw p-value, never above 1, never above the Holm (1979) value, and non-decreasing in
 * the raw p-value. m / j is formed before multiplying by p, as R does.
 *
 * @example benjaminiHochbergAdjust([0.01, 0.04, null, 0.03]) // [0.03, 0.04, null, 0.04]  (m = 3)
 * @throws RangeError when a p-value is not a number in [0, 1].
 */
export function benjaminiHochbergAdjust(pValues: readonly (number | null)[]): (number | null)[] {
  const { positions, values } = testFamily(pValues, 'benjaminiHochbergAdjust');
  const m = values.length;
  const adjusted: (number | null)[] = pValues.map(() => null);
  const order = ascendingOrder(values);
  let running = 1;
  for (let i = m - 1; i >= 0; i--) {
    const k = order[i]!;
    running = Math.min(running, (m / (i + 1)) * values[k]!);
    adjusted[positions[k]!] = running;
  }
  return adjusted;
}
