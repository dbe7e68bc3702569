import {
  createRandomSource,
  type SequentialRandomSourceFactory,
} from '../../random/randomSource.js';
import { mean } from '../mean.js';
import {
  type BasicInterval,
  type BasicLowerBound,
  basicSummary,
  minimumResamples,
} from './basicBootstrapInference.js';
import { centredPrefixSums } from './centredPrefixSums.js';
import { type ResampleHistogram, resampleHistogram } from './resampleHistogram.js';
import { type ResampleRunner, runResampleJob } from './resampleJob.js';

export {
  RESAMPLES_PER_STREAM,
  type ResampleJob,
  type ResampleRunner,
  resampleDeviationsOfStream,
  runResampleJob,
  streamCount,
  streamShare,
} from './resampleJob.js';

/** Series shorter than this are not resampled (state 'too-short'). */
export const MINIMUM_BOOTSTRAP_LENGTH = 2;

export interface StationaryBootstrapOptions {
  /** B, the number of resamples (at least enough for a two-sided interval at `confidence`). */
  resamples: number;
  /** b ≥ 1, the mean block length. */
  expectedBlockLength: number;
  /** 0 ≤ seed ≤ 2^53 − 1. */
  seed: number;
  /** Level c in (0, 1) of the two-sided interval and of the one-sided lower bound. */
  confidence: number;
  /** Absolute margin δ: H0 is E[d] ≤ δ. */
  margin: number;
}

/** What every stationary-bootstrap result repeats of its run: B, the seed and b. */
export interface BootstrapRunFields {
  resamples: number;
  seed: number;
  expectedBlockLength: number;
}

export interface StationaryBootstrapResult extends BootstrapRunFields {
  /** 'identical': every d_t is 0; 'too-short': n < MINIMUM_BOOTSTRAP_LENGTH (numbers are null). */
  state: 'ok' | 'identical' | 'too-short';
  /** d̄. */
  mean: number | null;
  /** Standard deviation of the B resample means d̄*_b, divisor B − 1. */
  standardError: number | null;
  /** Basic (reverse-percentile) two-sided interval for E[d]; see `basicBootstrapInference`. */
  interval: BasicInterval | null;
  /** One-sided basic lower bound for E[d] at `level`: pValue ≤ alpha ⇔ margin < lower. */
  oneSidedLower: BasicLowerBound | null;
  /** (1 + #{d̄*_b − d̄ ≥ d̄ − δ})/(B + 1): one-sided, "candidate worse by more than δ". */
  pValue: number | null;
  /** (1 + #{d̄*_b − d̄ ≤ d̄ − δ})/(B + 1): one-sided, "candidate better than δ" (E[d] < δ). */
  pValueBelow: number | null;
  /** min(1, 2·min of the two one-sided p-values): H0 E[d] = δ. */
  pValueTwoSided: number | null;
  /** The resample means d̄*_b in equal-width bins, for drawing (null when not resampled). */
  distribution: ResampleHistogram | null;
  notes: string[];
}

/**
 * Stationary bootstrap of the mean loss differential (Politis & Romano 1994, "The stationary
 * bootstrap", JASA 89(428)): B resamples, each built from blocks with uniform starts on 0..n−1
 * and geometric lengths of mean b, wrapped circularly, the last block cut at n
 * (`drawStationaryBlocks`); each resample's mean comes from prefix sums in O(blocks)
 * (`resampleMeanDeviation`). From the deviations T_b = d̄*_b − d̄ it reports the standard error
 * (divisor B − 1), the basic interval, a one-sided lower bound and p-values that agree exactly
 * with them (`basicBootstrapInference`, Davison & Hinkley 1997, ch. 5).
 *
 * Conventions: randomness only through `random(seed, stream)` (default `createRandomSource`);
 * resample b uses stream ⌊b / RESAMPLES_PER_STREAM⌋. `runner` says where the streams are
 * computed (default: this thread, `runResampleJob`; src/parallel/ offers worker threads); every
 * runner gives the same numbers. Same inputs, same numbers, on every machine and for any number
 * of threads. Non-finite values in d are a RangeError (callers validate input first).
 *
 * Example: `stationaryBootstrap(d, { resamples: 9999, expectedBlockLength: 5, seed: 1,
 * confidence: 0.95, margin: 0 })` on d = per-row loss differences returns the mean of d, its
 * bootstrap standard error, a 95% basic interval and p = P*(resampled mean shift ≥ d̄).
 */
export function stationaryBootstrap(
  d: Float64Array,
  options: StationaryBootstrapOptions,
  random: SequentialRandomSourceFactory = createRandomSource,
  runner: ResampleRunner = runResampleJob,
): StationaryBootstrapResult {
  validateStationaryBootstrapOptions(options);
  const { resamples, expectedBlockLength, seed, confidence, margin } = options;
  const n = d.length;
  for (let t = 0; t < n; t++) {
    if (!Number.isFinite(d[t]!)) {
      throw new RangeError(`loss differential at position ${t} is not a finite number: ${d[t]}`);
    }
  }
  const base = { resamples, seed, expectedBlockLength };
  const notes: string[] = [];
  if (n < MINIMUM_BOOTSTRAP_LENGTH) {
    notes.push(
      `series has ${n} observation(s); the bootstrap needs at least ${MINIMUM_BOOTSTRAP_LENGTH}`,
    );
    return {
      state: 'too-short',
      ...base,
      mean: n === 1 ? d[0]! : null,
      standardError: null,
      interval: null,
      oneSidedLower: null,
      pValue: null,
      pValueBelow: null,
      pValueTwoSided: null,
      distribution: null,
      notes,
    };
  }

  const constant = d.every((x) => x === d[0]);
  const identical = constant && d[0] === 0;
  // A constant series has that constant as its mean, exactly: then every resample mean is too.
  const sampleMean = constant ? d[0]! : mean(d);
  let deviations: Float64Array;
  if (identical) {
    notes.push('every loss differential is 0 (identical forecasts); no resampling needed');
    deviations = new Float64Array(resamples);
  } else {
    if (constant) notes.push('the loss differential is constant: every resample mean equals it');
    if (expectedBlockLength > n) {
      notes.push(`expected block length ${expectedBlockLength} exceeds the series length ${n}`);
    }
    deviations = stationaryResampleDeviations(
      d,
      sampleMean,
      expectedBlockLength,
      resamples,
      seed,
      random,
      runner,
    );
  }

  return {
    state: identical ? 'identical' : 'ok',
    ...base,
    mean: sampleMean,
    ...basicSummary(sampleMean, deviations, margin, confidence),
    distribution: resampleHistogram(sampleMean, deviations),
    notes,
  };
}

/**
 * The B resample deviations T_b = d̄*_b − d̄, in resample order; resample b from stream
 * ⌊b / RESAMPLES_PER_STREAM⌋ (see `resampleDeviationsOfStream` to compute one stream's share).
 */
export function stationaryResampleDeviations(
  d: Float64Array,
  mean: number,
  expectedBlockLength: number,
  resamples: number,
  seed: number,
  random: SequentialRandomSourceFactory = createRandomSource,
  runner: ResampleRunner = runResampleJob,
): Float64Array {
  const prefix = centredPrefixSums(d, mean);
  return runner({ prefix, n: d.length, expectedBlockLength, resamples, seed }, random);
}

/** Throws a RangeError naming the first option that cannot be honoured. */
export function validateStationaryBootstrapOptions(options: StationaryBootstrapOptions): void {
  const { resamples, expectedBlockLength, seed, confidence, margin } = options;
  if (!(confidence > 0 && confidence < 1)) {
    throw new RangeError(`confidence must lie strictly between 0 and 1, got ${confidence}`);
  }
  const fewest = minimumResamples(confidence);
  if (!Number.isSafeInteger(resamples) || resamples < fewest) {
    throw new RangeError(
      `resamples must be an integer of at least ${fewest} for a ${confidence} interval, got ${resamples}`,
    );
  }
  if (!(Number.isFinite(expectedBlockLength) && expectedBlockLength >= 1)) {
    throw new RangeError(
      `expected block length must be a finite number ≥ 1, got ${expectedBlockLength}`,
    );
  }
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new RangeError(`seed must be an integer between 0 and 2^53 − 1, got ${seed}`);
  }
  if (!Number.isFinite(margin)) throw new RangeError(`margin must be finite, got ${margin}`);
}
