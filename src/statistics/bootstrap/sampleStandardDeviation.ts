/**
 * Sample standard deviation √(Σ (x_i − x̄)² / (m − 1)) of m values, two-pass (mean first), used
 * for the bootstrap standard error of B resampled statistics.
 *
 * Conventions: divisor m − 1; 0 for m < 2; NaN/∞ propagate.
 *
 * Example: sampleStandardDeviation(Float64Array.of(1, 2, 3, 4)) = √(5/3) ≈ 1.291.
 */
export function sampleStandardDeviation(values: Float64Array): number {
  const m = values.length;
  if (m < 2) return 0;
  let sum = 0;
  for (let i = 0; i < m; i++) sum += values[i]!;
  const centre = sum / m;
  let squares = 0;
  for (let i = 0; i < m; i++) squares += (values[i]! - centre) ** 2;
  return Math.sqrt(squares / (m - 1));
}
