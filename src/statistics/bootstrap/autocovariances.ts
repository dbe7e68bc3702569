/**
 * Sample autocovariances γ̂_k = (1/n) Σ_{t=k+1..n} (d_t − d̄)(d_{t−k} − d̄) for k = 0..maxLag.
 *
 * Conventions: always divide by n (not n − k), as in DESIGN.md "Autocovariance" and Brockwell &
 * Davis (1991, ch. 7), so the sequence is positive semi-definite; d̄ is the plain mean. maxLag is
 * clamped to n − 1. Private to the bootstrap code (it needs the same γ̂ as Politis & Romano 1994
 * and Politis & White 2004 use).
 *
 * Example: `autocovariances(Float64Array.of(1, 2, 3), 2)` is [2/3, 0, −1/3]: centred (−1, 0, 1),
 * γ̂_0 = 2/3, γ̂_1 = (0·(−1) + 1·0)/3 = 0, γ̂_2 = (1·(−1))/3.
 */
export function autocovariances(d: Float64Array, maxLag: number): Float64Array {
  const n = d.length;
  if (n === 0) return new Float64Array(0);
  const centred = centre(d);
  const lags = Math.min(maxLag, n - 1);
  const out = new Float64Array(lags + 1);
  for (let k = 0; k <= lags; k++) out[k] = lagProduct(centred, k) / n;
  return out;
}

/** The series minus its mean. */
export function centre(d: Float64Array): Float64Array {
  const n = d.length;
  const mean = meanOf(d);
  const centred = new Float64Array(n);
  for (let t = 0; t < n; t++) centred[t] = d[t]! - mean;
  return centred;
}

/** Plain mean Σ d_t / n (NaN for an empty series). */
export function meanOf(d: Float64Array): number {
  let sum = 0;
  for (let t = 0; t < d.length; t++) sum += d[t]!;
  return sum / d.length;
}

/** Σ_{t=k..n−1} u_t u_{t−k} (0-based), for a centred series u. */
export function lagProduct(u: Float64Array, k: number): number {
  let sum = 0;
  for (let t = k; t < u.length; t++) sum += u[t]! * u[t - k]!;
  return sum;
}
