/**
 * Pinball (quantile, check) loss of a quantile forecast q at level τ ∈ (0, 1):
 * ρ_τ(y − q) with ρ_τ(u) = u · (τ − 1{u < 0}) (Koenker & Bassett 1978; as a scoring rule,
 * Gneiting & Raftery 2007, §9.1, up to the factor 2 they carry for the interval score).
 * Example: pinballLoss(10, 8, 0.9) = 0.9 · 2 = 1.8; pinballLoss(10, 12, 0.9) = 0.1 · 2 = 0.2.
 */
export function pinballLoss(actual: number, quantile: number, level: number): number {
  const u = actual - quantile;
  return u >= 0 ? level * u : (level - 1) * u;
}
