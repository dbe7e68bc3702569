import type { StationaryBlocks } from '../../../src/statistics/bootstrap/stationaryBlocks.js';

/** The resample mean observation by observation: block (s, ℓ) contributes d_{(s+j) mod n}, j < ℓ. */
export function naiveResampleMean(d: Float64Array, blocks: StationaryBlocks): number {
  const n = d.length;
  let sum = 0;
  let count = 0;
  for (let i = 0; i < blocks.count; i++) {
    for (let j = 0; j < blocks.lengths[i]!; j++) {
      sum += d[(blocks.starts[i]! + j) % n]!;
      count++;
    }
  }
  if (count !== n) throw new Error(`blocks cover ${count} observations, not ${n}`);
  return sum / n;
}

/** Blocks from explicit (start, length) pairs. */
export function blocksOf(pairs: readonly (readonly [number, number])[]): StationaryBlocks {
  return {
    starts: Int32Array.from(pairs.map(([s]) => s)),
    lengths: Int32Array.from(pairs.map(([, l]) => l)),
    count: pairs.length,
  };
}
