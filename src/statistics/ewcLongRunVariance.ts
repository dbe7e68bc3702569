import { centred } from './autocovariance.js';

/**
 * Degrees of freedom ν of the equal-weighted cosine (EWC) estimator, the rule of Lazarus, Lewis,
 * Stock & Watson (2018): ν = max(2, round(0.4 n^{2/3})).
 *
 * Rounding is to the nearest integer (`Math.round`); an exact tie cannot occur, since 0.4 n^{2/3}
 * is irrational unless n is a cube k³, and then it is 0.4 k², whose fraction is never ½.
 *
 * @example ewcDegreesOfFreedom(100) // round(0.4 · 21.544) = 9
 * @example ewcDegreesOfFreedom(3)   // 2
 */
export function ewcDegreesOfFreedom(n: number): number {
  return Math.max(2, Math.round(0.4 * n ** (2 / 3)));
}

export interface EwcLongRunVariance {
  /** ω̂² = (1/ν) Σ_{j=1..ν} Λ_j². */
  readonly value: number;
  /** ν, the number of cosine terms: the Student t degrees of freedom of the statistic. */
  readonly degreesOfFreedom: number;
}

/**
 * Equal-weighted cosine long-run variance (Lazarus, Lewis, Stock & Watson 2018, "HAR Inference:
 * Recommendations for Practice", JBES 36(4)), a fixed-b estimator whose t statistic is exactly
 * Student t with ν degrees of freedom under normality:
 *
 *   Λ_j = √(2/n) Σ_{t=1..n} cos(π j (t − ½)/n) (x_t − x̄),   ω̂² = (1/ν) Σ_{j=1..ν} Λ_j².
 *
 * Conventions: ν from `ewcDegreesOfFreedom(n)` unless given; never negative. Cost O(n·ν) =
 * O(n^{5/3}) with no trigonometric call in the inner loop: every cosine is cos(π k/(2n)) for an
 * integer k = j(2t − 1) mod 4n, read from a table of n + 1 values by symmetry, so the terms are
 * as accurate as one `Math.cos` each (n = 10⁵ is about 10⁸ table reads).
 *
 * @example ewcLongRunVariance(new Float64Array([1, 2, 3, 4])) // ν = 2, value ≈ 2.4874
 * @throws RangeError when ν is not an integer in 1..n−1 (higher cosines alias lower ones).
 */
export function ewcLongRunVariance(
  x: Float64Array,
  degreesOfFreedom: number = ewcDegreesOfFreedom(x.length),
): EwcLongRunVariance {
  const n = x.length;
  const nu = degreesOfFreedom;
  if (!Number.isInteger(nu) || nu < 1 || nu > n - 1) {
    throw new RangeError(
      `ewcLongRunVariance: ν must be an integer in 1..${n - 1} for n = ${n}, got ${nu}`,
    );
  }
  const u = centred(x);

  // cosTable[r] = cos(π r / (2n)) for r = 0..n; other multiples of π/(2n) by symmetry.
  const cosTable = new Float64Array(n + 1);
  for (let r = 0; r <= n; r++) cosTable[r] = Math.cos((Math.PI * r) / (2 * n));
  const period = 4 * n;
  const half = 2 * n;

  let sumOfSquares = 0;
  for (let j = 1; j <= nu; j++) {
    // angle of term t (0-based) is π j (2t + 1) / (2n): k starts at j and grows by 2j.
    const step = (2 * j) % period;
    let k = j % period;
    let lambda = 0;
    for (let t = 0; t < n; t++) {
      const r = k > half ? period - k : k; // cos(2π − a) = cos(a)
      const c = r > n ? -cosTable[half - r]! : cosTable[r]!; // cos(π − a) = −cos(a)
      lambda += c * u[t]!;
      k += step;
      if (k >= period) k -= period;
    }
    lambda *= Math.sqrt(2 / n);
    sumOfSquares += lambda * lambda;
  }
  return { value: sumOfSquares / nu, degreesOfFreedom: nu };
}
