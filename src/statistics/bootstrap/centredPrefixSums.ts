/**
 * Prefix sums of the centred series laid out twice: P[0] = 0 and P[i + 1] = P[i] + (d_{i mod n} − d̄)
 * for i = 0..2n − 1, so a circular block of length ℓ ≤ n starting at s (0-based) sums to
 * P[s + ℓ] − P[s] (Politis & Romano 1994 wrap the series "on a circle"; doubling it turns every
 * wrapped block into a contiguous range).
 *
 * Conventions: 0-based starts; `mean` is the d̄ that the caller reports (passed in so every user
 * centres by the same number); centring keeps P near zero, so differences lose little precision.
 *
 * Example: d = (1, 2, 3), d̄ = 2 gives P = (0, −1, −1, 0, −1, −1, 0); the block s = 2, ℓ = 2 covers
 * (d_2, d_0) = (3, 1) and P[4] − P[2] = −1 − (−1) = 0 = (3 − 2) + (1 − 2).
 */
export function centredPrefixSums(d: Float64Array, mean: number): Float64Array {
  const n = d.length;
  const prefix = new Float64Array(2 * n + 1);
  let running = 0;
  for (let i = 0; i < 2 * n; i++) {
    running += d[i < n ? i : i - n]! - mean;
    prefix[i + 1] = running;
  }
  return prefix;
}
