import type { GeometricSampler } from '../../random/geometricSampler.js';
import type { Xoroshiro128PlusSource } from '../../random/randomSource.js';

const TWO_POW_32 = 4294967296;
const TWO_POW_MINUS_32 = 1 / TWO_POW_32;
/** Up to this n, x · n < 2^53 for every 32-bit x, so Lemire's product is exact in a double. */
const LEMIRE_LIMIT = 2097152; // 2^21

/**
 * `count` stationary-bootstrap resample deviations d̄* − d̄ from the project's generator, with the
 * generator, the start draw and the length draw inlined in one loop: the same numbers, bit for
 * bit, as `drawStationaryBlocks` followed by `resampleMeanDeviation` on the same source (checked
 * by a property test), at a fraction of the cost, because the xoroshiro128+ state lives in local
 * variables, each 64-bit output serves two 32-bit words (usually the start and the length of one
 * block, or two starts when b = 1), and nothing is called per block. For b > 1 the draws of a
 * resample fill two Int32 buffers first and a second, short loop sums the blocks: kept apart, the
 * memory reads of many blocks are in flight at once (measured: fusing the two loops was slower
 * for b ≥ 5); for b = 1 the fused loop was faster (one read per block), so it sums as it draws.
 *
 * What it computes, per resample (Politis & Romano 1994): blocks until the lengths reach n; each
 * block's start is `uniformIndex(word, n)` (Lemire 2019 for n ≤ 2^21, else bitmask rejection),
 * its length `sampler.sample` (Walker's alias table, capped at what is left), and its sum
 * P[s + ℓ] − P[s] from the centred prefix sums P laid out twice; the deviation is the sum of the
 * block sums in block order, divided by n. With b = 1 every block has length 1 and its sum is
 * P[s + 1] − P[s], read from a table of those n differences (the same doubles).
 *
 * Rare branches (a rejected start, a coin on the alias table's edge, a length past the table)
 * hand the state back to `source` and use its methods, then reload it (written out at each place:
 * a helper closure would move the state out of registers). On return the source is
 * advanced exactly as the generic path would have left it.
 */
export function resampleDeviationsInline(
  prefix: Float64Array,
  n: number,
  sampler: GeometricSampler,
  source: Xoroshiro128PlusSource,
  count: number,
): Float64Array {
  if (sampler.inline === null) return unitBlocks(prefix, n, source, count);
  return geometricBlocks(prefix, n, sampler, source, count);
}

/** b = 1: every block is one observation. */
function unitBlocks(
  prefix: Float64Array,
  n: number,
  source: Xoroshiro128PlusSource,
  count: number,
): Float64Array {
  // Local copies of the constants: folded into the machine code, not loaded per use.
  const P32 = 4294967296;
  const INV32 = 1 / 4294967296;
  const out = new Float64Array(count);
  const lemire = n <= LEMIRE_LIMIT;
  const threshold = P32 % n;
  const maskShift = Math.clz32(n - 1);
  let s00 = source.s00;
  let s01 = source.s01;
  let s10 = source.s10;
  let s11 = source.s11;
  let pend = source.pending;
  let has = source.hasPending;

  const step = new Float64Array(n);
  for (let s = 0; s < n; s++) step[s] = prefix[s + 1]! - prefix[s]!;
  for (let r = 0; r < count; r++) {
    let filled = 0;
    let sum = 0;
    while (filled < n) {
      if (lemire && !has) {
        // The common case, in a tight loop: two starts from one output, its high word, then its
        // low word. A rejected word leaves the loop; the rest of the stream is the same.
        const stop = n - 1;
        let rejected = false;
        while (filled < stop) {
          const lo = (s00 >>> 0) + (s10 >>> 0);
          const c = lo >= P32 ? 1 : 0;
          const low = lo | 0;
          const high = (s01 + s11 + c) >>> 0;
          const a0 = s10 ^ s00;
          const a1 = s11 ^ s01;
          const t00 = s00;
          s00 = (t00 << 24) ^ (s01 >>> 8) ^ a0 ^ (a0 << 16);
          s01 = (s01 << 24) ^ (t00 >>> 8) ^ a1 ^ ((a1 << 16) | (a0 >>> 16));
          s10 = (a1 << 5) ^ (a0 >>> 27);
          s11 = (a0 << 5) ^ (a1 >>> 27);
          const m1 = high * n;
          const first = Math.floor(m1 * INV32);
          if (m1 - first * P32 < threshold) {
            // The low word is the next in the stream.
            pend = low;
            has = true;
            rejected = true;
            break;
          }
          sum += step[first]!;
          filled++;
          const m2 = (low >>> 0) * n;
          const second = Math.floor(m2 * INV32);
          if (m2 - second * P32 < threshold) {
            rejected = true;
            break;
          }
          sum += step[second]!;
          filled++;
        }
        if (rejected) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          sum += step[rejectedStart(source, n, threshold)]!;
          filled++;
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
          continue;
        }
        if (filled >= n) break;
      }
      let x: number;
      if (has) {
        x = pend >>> 0;
        has = false;
      } else {
        const lo = (s00 >>> 0) + (s10 >>> 0);
        const c = lo >= P32 ? 1 : 0;
        pend = lo | 0;
        has = true;
        x = (s01 + s11 + c) >>> 0;
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const t00 = s00;
        s00 = (t00 << 24) ^ (s01 >>> 8) ^ a0 ^ (a0 << 16);
        s01 = (s01 << 24) ^ (t00 >>> 8) ^ a1 ^ ((a1 << 16) | (a0 >>> 16));
        s10 = (a1 << 5) ^ (a0 >>> 27);
        s11 = (a0 << 5) ^ (a1 >>> 27);
      }
      let start: number;
      if (lemire) {
        const m = x * n;
        start = Math.floor(m * INV32);
        if (m - start * P32 < threshold) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = rejectedStart(source, n, threshold);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      } else {
        start = maskShift === 0 ? x : x >>> maskShift;
        if (start >= n) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = bitmaskStart(source, n, maskShift);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      }
      sum += step[start]!;
      filled++;
    }
    out[r] = sum / n;
  }
  source.s00 = s00;
  source.s01 = s01;
  source.s10 = s10;
  source.s11 = s11;
  source.pending = pend;
  source.hasPending = has;
  return out;
}

/** b > 1: geometric lengths through the sampler's alias table. */
function geometricBlocks(
  prefix: Float64Array,
  n: number,
  sampler: GeometricSampler,
  source: Xoroshiro128PlusSource,
  count: number,
): Float64Array {
  // Local copies of the constants: folded into the machine code, not loaded per use.
  const P32 = 4294967296;
  const INV32 = 1 / 4294967296;
  const out = new Float64Array(count);
  const inline = sampler.inline!;
  const lemire = n <= LEMIRE_LIMIT;
  const threshold = P32 % n;
  const maskShift = Math.clz32(n - 1);
  let s00 = source.s00;
  let s01 = source.s01;
  let s10 = source.s10;
  let s11 = source.s11;
  let pend = source.pending;
  let has = source.hasPending;

  const { shift, coinMask, edge, alias, truncation } = inline;
  const starts = new Int32Array(n);
  const lengths = new Int32Array(n);
  for (let r = 0; r < count; r++) {
    let filled = 0;
    let blocks = 0;
    while (filled < n) {
      // The start: the next word.
      let x: number;
      if (has) {
        x = pend >>> 0;
        has = false;
      } else {
        const lo = (s00 >>> 0) + (s10 >>> 0);
        const c = lo >= P32 ? 1 : 0;
        pend = lo | 0;
        has = true;
        x = (s01 + s11 + c) >>> 0;
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const t00 = s00;
        s00 = (t00 << 24) ^ (s01 >>> 8) ^ a0 ^ (a0 << 16);
        s01 = (s01 << 24) ^ (t00 >>> 8) ^ a1 ^ ((a1 << 16) | (a0 >>> 16));
        s10 = (a1 << 5) ^ (a0 >>> 27);
        s11 = (a0 << 5) ^ (a1 >>> 27);
      }
      let start: number;
      if (lemire) {
        const m = x * n;
        start = Math.floor(m * INV32);
        if (m - start * P32 < threshold) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = rejectedStart(source, n, threshold);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      } else {
        start = maskShift === 0 ? x : x >>> maskShift;
        if (start >= n) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = bitmaskStart(source, n, maskShift);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      }
      // The length: the next word, through the alias table.
      let y: number;
      if (has) {
        y = pend >>> 0;
        has = false;
      } else {
        const lo = (s00 >>> 0) + (s10 >>> 0);
        const c = lo >= P32 ? 1 : 0;
        pend = lo | 0;
        has = true;
        y = (s01 + s11 + c) >>> 0;
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const t00 = s00;
        s00 = (t00 << 24) ^ (s01 >>> 8) ^ a0 ^ (a0 << 16);
        s01 = (s01 << 24) ^ (t00 >>> 8) ^ a1 ^ ((a1 << 16) | (a0 >>> 16));
        s10 = (a1 << 5) ^ (a0 >>> 27);
        s11 = (a0 << 5) ^ (a1 >>> 27);
      }
      const column = y >>> shift;
      const coin = y & coinMask;
      const cut = edge[column]!;
      let length: number;
      if (coin !== cut) {
        const outcome = coin < cut ? column : alias[column]!;
        length = outcome !== truncation ? outcome + 1 : -1;
      } else {
        length = -1;
      }
      const left = n - filled;
      if (length < 0) {
        // An edge coin or an overflow: finish this length with the sampler's own code, which
        // draws exactly what the generic path draws after this word.
        source.s00 = s00;
        source.s01 = s01;
        source.s10 = s10;
        source.s11 = s11;
        source.pending = pend;
        source.hasPending = has;
        length = finishLength(source, sampler, column, coin, cut, left);
        s00 = source.s00;
        s01 = source.s01;
        s10 = source.s10;
        s11 = source.s11;
        pend = source.pending;
        has = source.hasPending;
      } else if (length > left) {
        length = left;
      }
      starts[blocks] = start;
      lengths[blocks] = length;
      blocks++;
      filled += length;
    }
    let sum = 0;
    for (let i = 0; i < blocks; i++) {
      const s = starts[i]!;
      sum += prefix[s + lengths[i]!]! - prefix[s]!;
    }
    out[r] = sum / n;
  }
  source.s00 = s00;
  source.s01 = s01;
  source.s10 = s10;
  source.s11 = s11;
  source.pending = pend;
  source.hasPending = has;
  return out;
}

/** Lemire's rejection loop after a first word was rejected: draws words until one is kept. */
function rejectedStart(source: Xoroshiro128PlusSource, n: number, threshold: number): number {
  for (;;) {
    const m = source.nextUint32() * n;
    const high = Math.floor(m * TWO_POW_MINUS_32);
    if (m - high * TWO_POW_32 >= threshold) return high;
  }
}

/** Bitmask rejection (n > 2^21) after a first word was rejected. */
function bitmaskStart(source: Xoroshiro128PlusSource, n: number, maskShift: number): number {
  for (;;) {
    const x = source.nextUint32();
    const candidate = maskShift === 0 ? x : x >>> maskShift;
    if (candidate < n) return candidate;
  }
}

/**
 * The rest of `sampler.sample(source, cap)` after its first word gave `column`, `coin`, `cut`:
 * the edge coin's `nextDouble`, then, on overflow, further draws through `sampler.sample`
 * (memoryless: ℓ − L given ℓ > L has the same law, and `sample` restarts exactly that loop).
 */
function finishLength(
  source: Xoroshiro128PlusSource,
  sampler: GeometricSampler,
  column: number,
  coin: number,
  cut: number,
  cap: number,
): number {
  const { edgeFraction, alias, truncation } = sampler.inline!;
  const keep = coin !== cut ? coin < cut : source.nextDouble() < edgeFraction[column]!;
  const outcome = keep ? column : alias[column]!;
  if (outcome !== truncation) return Math.min(outcome + 1, cap);
  if (truncation >= cap) return cap;
  return truncation + sampler.sample(source, cap - truncation);
}
