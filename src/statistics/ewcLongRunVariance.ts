import { mean } from './mean.js';

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
 * as accurate as one `Math.cos` each (n = 10⁵ is about 10⁸ table reads). The ν rows of weights
 * are kept for the next call with the same n and ν (a comparison calls this once per series and
 * per margin check, all with the same n), when they fit in WEIGHTS_KEPT entries; the result is
 * the same either way, to the bit.
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
  const centre = mean(x);
  const u = new Float64Array(n);
  for (let t = 0; t < n; t++) u[t] = x[t]! - centre;

  const kept = keptWeights(n, nu);
  const row = kept === null ? new Float64Array(n) : null;
  const cosTable = kept === null ? cosineTable(n) : null;
  let sumOfSquares = 0;
  for (let j = 1; j <= nu; j++) {
    let weights: Float64Array;
    let at = 0;
    if (kept === null) {
      cosineRow(j, n, cosTable!, row!, 0);
      weights = row!;
    } else {
      weights = kept;
      at = (j - 1) * n;
    }
    let lambda = 0;
    for (let t = 0; t < n; t++) lambda += weights[at + t]! * u[t]!;
    lambda *= Math.sqrt(2 / n);
    sumOfSquares += lambda * lambda;
  }
  return { value: sumOfSquares / nu, degreesOfFreedom: nu };
}

/** Most weights kept between calls: 2^21 doubles (16 MiB), e.g. n = 10,000 with ν = 186. */
export const WEIGHTS_KEPT = 1 << 21;

let kept: { readonly n: number; readonly nu: number; readonly weights: Float64Array } | null = null;

/** The ν rows cos(π j (2t + 1)/(2n)), j = 1..ν, t = 0..n−1, row after row; null when too many. */
function keptWeights(n: number, nu: number): Float64Array | null {
  if (n * nu > WEIGHTS_KEPT) return null;
  if (kept === null || kept.n !== n || kept.nu !== nu) {
    const cosTable = cosineTable(n);
    const weights = new Float64Array(n * nu);
    for (let j = 1; j <= nu; j++) cosineRow(j, n, cosTable, weights, (j - 1) * n);
    kept = { n, nu, weights };
  }
  return kept.weights;
}

/** cos(π r / (2n)) for r = 0..n; other multiples of π/(2n) by symmetry. */
function cosineTable(n: number): Float64Array {
  const table = new Float64Array(n + 1);
  for (let r = 0; r <= n; r++) table[r] = Math.cos((Math.PI * r) / (2 * n));
  return table;
}

/** out[at + t] = cos(π j (2t + 1)/(2n)) for t = 0..n−1, from the table. */
function cosineRow(j: number, n: number, cosTable: Float64Array, out: Float64Array, at: number) {
  const period = 4 * n;
  const half = 2 * n;
  // angle of term t (0-based) is π j (2t + 1) / (2n): k starts at j and grows by 2j.
  const step = (2 * j) % period;
  let k = j % period;
  for (let t = 0; t < n; t++) {
    const r = k > half ? period - k : k; // cos(2π − a) = cos(a)
    out[at + t] = r > n ? -cosTable[half - r]! : cosTable[r]!; // cos(π − a) = −cos(a)
    k += step;
    if (k >= period) k -= period;
  }
}
