/**
 * Walker's alias table (Walker 1977, ACM TOMS 3(3)) for a discrete distribution on 0..K−1, built
 * with Vose's two-worklist method (Vose 1991, IEEE TSE 17(9)): to sample, pick a column i
 * uniformly and a uniform coin f on [0, 1); the outcome is i when f < threshold[i], else alias[i].
 * Then P(outcome = j) = (1/K)·(threshold[j] + Σ_{i: alias[i] = j} (1 − threshold[i])) equals
 * probabilities[j] / Σ probabilities, exactly in exact arithmetic.
 *
 * Conventions: `probabilities` non-negative with a positive sum (normalised here).
 *
 * Example: `buildAliasTable(Float64Array.of(0.5, 0.25, 0.25))` gives thresholds (1, 0.75, 0.75)
 * with columns 1 and 2 aliased to 0: (1 + 0.25 + 0.25)/3 = 0.5 for outcome 0.
 */
export function buildAliasTable(probabilities: Float64Array): {
  threshold: Float64Array;
  alias: Int32Array;
} {
  const size = probabilities.length;
  let sum = 0;
  for (let i = 0; i < size; i++) sum += probabilities[i]!;
  const scaled = new Float64Array(size);
  for (let i = 0; i < size; i++) scaled[i] = (probabilities[i]! * size) / sum;
  const threshold = new Float64Array(size);
  const alias = new Int32Array(size);
  const small: number[] = [];
  const large: number[] = [];
  for (let i = size - 1; i >= 0; i--) (scaled[i]! < 1 ? small : large).push(i);
  while (small.length > 0 && large.length > 0) {
    const less = small.pop()!;
    const more = large.pop()!;
    threshold[less] = scaled[less]!;
    alias[less] = more;
    scaled[more] = scaled[more]! + scaled[less]! - 1;
    (scaled[more]! < 1 ? small : large).push(more);
  }
  // Whatever is left has scaled probability 1 up to rounding.
  for (const i of large) {
    threshold[i] = 1;
    alias[i] = i;
  }
  for (const i of small) {
    threshold[i] = 1;
    alias[i] = i;
  }
  return { threshold, alias };
}
