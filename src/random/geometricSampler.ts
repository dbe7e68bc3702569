import { buildAliasTable } from './aliasTable.js';
import type { RandomSource } from './randomSource.js';

/**
 * Geometric lengths on 1, 2, 3, … with P(ℓ = k) = p(1 − p)^{k−1}, p = 1/b, mean b (b ≥ 1), drawn
 * exactly, without a logarithm, from about one 32-bit step per length.
 *
 * Method: the pmf truncated to 1..L plus one "overflow" outcome of probability q^L (q = 1 − p) is
 * put in an alias table with K = L + 1 = 2^j columns (Walker 1977, "An efficient method for
 * generating discrete random variables with general distributions", ACM TOMS 3(3); built by
 * Vose's method, `buildAliasTable`). One `nextUint32` x gives the column (its top j bits) and the
 * first 32 − j bits r of the coin f = (r + V)/2^{32−j}, V uniform on [0, 1); since
 * f < t ⇔ r + V < t·2^{32−j}, V is needed (one `nextDouble`) only when r = ⌊t·2^{32−j}⌋, which
 * happens with probability ≤ 2^{j−32}. On overflow the sampler adds L and draws again: by the
 * memorylessness of the geometric law, ℓ − L given ℓ > L is geometric with the same p. So the
 * result is exactly geometric, up to the rounding of the table's probabilities to doubles (the
 * same order as the rounding of inversion, ⌈log U / log q⌉).
 * K is the smallest power of two with q^{K−1} ≤ 2^−10 (at most 4,096), so at most about one draw
 * in a thousand overflows.
 *
 * Conventions: `sample(random, cap)` returns min(ℓ, cap) for an integer cap ≥ 1 (the stationary
 * bootstrap cuts its last block anyway; the cap stops long draws early, which leaves the law of
 * min(ℓ, cap) unchanged). b = 1 gives ℓ = 1 with probability 1 and draws nothing.
 *
 * Example: `createGeometricSampler(4).sample(random, 1e9)` has mean 4 and variance
 * (1 − p)/p² = 12.
 */
export interface GeometricSampler {
  /** The mean b = 1/p. */
  readonly mean: number;
  /** L: lengths 1..L are in the table; longer ones go through the overflow outcome. */
  readonly truncation: number;
  /** The alias table over outcomes 0..L (length outcome + 1; L = overflow), 2^j = L + 1 columns. */
  readonly table: { readonly threshold: Float64Array; readonly alias: Int32Array };
  /**
   * What `sample` reads, for loops that inline it (`resampleDeviationsInline`): column = x >>> shift,
   * coin = x & coinMask, kept when coin < edge[column] (coin = edge[column]: one `nextDouble`
   * against edgeFraction[column]); outcome `truncation` is the overflow. null when b = 1.
   */
  readonly inline: {
    readonly shift: number;
    readonly coinMask: number;
    readonly edge: Float64Array;
    readonly edgeFraction: Float64Array;
    readonly alias: Int32Array;
    readonly truncation: number;
  } | null;
  sample(random: RandomSource, cap: number): number;
}

const MAX_COLUMNS_LOG2 = 12;
const OVERFLOW_PROBABILITY = 1 / 1024;

export function createGeometricSampler(mean: number): GeometricSampler {
  if (!(Number.isFinite(mean) && mean >= 1)) {
    throw new RangeError(`the mean of a geometric length must be a finite number ≥ 1, got ${mean}`);
  }
  if (mean === 1) {
    const table = { threshold: Float64Array.of(1, 0), alias: Int32Array.of(0, 0) };
    return { mean, truncation: 1, table, inline: null, sample: () => 1 };
  }
  const p = 1 / mean;
  const q = 1 - p;
  let bits = 1;
  while (bits < MAX_COLUMNS_LOG2 && q ** (2 ** bits - 1) > OVERFLOW_PROBABILITY) bits++;
  const columns = 2 ** bits;
  const truncation = columns - 1;
  const probabilities = new Float64Array(columns);
  for (let k = 1; k <= truncation; k++) probabilities[k - 1] = p * q ** (k - 1);
  probabilities[truncation] = q ** truncation;
  const { threshold, alias } = buildAliasTable(probabilities);
  const shift = 32 - bits;
  const coinMask = 2 ** shift - 1;
  const coinScale = 2 ** shift;
  const edge = new Float64Array(columns);
  const edgeFraction = new Float64Array(columns);
  for (let i = 0; i < columns; i++) {
    const scaled = threshold[i]! * coinScale;
    edge[i] = Math.floor(scaled);
    edgeFraction[i] = scaled - edge[i]!;
  }
  const overflow = truncation;

  return {
    mean,
    truncation,
    table: { threshold, alias },
    inline: { shift, coinMask, edge, edgeFraction, alias, truncation },
    sample(random: RandomSource, cap: number): number {
      let total = 0;
      for (;;) {
        const x = random.nextUint32();
        const column = x >>> shift;
        const coin = x & coinMask;
        const cut = edge[column]!;
        const keep = coin !== cut ? coin < cut : random.nextDouble() < edgeFraction[column]!;
        const outcome = keep ? column : alias[column]!;
        if (outcome !== overflow) {
          total += outcome + 1;
          return Math.min(total, cap);
        }
        total += truncation;
        if (total >= cap) return cap;
      }
    },
  };
}
