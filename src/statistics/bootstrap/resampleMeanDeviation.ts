import type { StationaryBlocks } from './stationaryBlocks.js';

/**
 * The deterministic step of the stationary bootstrap of the mean: given the blocks of one
 * resample, returns d̄* − d̄ = (1/n) Σ_blocks (P[s + ℓ] − P[s]), with P the centred prefix sums laid
 * out twice (`centredPrefixSums`). O(number of blocks), no per-observation work.
 *
 * Conventions: divide by n; blocks as drawn by `drawStationaryBlocks` (0-based starts on 0..n−1,
 * lengths ≥ 1 summing to n, so s + ℓ ≤ 2n − 1 always indexes inside P).
 *
 * Example: d = (1, 2, 3) (P = (0, −1, −1, 0, −1, −1, 0)), blocks (start 2, length 3) resample
 * (3, 1, 2): (P[5] − P[2])/3 = 0, and indeed mean(3, 1, 2) − 2 = 0; blocks (2, 1), (2, 1), (0, 1)
 * resample (3, 3, 1): ((P[3] − P[2]) + (P[3] − P[2]) + (P[1] − P[0]))/3 = 1/3 = 7/3 − 2.
 */
export function resampleMeanDeviation(
  prefix: Float64Array,
  n: number,
  blocks: StationaryBlocks,
): number {
  const { starts, lengths, count } = blocks;
  let sum = 0;
  for (let i = 0; i < count; i++) {
    const s = starts[i]!;
    sum += prefix[s + lengths[i]!]! - prefix[s]!;
  }
  return sum / n;
}
