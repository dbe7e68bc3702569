import { createGeometricSampler } from '../../src/random/geometricSampler.js';
import { createRandomSource, randomStreams } from '../../src/random/randomSource.js';
import { RESAMPLES_PER_STREAM } from '../../src/statistics/bootstrap/resampleJob.js';
import {
  allocateStationaryBlocks,
  drawStationaryBlocks,
} from '../../src/statistics/bootstrap/stationaryBlocks.js';

/**
 * The B × n matrix of 0-based observation indices of the stationary-bootstrap resamples for
 * (n, b, B, seed), resample b from stream ⌊b / RESAMPLES_PER_STREAM⌋ as the engine draws them
 * (blocks wrapped circularly). Row-major: indices[b·n + t].
 */
export function stationaryIndexMatrix(
  n: number,
  expectedBlockLength: number,
  resamples: number,
  seed: number,
): Int32Array {
  const out = new Int32Array(resamples * n);
  const sampler = createGeometricSampler(expectedBlockLength);
  const streams = randomStreams(createRandomSource, seed, 0);
  const blocks = allocateStationaryBlocks(n);
  let random = streams.next();
  for (let b = 0; b < resamples; b++) {
    if (b > 0 && b % RESAMPLES_PER_STREAM === 0) random = streams.next();
    drawStationaryBlocks(n, sampler, random, blocks);
    let t = 0;
    for (let i = 0; i < blocks.count; i++) {
      for (let j = 0; j < blocks.lengths[i]!; j++) out[b * n + t++] = (blocks.starts[i]! + j) % n;
    }
  }
  return out;
}

/** L̄*_b − L̄ for each resample row of the index matrix, summed directly over the indices. */
export function deviationsFromIndices(
  x: Float64Array,
  indices: Int32Array,
  resamples: number,
): Float64Array {
  const n = x.length;
  let mean = 0;
  for (const v of x) mean += v;
  mean /= n;
  const out = new Float64Array(resamples);
  for (let b = 0; b < resamples; b++) {
    let sum = 0;
    for (let t = 0; t < n; t++) sum += x[indices[b * n + t]!]!;
    out[b] = sum / n - mean;
  }
  return out;
}
