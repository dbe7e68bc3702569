/**
 * The long-run covariance matrix of two series (D, B) from a long-run VARIANCE estimator that is a
 * quadratic form in the centred series (ewc, Bartlett and uniform weights all are):
 *
 *   Ω_DD = ω(D),  Ω_BB = ω(B),  Ω_DB = (ω(D) + ω(B) − ω(D + B)) / 2 … with the sign chosen so that
 *   ω(D − r·B) = Ω_DD − 2 r Ω_DB + r² Ω_BB for every r, exactly in exact arithmetic.
 *
 * Here D + B is passed in (`sum`), because the callers hold it already: with D = L_c − L_b and
 * B = L_b it is the candidate's loss L_c, so no third series is built. Estimating Ω once and
 * reading ω(D − r·B) off it is what makes the set of margins at which the Diebold–Mariano test
 * does not reject a quadratic inequality (Fieller 1954). Conventions: whatever `variance` uses
 * (divide by n, its lag or ν); Ω_DB by the polarisation identity above. The margin set uses it
 * for Bartlett and uniform weights; for ewc, `ewcLongRunCovariance` gives the same matrix from one
 * pass over the cosine transforms of D and B.
 */
export interface LongRunCovariance {
  readonly dd: number;
  readonly db: number;
  readonly bb: number;
}

export function longRunCovariance(
  d: Float64Array,
  b: Float64Array,
  sum: Float64Array,
  variance: (x: Float64Array) => number,
): LongRunCovariance {
  const dd = variance(d);
  const bb = variance(b);
  const ss = variance(sum);
  // ω(D + B) = Ω_DD + 2 Ω_DB + Ω_BB.
  return { dd, bb, db: (ss - dd - bb) / 2 };
}
