import { createGeometricSampler, type GeometricSampler } from '../../random/geometricSampler.js';
import {
  createRandomSource,
  type RandomSource,
  randomStreams,
  type SequentialRandomSourceFactory,
  Xoroshiro128PlusSource,
} from '../../random/randomSource.js';
import { resampleDeviationsInline } from './resampleDeviationsInline.js';
import { resampleMeanDeviation } from './resampleMeanDeviation.js';
import { allocateStationaryBlocks, drawStationaryBlocks } from './stationaryBlocks.js';

/**
 * Resample b (0-based) draws from stream ⌊b / RESAMPLES_PER_STREAM⌋ of the seed, resamples of one
 * stream in order. Fixed, so splitting the work by stream across threads gives the same numbers
 * whatever the number of threads.
 */
export const RESAMPLES_PER_STREAM = 256;

/**
 * The resampling work of one stationary bootstrap of the mean, as plain data: the centred prefix
 * sums of the series laid out twice (`centredPrefixSums`, length 2n + 1), the series length n, the
 * mean block length b, the number of resamples B and the seed. Its work units are the streams
 * 0..S − 1, S = ⌈B / RESAMPLES_PER_STREAM⌉ (`streamCount`).
 */
export interface ResampleJob {
  readonly prefix: Float64Array;
  readonly n: number;
  readonly expectedBlockLength: number;
  readonly resamples: number;
  readonly seed: number;
}

/**
 * Computes a job's B deviations d̄*_b − d̄ in resample order. Every runner must return exactly what
 * `runResampleJob(job, random)` returns (same numbers, bit for bit); runners differ only in where
 * the streams are computed (this thread, or worker threads: see src/parallel/).
 */
export type ResampleRunner = (
  job: ResampleJob,
  random: SequentialRandomSourceFactory,
) => Float64Array;

/** S = ⌈B / RESAMPLES_PER_STREAM⌉, the number of streams (work units) of B resamples. */
export function streamCount(resamples: number): number {
  return Math.ceil(resamples / RESAMPLES_PER_STREAM);
}

/** The resamples of stream k: `first` = k · RESAMPLES_PER_STREAM, `count` ≤ RESAMPLES_PER_STREAM. */
export function streamShare(resamples: number, stream: number): { first: number; count: number } {
  const first = stream * RESAMPLES_PER_STREAM;
  return { first, count: Math.max(0, Math.min(RESAMPLES_PER_STREAM, resamples - first)) };
}

/**
 * The in-thread runner: streams 0..S − 1 in order, walked with `randomStreams` (one jump per
 * stream for the project's generator, so setup is O(S)), each stream's share written at its
 * place. The reference every other runner must reproduce.
 */
export function runResampleJob(
  job: ResampleJob,
  random: SequentialRandomSourceFactory = createRandomSource,
): Float64Array {
  const out = new Float64Array(job.resamples);
  const sampler = createGeometricSampler(job.expectedBlockLength);
  const streams = randomStreams(random, job.seed, 0);
  const total = streamCount(job.resamples);
  for (let stream = 0; stream < total; stream++) {
    const { first, count } = streamShare(job.resamples, stream);
    out.set(resampleDeviationsOfStream(job.prefix, job.n, sampler, streams.next(), count), first);
  }
  return out;
}

/**
 * `count` consecutive resample deviations drawn from one random source: the unit of work that a
 * thread can take (stream k yields resamples k·RESAMPLES_PER_STREAM onwards). The project's own
 * generator goes through the inlined kernel (`resampleDeviationsInline`, same numbers); any other
 * source through `drawStationaryBlocks` and `resampleMeanDeviation`.
 */
export function resampleDeviationsOfStream(
  prefix: Float64Array,
  n: number,
  sampler: GeometricSampler,
  random: RandomSource,
  count: number,
): Float64Array {
  if (random instanceof Xoroshiro128PlusSource && n >= 2) {
    return resampleDeviationsInline(prefix, n, sampler, random, count);
  }
  return resampleDeviationsGeneric(prefix, n, sampler, random, count);
}

/** `resampleDeviationsOfStream` through the RandomSource interface, for any source. */
export function resampleDeviationsGeneric(
  prefix: Float64Array,
  n: number,
  sampler: GeometricSampler,
  random: RandomSource,
  count: number,
): Float64Array {
  const out = new Float64Array(count);
  const blocks = allocateStationaryBlocks(n);
  for (let b = 0; b < count; b++) {
    drawStationaryBlocks(n, sampler, random, blocks);
    out[b] = resampleMeanDeviation(prefix, n, blocks);
  }
  return out;
}
