import { weightedAutocovarianceSum } from '../weightedAutocovarianceSum.js';

/**
 * The exact variance of the stationary-bootstrap mean given the data (Politis & Romano 1994,
 * "The stationary bootstrap", JASA 89(428), Lemma 1):
 *
 *   Var*(d̄*) = n⁻¹ [Ĉ_0 + 2 Σ_{k=1..n−1} ((1 − k/n) q^k + (k/n) q^{n−k}) Ĉ_k],  q = 1 − 1/b,
 *
 * with Ĉ_k = (1/n) Σ_{t=1..n−k} (d_t − d̄)(d_{t+k} − d̄) (divide by n): n⁻¹ times the weighted
 * autocovariance sum `weightedAutocovarianceSum` over all lags 1..n − 1 with the weights
 * w(k) = (1 − k/n) q^k + (k/n) q^{n−k}. This is what the Monte
 * Carlo standard error of `stationaryBootstrap` estimates, so it serves as its exact oracle.
 *
 * Computation: the weight of lag k is at most q^k + q^{n−k}; lags with both q^k and q^{n−k} below
 * ε = 10⁻¹⁷/n get weight 0 and are skipped (their total contribution is below 2ε·n·Ĉ_0 ≤ 2·10⁻¹⁷ Ĉ_0, since
 * |Ĉ_k| ≤ Ĉ_0). Lags near 0 cost O(n) each, lags near n only O(n − k), so the cost is
 * O(n · min(n, b·log(n·10¹⁷))) instead of O(n²).
 *
 * Conventions: b ≥ 1 (b = 1 gives q = 0 and the iid value Ĉ_0/n); 0^0 = 1 is never needed since
 * k ≥ 1 and n − k ≥ 1. Returns 0 for a constant series and NaN for an empty one.
 *
 * Example: d = (1, 2, 3), b = 2 (q = ½): Ĉ = (2/3, 0, −1/3); the lag-2 weight is
 * (1/3)(¼) + (2/3)(½) = 5/12, so Var* = (1/3)[2/3 + 2·(5/12)·(−1/3)] = 7/54 ≈ 0.1296.
 */
export function stationaryBootstrapVariance(d: Float64Array, expectedBlockLength: number): number {
  const n = d.length;
  if (n === 0) return Number.NaN;
  if (!(Number.isFinite(expectedBlockLength) && expectedBlockLength >= 1)) {
    throw new RangeError(
      `expected block length must be a finite number ≥ 1, got ${expectedBlockLength}`,
    );
  }
  const q = 1 - 1 / expectedBlockLength;
  const negligible = 1e-17 / n;
  // Lags 1..near (q^k still counts) and far..n−1 (q^{n−k} still counts).
  const near = q === 0 ? 0 : Math.min(n - 1, Math.ceil(Math.log(negligible) / Math.log(q)));
  const weight = (k: number) =>
    k > near && n - k > near ? 0 : (1 - k / n) * q ** k + (k / n) * q ** (n - k);
  return weightedAutocovarianceSum(d, n - 1, weight) / n;
}
