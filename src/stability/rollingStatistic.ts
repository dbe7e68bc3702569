/**
 * The rolling Diebold–Mariano statistics of the fluctuation test (Giacomini & Rossi 2010, eq. 6):
 * over every window of m consecutive time points k … k + m − 1 (k = 0 … n − m),
 *
 *   F_k = (1/√m) · Σ_{j=k}^{k+m−1} d_j / σ̂,
 *
 * with σ̂² one long-run variance of d estimated on the whole sample (passed in), not per window.
 * In the paper's notation window k is centred at k + m/2 (the statistic is plotted there).
 * Running sums make it O(n). Conventions: d is the tested differential (positive: candidate
 * worse); σ̂² > 0.
 *
 * @throws RangeError when m is not an integer in 1..n or the variance is not positive.
 */
export function rollingStatistic(
  d: Float64Array,
  m: number,
  longRunVariance: number,
): Float64Array {
  const n = d.length;
  if (!Number.isInteger(m) || m < 1 || m > n) {
    throw new RangeError(`rollingStatistic: window ${m} must be an integer in 1..${n}`);
  }
  if (!(longRunVariance > 0)) {
    throw new RangeError(
      `rollingStatistic: the long-run variance must be > 0, got ${longRunVariance}`,
    );
  }
  const scale = 1 / Math.sqrt(m * longRunVariance);
  const out = new Float64Array(n - m + 1);
  // Sums are recomputed from scratch every 1024 windows so rounding from the running update
  // does not accumulate over long series.
  let sum = 0;
  for (let k = 0; k <= n - m; k++) {
    if (k % 1024 === 0) {
      sum = 0;
      for (let j = k; j < k + m; j++) sum += d[j]!;
    } else {
      sum += d[k + m - 1]! - d[k - 1]!;
    }
    out[k] = sum * scale;
  }
  return out;
}
