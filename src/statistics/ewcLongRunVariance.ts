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
 * as accurate as one `Math.cos` each (n = 10⁵ is about 10⁸ table reads). The rows of weights are
 * kept for the next call with the same n (a comparison calls this once per series and per margin
 * check, all with the same n and with ν from 2 to ⌊n/2⌋), when they fit in WEIGHTS_KEPT entries,
 * and four terms are summed side by side; each Λ_j is still summed over t in order, so the
 * result is the same to the bit as summing one term at a time.
 *
 * @example ewcLongRunVariance(new Float64Array([1, 2, 3, 4])) // ν = 2, value ≈ 2.4874
 * @throws RangeError when ν is not an integer in 1..n−1 (higher cosines alias lower ones).
 */
export function ewcLongRunVariance(
  x: Float64Array,
  degreesOfFreedom: number = ewcDegreesOfFreedom(x.length),
): EwcLongRunVariance {
  const nu = checkedTerms('ewcLongRunVariance', x.length, degreesOfFreedom);
  const lambda = ewcCosineTransforms(centred(x), null, nu).first;
  let sumOfSquares = 0;
  for (let j = 0; j < nu; j++) sumOfSquares += lambda[j]! * lambda[j]!;
  return { value: sumOfSquares / nu, degreesOfFreedom: nu };
}

/** ν itself, or a RangeError naming `caller` when ν is not an integer in 1..n−1. */
export function checkedTerms(caller: string, n: number, nu: number): number {
  if (!Number.isInteger(nu) || nu < 1 || nu > n - 1) {
    throw new RangeError(`${caller}: ν must be an integer in 1..${n - 1} for n = ${n}, got ${nu}`);
  }
  return nu;
}

/**
 * The cosine transforms Λ_j = √(2/n) Σ_{t=1..n} cos(π j (t − ½)/n) u_t, j = 1..ν, of one centred
 * series u, or of two (u and v, the same length) in one pass: each row of weights is read once
 * for both, so the long-run covariance of two series (`ewcLongRunCovariance`) takes one pass over
 * the weights instead of the three of polarisation. `first[j − 1]` is Λ_j(u), `second[j − 1]`
 * Λ_j(v).
 *
 * Conventions: u and v are centred by the caller (the estimator centres at the mean); ν is
 * checked by the caller (1..n−1). Weights come from the kept rows when n·ν fits (see
 * `ewcLongRunVariance`), and four terms are summed side by side, each over t in order, so every
 * Λ_j is the same to the bit whether computed alone, in a block, or beside a second series.
 */
export function ewcCosineTransforms(
  u: Float64Array,
  v: Float64Array | null,
  nu: number,
): { readonly first: Float64Array; readonly second: Float64Array | null } {
  const n = u.length;
  const first = new Float64Array(nu);
  const second = v === null ? null : new Float64Array(nu);
  const allRows = keptWeights(n, nu);
  const scratch = allRows === null ? new Float64Array(BLOCK * n) : null;
  const cosTable = allRows === null ? cosineTable(n) : null;
  const scale = Math.sqrt(2 / n);
  // BLOCK terms at a time: their sums run side by side, each over t in order, so every Λ_j is
  // summed exactly as alone, without waiting on one addition after another.
  for (let j0 = 1; j0 <= nu; j0 += BLOCK) {
    const count = Math.min(BLOCK, nu - j0 + 1);
    let weights: Float64Array;
    let at: number;
    if (allRows === null) {
      for (let b = 0; b < count; b++) cosineRow(j0 + b, n, cosTable!, scratch!, b * n);
      weights = scratch!;
      at = 0;
    } else {
      weights = allRows;
      at = (j0 - 1) * n;
    }
    const j = j0 - 1;
    if (count === BLOCK && v === null) {
      const at1 = at + n;
      const at2 = at1 + n;
      const at3 = at2 + n;
      let l0 = 0;
      let l1 = 0;
      let l2 = 0;
      let l3 = 0;
      for (let t = 0; t < n; t++) {
        const x = u[t]!;
        l0 += weights[at + t]! * x;
        l1 += weights[at1 + t]! * x;
        l2 += weights[at2 + t]! * x;
        l3 += weights[at3 + t]! * x;
      }
      first[j] = l0 * scale;
      first[j + 1] = l1 * scale;
      first[j + 2] = l2 * scale;
      first[j + 3] = l3 * scale;
    } else if (count === BLOCK && v !== null) {
      const at1 = at + n;
      const at2 = at1 + n;
      const at3 = at2 + n;
      let l0 = 0;
      let l1 = 0;
      let l2 = 0;
      let l3 = 0;
      let k0 = 0;
      let k1 = 0;
      let k2 = 0;
      let k3 = 0;
      for (let t = 0; t < n; t++) {
        const x = u[t]!;
        const y = v[t]!;
        const w0 = weights[at + t]!;
        const w1 = weights[at1 + t]!;
        const w2 = weights[at2 + t]!;
        const w3 = weights[at3 + t]!;
        l0 += w0 * x;
        l1 += w1 * x;
        l2 += w2 * x;
        l3 += w3 * x;
        k0 += w0 * y;
        k1 += w1 * y;
        k2 += w2 * y;
        k3 += w3 * y;
      }
      first[j] = l0 * scale;
      first[j + 1] = l1 * scale;
      first[j + 2] = l2 * scale;
      first[j + 3] = l3 * scale;
      second![j] = k0 * scale;
      second![j + 1] = k1 * scale;
      second![j + 2] = k2 * scale;
      second![j + 3] = k3 * scale;
    } else {
      for (let b = 0; b < count; b++) {
        const row = at + b * n;
        let l = 0;
        let k = 0;
        for (let t = 0; t < n; t++) {
          const w = weights[row + t]!;
          l += w * u[t]!;
          if (v !== null) k += w * v[t]!;
        }
        first[j + b] = l * scale;
        if (second !== null) second[j + b] = k * scale;
      }
    }
  }
  return { first, second };
}

/** Terms summed side by side. */
const BLOCK = 4;

/** Most weights kept between calls: 2^21 doubles (16 MiB), e.g. n = 10,000 with ν = 186. */
export const WEIGHTS_KEPT = 1 << 21;

/** The weight rows built so far for one n (j = 1..rows), kept for the next call. */
let kept: { readonly n: number; readonly rows: number; readonly weights: Float64Array } | null =
  null;

/**
 * The ν rows cos(π j (2t + 1)/(2n)), j = 1..ν, t = 0..n−1, row after row (possibly followed by
 * more rows), from the kept rows, extended when ν is larger; null when n·ν is too many to keep.
 */
function keptWeights(n: number, nu: number): Float64Array | null {
  if (n * nu > WEIGHTS_KEPT) return null;
  if (kept === null || kept.n !== n || kept.rows < nu) {
    const weights = new Float64Array(n * nu);
    let from = 1;
    if (kept !== null && kept.n === n) {
      weights.set(kept.weights);
      from = kept.rows + 1;
    }
    const cosTable = cosineTable(n);
    for (let j = from; j <= nu; j++) cosineRow(j, n, cosTable, weights, (j - 1) * n);
    kept = { n, rows: nu, weights };
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
