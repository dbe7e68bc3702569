import { centred } from './autocovariance.js';
import { checkedTerms, ewcCosineTransforms } from './ewcLongRunVariance.js';

/**
 * Equal-weighted cosine (EWC) long-run covariance matrix of two series x and y (Lazarus, Lewis,
 * Stock & Watson 2018, "HAR Inference: Recommendations for Practice", JBES 36(4)): with
 * Λ_j(·) = √(2/n) Σ_{t=1..n} cos(π j (t − ½)/n) (· − mean) the cosine transforms of
 * `ewcLongRunVariance`,
 *
 *   Ω_xx = (1/ν) Σ_{j=1..ν} Λ_j(x)²,  Ω_xy = (1/ν) Σ_j Λ_j(x) Λ_j(y),  Ω_yy = (1/ν) Σ_j Λ_j(y)².
 *
 * The estimator is a quadratic form in the linear Λ_j, so this is the matrix the polarisation
 * identity gives from three variances (`longRunCovariance`: Ω_xy = (ω(x + y) − ω(x) − ω(y))/2),
 * equal in exact arithmetic; here the transforms of x and y come from one pass over the shared
 * cosine weights (`ewcCosineTransforms`), and Ω_xy carries no cancellation from the difference
 * of variances. Conventions: each series centred at its own mean; divide by ν; Ω_xx and Ω_yy
 * are the same to the bit as `ewcLongRunVariance(x, ν)` and `ewcLongRunVariance(y, ν)`; the
 * matrix is positive semi-definite (a Gram matrix of the Λ vectors, divided by ν).
 *
 * Named dd / db / bb as the Fieller margin set reads them (x = D, y = B).
 *
 * @throws RangeError when the lengths differ or ν is not an integer in 1..n−1.
 */
export function ewcLongRunCovariance(
  x: Float64Array,
  y: Float64Array,
  degreesOfFreedom: number,
): { readonly dd: number; readonly db: number; readonly bb: number } {
  const n = x.length;
  if (y.length !== n) {
    throw new RangeError(`ewcLongRunCovariance: lengths differ (${n} and ${y.length})`);
  }
  const nu = checkedTerms('ewcLongRunCovariance', n, degreesOfFreedom);
  const { first, second } = ewcCosineTransforms(centred(x), centred(y), nu);
  let dd = 0;
  let db = 0;
  let bb = 0;
  for (let j = 0; j < nu; j++) {
    const a = first[j]!;
    const b = second![j]!;
    dd += a * a;
    db += a * b;
    bb += b * b;
  }
  return { dd: dd / nu, db: db / nu, bb: bb / nu };
}
