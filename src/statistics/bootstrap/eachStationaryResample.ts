import { createGeometricSampler } from '../../random/geometricSampler.js';
import { randomStreams, type SequentialRandomSourceFactory } from '../../random/randomSource.js';
import { RESAMPLES_PER_STREAM } from './resampleJob.js';
import {
  allocateStationaryBlocks,
  drawStationaryBlocks,
  type StationaryBlocks,
} from './stationaryBlocks.js';

/**
 * Draws the blocks of B stationary-bootstrap resamples (Politis & Romano 1994) of a series of
 * length n in the project's stream layout, resample b from stream ⌊b / RESAMPLES_PER_STREAM⌋ of
 * `seed`, resamples of one stream in order, and hands each to `visit(b, blocks)`: the same blocks
 * `stationaryBootstrap` resamples with the same options, for the callers that need more from a
 * resample than its mean. The `blocks` buffer is reused: read it before `visit` returns.
 *
 * @example forEachStationaryResample(3, 2, 39, 1, createRandomSource, (b, blocks) => …)
 */
export function forEachStationaryResample(
  n: number,
  expectedBlockLength: number,
  resamples: number,
  seed: number,
  random: SequentialRandomSourceFactory,
  visit: (resample: number, blocks: StationaryBlocks) => void,
): void {
  const sampler = createGeometricSampler(expectedBlockLength);
  const blocks = allocateStationaryBlocks(n);
  const streams = randomStreams(random, seed, 0);
  for (let first = 0; first < resamples; first += RESAMPLES_PER_STREAM) {
    const source = streams.next();
    const last = Math.min(resamples, first + RESAMPLES_PER_STREAM);
    for (let b = first; b < last; b++) visit(b, drawStationaryBlocks(n, sampler, source, blocks));
  }
}
