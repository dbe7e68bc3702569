/**
 * One timed bootstrap case, run as a child of bench/run.mjs (bundled there with esbuild):
 *   node bootstrapCase.mjs <implementation> <series.f64> <blockLength> <resamples> <seed> [workerUrl]
 * implementation: 'single' (stationaryBootstrap in this thread), 'threads' (the same with the
 * worker-thread runner, worker start included in the time), 'observations' (a plain
 * per-observation resampler: one coin and possibly one start per observation), 'previous' (the
 * block draws as they were before the inlined kernel: the same block algorithm through the
 * RandomSource interface, over pure-rand's xoroshiro128+ with one 32-bit word per 64-bit step, as
 * a baseline in the same run). Prints one JSON
 * line: wall milliseconds of the bootstrap call alone (after a small warm-up call), CPU
 * milliseconds, and a checksum.
 * implementation 'block-length' prints the automatic block length of the series instead.
 */
import { readFileSync } from 'node:fs';
import { xoroshiro128plusFromState } from 'pure-rand/generator/xoroshiro128plus';
import { createResamplePool } from '../src/parallel/resamplePool.js';
import { createGeometricSampler } from '../src/random/geometricSampler.js';
import { createRandomSource, type RandomSource } from '../src/random/randomSource.js';
import { splitMix64Words } from '../src/random/splitMix64.js';
import { uniformIndex } from '../src/random/uniformIndex.js';
import { automaticBlockLength } from '../src/statistics/bootstrap/automaticBlockLength.js';
import { centredPrefixSums } from '../src/statistics/bootstrap/centredPrefixSums.js';
import { resampleDeviationsGeneric } from '../src/statistics/bootstrap/resampleJob.js';
import { stationaryBootstrap } from '../src/statistics/bootstrap/stationaryBootstrap.js';

const [implementation, file, blockText, resamplesText, seedText, workerUrl] = process.argv.slice(2);
const bytes = readFileSync(file!);
const d = new Float64Array(bytes.buffer, bytes.byteOffset, bytes.byteLength / 8);
const expectedBlockLength = Number(blockText);
const resamples = Number(resamplesText);
const seed = Number(seedText);

/** Politis & Romano's resampler observation by observation, for reference. */
function perObservation(): number {
  const n = d.length;
  const p = 1 / expectedBlockLength;
  let mean = 0;
  for (let t = 0; t < n; t++) mean += d[t]!;
  mean /= n;
  const random = createRandomSource(seed);
  let sumOfSquares = 0;
  for (let b = 0; b < resamples; b++) {
    let index = uniformIndex(random, n);
    let sum = d[index]!;
    for (let t = 1; t < n; t++) {
      index = random.nextDouble() < p ? uniformIndex(random, n) : index + 1 === n ? 0 : index + 1;
      sum += d[index]!;
    }
    const deviation = sum / n - mean;
    sumOfSquares += deviation * deviation;
  }
  return Math.sqrt(sumOfSquares / resamples);
}

/** The random source as it was: a closure over pure-rand's generator, low 32 bits per step. */
function previousSource(): RandomSource {
  const [a, b, c, e] = splitMix64Words(seed, 2);
  const generator = xoroshiro128plusFromState([a!, b!, c!, e!]);
  return {
    nextUint32: () => generator.next() >>> 0,
    nextDouble: () => {
      const x = generator.next() >>> 5;
      const y = generator.next() >>> 6;
      return (x * 67108864 + y) / 9007199254740992;
    },
  };
}

/** The B resample deviations through the interface path, with the previous source. */
function previous(): number {
  let mean = 0;
  for (let t = 0; t < d.length; t++) mean += d[t]!;
  mean /= d.length;
  const prefix = centredPrefixSums(d, mean);
  const deviations = resampleDeviationsGeneric(
    prefix,
    d.length,
    createGeometricSampler(expectedBlockLength),
    previousSource(),
    resamples,
  );
  let sumOfSquares = 0;
  for (const x of deviations) sumOfSquares += x * x;
  return Math.sqrt(sumOfSquares / resamples);
}

if (implementation === 'block-length') {
  process.stdout.write(`${JSON.stringify({ blockLength: automaticBlockLength(d).blockLength })}\n`);
  process.exit(0);
}

const options = { resamples, expectedBlockLength, seed, confidence: 0.95, margin: 0 };
// Steady state: one small bootstrap first, so the timing below is not V8's first compilation
// (about 0.1 s, paid once per process; the worker thread of 'threads' still starts cold).
stationaryBootstrap(d.subarray(0, Math.min(d.length, 2000)), { ...options, resamples: 999 });
const cpu0 = process.cpuUsage();
const t0 = performance.now();
let checksum: number;
if (implementation === 'observations') {
  checksum = perObservation();
} else if (implementation === 'previous') {
  checksum = previous();
} else if (implementation === 'threads') {
  const pool = createResamplePool(workerUrl === undefined ? {} : { workerUrl: new URL(workerUrl) });
  checksum = stationaryBootstrap(d, options, createRandomSource, pool.runner).standardError!;
} else {
  checksum = stationaryBootstrap(d, options).standardError!;
}
const wall = performance.now() - t0;
const cpu = process.cpuUsage(cpu0);
process.stdout.write(
  `${JSON.stringify({ wall, cpu: (cpu.user + cpu.system) / 1000, checksum })}\n`,
);
