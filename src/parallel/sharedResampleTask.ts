import { createGeometricSampler, type GeometricSampler } from '../random/geometricSampler.js';
import { createRandomStreams, type RandomStreams } from '../random/randomSource.js';
import {
  resampleDeviationsOfStream,
  streamCount,
  streamShare,
} from '../statistics/bootstrap/resampleJob.js';

/**
 * One resampling job laid out in shared memory, so that any number of threads can work on it:
 * `prefix` holds the centred prefix sums (Float64, 2n + 1), `out` receives the B deviations
 * (Float64, B) and `control` (Int32) holds the next unclaimed stream, the number of finished
 * streams and a failure flag. Threads claim streams one at a time with an atomic increment, so
 * the work balances itself; each stream's deviations land at that stream's place in `out`, so the
 * result does not depend on which thread computed what.
 */
export interface SharedResampleTask {
  readonly prefix: SharedArrayBuffer;
  readonly out: SharedArrayBuffer;
  readonly control: SharedArrayBuffer;
  readonly n: number;
  readonly expectedBlockLength: number;
  readonly resamples: number;
  readonly seed: number;
}

export const NEXT_STREAM = 0;
export const FINISHED_STREAMS = 1;
export const FAILED = 2;
const CONTROL_SLOTS = 3;

/** Copies a job into fresh shared buffers. */
export function shareResampleJob(job: {
  prefix: Float64Array;
  n: number;
  expectedBlockLength: number;
  resamples: number;
  seed: number;
}): SharedResampleTask {
  const prefix = new SharedArrayBuffer(job.prefix.length * Float64Array.BYTES_PER_ELEMENT);
  new Float64Array(prefix).set(job.prefix);
  return {
    prefix,
    out: new SharedArrayBuffer(job.resamples * Float64Array.BYTES_PER_ELEMENT),
    control: new SharedArrayBuffer(CONTROL_SLOTS * Int32Array.BYTES_PER_ELEMENT),
    n: job.n,
    expectedBlockLength: job.expectedBlockLength,
    resamples: job.resamples,
    seed: job.seed,
  };
}

/**
 * Claims and computes streams of `task` until none is left; used alike by the calling thread and
 * by the workers. Streams are claimed in increasing order, so one generator walks forward through
 * them (one jump per stream passed). A thrown error is reported, sets the failure flag and still
 * counts the stream as finished, so a waiting thread wakes up; then it is rethrown. Returns the
 * number of streams this thread computed.
 */
export function workOnSharedTask(
  task: SharedResampleTask,
  reportFailure: (message: string) => void = () => {},
): number {
  const control = new Int32Array(task.control);
  const prefix = new Float64Array(task.prefix);
  const out = new Float64Array(task.out);
  const total = streamCount(task.resamples);
  let sampler: GeometricSampler | null = null;
  let streams: RandomStreams | null = null;
  let nextIndex = 0;
  let done = 0;
  for (;;) {
    const stream = Atomics.add(control, NEXT_STREAM, 1);
    if (stream >= total) return done;
    try {
      sampler ??= createGeometricSampler(task.expectedBlockLength);
      if (streams === null) {
        streams = createRandomStreams(task.seed, stream);
        nextIndex = stream;
      }
      for (; nextIndex < stream; nextIndex++) streams.next();
      const source = streams.next();
      nextIndex++;
      const { first, count } = streamShare(task.resamples, stream);
      out.set(resampleDeviationsOfStream(prefix, task.n, sampler, source, count), first);
      done++;
    } catch (error) {
      reportFailure(error instanceof Error ? error.message : String(error));
      Atomics.store(control, FAILED, 1);
      throw error;
    } finally {
      Atomics.add(control, FINISHED_STREAMS, 1);
      Atomics.notify(control, FINISHED_STREAMS);
    }
  }
}

/** Blocks the calling thread until every stream of `task` is finished; throws if one failed. */
export function waitForSharedTask(task: SharedResampleTask, describeFailure: () => string): void {
  const control = new Int32Array(task.control);
  const total = streamCount(task.resamples);
  for (;;) {
    const finished = Atomics.load(control, FINISHED_STREAMS);
    if (finished >= total) break;
    Atomics.wait(control, FINISHED_STREAMS, finished);
  }
  if (Atomics.load(control, FAILED) !== 0) {
    throw new Error(`a resampling thread failed: ${describeFailure()}`);
  }
}
