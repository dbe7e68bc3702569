/**
 * The worker-thread edge of the stationary bootstrap: a `ResampleRunner` that shares one job's
 * streams between the calling thread and a few worker threads. The pure per-stream function
 * (`resampleDeviationsOfStream`) is unchanged; this module only moves data into shared memory,
 * lets every thread claim streams, and blocks until all are done, so the bootstrap stays a plain
 * synchronous call. Each stream's share lands at its own place, so the numbers are exactly those
 * of `runResampleJob` for any number of threads (checked by a test).
 */
import { availableParallelism } from 'node:os';
import {
  MessageChannel,
  type MessagePort,
  receiveMessageOnPort,
  Worker,
} from 'node:worker_threads';
import { createRandomSource, type SequentialRandomSourceFactory } from '../random/randomSource.js';
import {
  type ResampleJob,
  type ResampleRunner,
  runResampleJob,
  streamCount,
} from '../statistics/bootstrap/resampleJob.js';
import { shareResampleJob, waitForSharedTask, workOnSharedTask } from './sharedResampleTask.js';

/**
 * Jobs smaller than this many block draws (B · (n/b + 1)) run in the calling thread: below it,
 * starting a worker costs more than the second core gives back. Measured with `npm run bench` on
 * 2 cores (docs/performance.md): a cold worker costs about 0.1–0.15 s of CPU (thread start,
 * loading its bundle, compiling the kernel) before it contributes, and one block draw costs about
 * 40–60 ns, so the second core pays for itself from about 5 · 10^6 block draws (≈ 0.3 s of work
 * in one thread). The default run (B = 9,999 at n = 100,000, b ≈ 68: 1.5 · 10^7 draws) is above.
 * Measured before the inlined kernel (`resampleDeviationsInline`), which brought a draw to 6–10 ns
 * of CPU at b = 1 and 24–74 ns at b = 2–68 (block-length sweeps in docs/performance.md): the threshold now
 * errs towards starting the worker; re-measure with `npm run bench` before changing it.
 */
export const MINIMUM_PARALLEL_BLOCK_DRAWS = 5_000_000;

export interface ResamplePoolOptions {
  /** Worker threads besides the calling thread; default: available cores − 1. 0 = never. */
  readonly workers?: number;
  /** See MINIMUM_PARALLEL_BLOCK_DRAWS. */
  readonly minimumBlockDraws?: number;
  /** The bundled worker script; default: resampleWorker.js next to this module's bundle. */
  readonly workerUrl?: URL;
}

export interface ResamplePool {
  /** Pass to `stationaryBootstrap` (or the comparison layer) as its runner. */
  readonly runner: ResampleRunner;
  /** Worker threads started so far (they start at the first job large enough). */
  readonly started: number;
  /** The last job run on the workers: its streams, and how many the calling thread computed. */
  readonly lastShared: { readonly streams: number; readonly inCallingThread: number } | null;
  /** Stops the workers. Unused workers never keep the process alive (they are unref'd). */
  close(): Promise<void>;
}

interface PoolWorker {
  readonly worker: Worker;
  readonly failures: MessagePort;
}

export function createResamplePool(options: ResamplePoolOptions = {}): ResamplePool {
  const workerCount = options.workers ?? Math.max(0, availableParallelism() - 1);
  const minimum = options.minimumBlockDraws ?? MINIMUM_PARALLEL_BLOCK_DRAWS;
  const workerUrl = options.workerUrl ?? new URL('./resampleWorker.js', import.meta.url);
  const workers: PoolWorker[] = [];
  let lastShared: ResamplePool['lastShared'] = null;

  const start = (): void => {
    while (workers.length < workerCount) {
      const channel = new MessageChannel();
      const worker = new Worker(workerUrl, {
        workerData: { failures: channel.port2 },
        transferList: [channel.port2],
      });
      worker.unref();
      channel.port1.unref();
      workers.push({ worker, failures: channel.port1 });
    }
  };

  const runner: ResampleRunner = (job: ResampleJob, random: SequentialRandomSourceFactory) => {
    // Workers can only rebuild the project's generator; an injected one stays in this thread.
    const blockDraws = job.resamples * (job.n / job.expectedBlockLength + 1);
    if (workerCount === 0 || random !== createRandomSource || blockDraws < minimum) {
      return runResampleJob(job, random);
    }
    start();
    const task = shareResampleJob(job);
    for (const { worker } of workers) worker.postMessage(task);
    const inCallingThread = workOnSharedTask(task);
    waitForSharedTask(task, () => {
      const messages: string[] = [];
      for (const { failures } of workers) {
        for (
          let m = receiveMessageOnPort(failures);
          m !== undefined;
          m = receiveMessageOnPort(failures)
        ) {
          messages.push(String(m.message));
        }
      }
      return messages.join('; ') || 'no message';
    });
    lastShared = { streams: streamCount(job.resamples), inCallingThread };
    return new Float64Array(task.out).slice();
  };

  return {
    runner,
    get started() {
      return workers.length;
    },
    get lastShared() {
      return lastShared;
    },
    close: async () => {
      const stopping = workers.splice(0).map(({ worker, failures }) => {
        failures.close();
        return worker.terminate();
      });
      await Promise.all(stopping);
    },
  };
}
