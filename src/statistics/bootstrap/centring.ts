/** Small helpers of the bootstrap code (γ̂_k itself lives in ../autocovariance.ts). */

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
