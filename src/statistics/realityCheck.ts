/**
 * White's (2000) reality check for data snooping ("A reality check for data snooping",
 * Econometrica 68(5)): the unstudentised variant of the superior-predictive-ability test, on the
 * same shared resamples (see superiorPredictiveAbility.ts for the notation).
 *
 * H0: E[X_k] ≤ 0 for every k. Statistic V = max_k √n X̄_k; resample V*_b = max_k √n (X̄*_k,b − X̄_k)
 * (centred at the sample means: White's, i.e. Hansen's "upper" centring).
 *
 * Conventions: p = (1 + #{V*_b ≥ V})/(B + 1) (the project's bootstrap p-value, decision 0005;
 * White writes B⁻¹ #{V*_b > V}). One-sided.
 */
export interface RealityCheckResult {
  readonly statistic: number;
  readonly pValue: number;
}

export function realityCheck(
  means: readonly number[],
  deviations: readonly Float64Array[],
  n: number,
): RealityCheckResult {
  if (means.length === 0 || deviations.length !== means.length) {
    throw new RangeError('the reality check needs one mean and one resample row per candidate');
  }
  const root = Math.sqrt(n);
  const statistic = root * Math.max(...means);
  const resamples = deviations[0]!.length;
  let count = 0;
  for (let b = 0; b < resamples; b++) {
    let max = Number.NEGATIVE_INFINITY;
    for (const row of deviations) if (row[b]! > max) max = row[b]!;
    if (root * max >= statistic) count++;
  }
  return { statistic, pValue: (1 + count) / (resamples + 1) };
}
