/**
 * Interval score of a central (1 − α) prediction interval [l, u] for the observation y
 * (Gneiting & Raftery 2007, eq. 43):
 *
 *   IS_α(l, u; y) = (u − l) + (2/α)(l − y)·1{y < l} + (2/α)(y − u)·1{y > u}.
 *
 * The width is the price of the interval; an observation outside it costs 2/α per unit of
 * distance. Smaller is better, and the score is proper: it is minimised in expectation by the
 * α/2 and 1 − α/2 quantiles of the predictive distribution.
 *
 * Identity with the pinball loss ρ_τ(u) = u·(τ − 1{u < 0}) (src/losses/pinballLoss.ts): when the
 * bounds are the forecast quantiles at levels α/2 and 1 − α/2,
 *
 *   IS_α(l, u; y) = (2/α)·(ρ_{α/2}(y − l) + ρ_{1−α/2}(y − u)),
 *
 * so the interval score is the pinball loss of the two bounds, summed and scaled by 2/α.
 *
 * Conventions: α ∈ (0, 1) is the miss rate (α = 0.2 for an 80% interval). A crossed interval
 * (l > u) is scored by the same formula, which stays non-negative — (2/α − 1)(l − u) when
 * u < y < l — and equal to the pinball form; finding crossed quantiles is the caller's job.
 *
 * @example intervalScore(12, 8, 10, 0.2) // width 2 + (2/0.2)·(12 − 10) = 22
 * @example intervalScore(9, 8, 10, 0.2)  // inside: the width, 2
 * @throws RangeError when α is not in (0, 1).
 */
export function intervalScore(actual: number, lower: number, upper: number, alpha: number): number {
  if (!(alpha > 0 && alpha < 1)) {
    throw new RangeError(`intervalScore: α must be in (0, 1), got ${alpha}`);
  }
  const penalty = 2 / alpha;
  let score = upper - lower;
  if (actual < lower) score += penalty * (lower - actual);
  if (actual > upper) score += penalty * (actual - upper);
  return score;
}
