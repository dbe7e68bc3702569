import type { GeometricSampler } from '../../random/geometricSampler.js';
import type { RandomSource } from '../../random/randomSource.js';
import { uniformIndex } from '../../random/uniformIndex.js';

/**
 * The blocks of one stationary-bootstrap resample: block i starts at starts[i] (0-based, on the
 * circle) and has lengths[i] observations, for i < count. Buffers may be longer than count.
 */
export interface StationaryBlocks {
  readonly starts: Int32Array;
  readonly lengths: Int32Array;
  count: number;
}

/** Buffers large enough for any resample of a series of length n (at most n blocks). */
export function allocateStationaryBlocks(n: number): StationaryBlocks {
  return { starts: new Int32Array(n), lengths: new Int32Array(n), count: 0 };
}

/**
 * The random step of the stationary bootstrap (Politis & Romano 1994, "The stationary
 * bootstrap", JASA 89(428)): block starts uniform on 0..n − 1 and geometric lengths with mean b,
 * drawn until the lengths reach n; the last block is cut so the lengths sum to exactly n.
 *
 * Conventions: per block, first the start (`uniformIndex`), then the length (`sampler`, capped at
 * what is left) — this order is part of the reproducibility contract. Writes into `into` (reused
 * across resamples to avoid allocation) and returns it.
 *
 * Example: n = 5, b = 2 might give starts (3, 0), lengths (4, 1): observations 3, 4, 0, 1 then 0.
 */
export function drawStationaryBlocks(
  n: number,
  sampler: GeometricSampler,
  random: RandomSource,
  into: StationaryBlocks = allocateStationaryBlocks(n),
): StationaryBlocks {
  const { starts, lengths } = into;
  let filled = 0;
  let count = 0;
  while (filled < n) {
    starts[count] = uniformIndex(random, n);
    const length = sampler.sample(random, n - filled);
    lengths[count] = length;
    filled += length;
    count++;
  }
  into.count = count;
  return into;
}
