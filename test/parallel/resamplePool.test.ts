import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { build } from 'esbuild';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createResamplePool, type ResamplePool } from '../../src/parallel/resamplePool.js';
import { createRandomSource, type RandomSourceFactory } from '../../src/random/randomSource.js';
import { centredPrefixSums } from '../../src/statistics/bootstrap/centredPrefixSums.js';
import {
  type ResampleJob,
  runResampleJob,
  stationaryBootstrap,
} from '../../src/statistics/bootstrap/stationaryBootstrap.js';
import { mean } from '../../src/statistics/mean.js';

// The worker runs bundled JavaScript, as in dist/: bundle it once for these tests.
const root = path.resolve(import.meta.dirname, '..', '..');
const outdir = mkdtempSync(path.join(tmpdir(), 'skillgate-worker-'));
const workerUrl = pathToFileURL(path.join(outdir, 'resampleWorker.js'));
const pools: ResamplePool[] = [];
const pool = (workers: number, minimumBlockDraws = 0): ResamplePool => {
  const created = createResamplePool({ workers, minimumBlockDraws, workerUrl });
  pools.push(created);
  return created;
};

beforeAll(async () => {
  await build({
    absWorkingDir: root,
    entryPoints: ['src/parallel/resampleWorker.ts'],
    outdir,
    bundle: true,
    platform: 'node',
    format: 'esm',
    logLevel: 'warning',
  });
});
afterAll(async () => {
  await Promise.all(pools.map((p) => p.close()));
  rmSync(outdir, { recursive: true, force: true });
});

function jobOf(d: Float64Array, expectedBlockLength: number, resamples: number, seed: number) {
  const job: ResampleJob = {
    prefix: centredPrefixSums(d, mean(d)),
    n: d.length,
    expectedBlockLength,
    resamples,
    seed,
  };
  return job;
}

function seriesOf(n: number, seed: number): Float64Array {
  const random = createRandomSource(seed, 7);
  const d = new Float64Array(n);
  let x = 0;
  for (let t = 0; t < n; t++) {
    x = 0.7 * x + random.nextDouble() - 0.5;
    d[t] = x;
  }
  return d;
}

describe('createResamplePool', () => {
  it('gives bit-identical deviations to the in-thread runner for 1 and 2 workers', () => {
    const one = pool(1);
    const two = pool(2);
    fc.assert(
      fc.property(
        fc.integer({ min: 2, max: 3000 }),
        fc.double({ min: 1, max: 60, noNaN: true }),
        fc.integer({ min: 19, max: 3000 }),
        fc.nat(1000),
        (n, b, resamples, seed) => {
          const job = jobOf(seriesOf(n, seed), b, resamples, seed);
          const expected = runResampleJob(job);
          expect(one.runner(job, createRandomSource)).toEqual(expected);
          expect(two.runner(job, createRandomSource)).toEqual(expected);
        },
      ),
      { numRuns: 25 },
    );
    expect(one.started).toBe(1);
    expect(two.started).toBe(2);
  });

  it('gives the same bootstrap result as one thread, with the work really shared', () => {
    const d = seriesOf(20_000, 3);
    const options = {
      resamples: 9999,
      expectedBlockLength: 12,
      seed: 11,
      confidence: 0.95,
      margin: 0,
    };
    const shared = pool(1);
    // A first job starts the worker; on the second it is up and takes streams.
    shared.runner(jobOf(d, 12, 999, 1), createRandomSource);
    const single = stationaryBootstrap(d, options);
    const parallel = stationaryBootstrap(d, options, createRandomSource, shared.runner);
    expect(parallel).toEqual(single);
    expect(shared.started).toBe(1);
    const split = shared.lastShared!;
    expect(split.streams).toBe(40);
    expect(split.inCallingThread, 'the calling thread did every stream').toBeLessThan(40);
    expect(split.inCallingThread, 'the worker did every stream').toBeGreaterThan(0);
  });

  it('stays in the calling thread for small jobs and for an injected generator', () => {
    const small = pool(1, 1e12);
    const job = jobOf(seriesOf(500, 1), 5, 999, 2);
    expect(small.runner(job, createRandomSource)).toEqual(runResampleJob(job));
    expect(small.started).toBe(0);

    const other = pool(1);
    const injected: RandomSourceFactory = (seed, stream) => createRandomSource(seed + 1, stream);
    expect(other.runner(job, injected)).toEqual(runResampleJob(job, injected));
    expect(other.runner(job, injected)).not.toEqual(runResampleJob(job));
    expect(other.started).toBe(0);
  });

  it('reports a failure instead of hanging', () => {
    const failing = pool(1);
    const job = jobOf(seriesOf(500, 1), 0.5, 999, 2); // a mean block length below 1 cannot be drawn
    expect(() => failing.runner(job, createRandomSource)).toThrow(RangeError);
  });
});
