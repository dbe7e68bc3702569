import {
  createRandomSource,
  type SequentialRandomSourceFactory,
} from '../../random/randomSource.js';
import { mean } from '../mean.js';
import type { BasicInterval, BasicLowerBound } from './basicBootstrapInference.js';
import { basicSummary } from './basicBootstrapInference.js';
import { centredPrefixSums } from './centredPrefixSums.js';
import { forEachStationaryResample } from './eachStationaryResample.js';
import { resampleMeanDeviation } from './resampleMeanDeviation.js';
import {
  type BootstrapRunFields,
  MINIMUM_BOOTSTRAP_LENGTH,
  type StationaryBootstrapOptions,
  validateStationaryBootstrapOptions,
} from './stationaryBootstrap.js';

export interface RelativeDifferenceResult extends BootstrapRunFields {
  /** 'baseline-zero': the baseline's mean loss is not positive, so no ratio exists. */
  state: 'ok' | 'identical' | 'too-short' | 'baseline-zero';
  /** θ̂ = mean(candidate loss) / mean(baseline loss) − 1, e.g. 0.03 = "3% worse". */
  relativeDifference: number | null;
  /** Standard deviation of the B resampled θ*, divisor B − 1. */
  standardError: number | null;
  /** Basic interval for θ; see `basicBootstrapInference`. */
  interval: BasicInterval | null;
  /** One-sided basic lower bound for θ at `level`. */
  oneSidedLower: BasicLowerBound | null;
  /** (1 + #{θ*_b − θ̂ ≥ θ̂ − r})/(B + 1) for H0: θ ≤ r, r = options.margin (relative). */
  pValue: number | null;
  pValueTwoSided: number | null;
  /**
   * Per resample b (in resample order), the deviations c̄*_b − c̄ and l̄*_b − l̄ of the resampled
   * candidate and baseline means from the same blocks: any linear combination's resample
   * deviations follow from them (`bootstrapMarginSet`). Null when nothing was resampled.
   */
  resampledDeviations: { candidate: Float64Array; baseline: Float64Array } | null;
  notes: string[];
}

/**
 * Stationary bootstrap (Politis & Romano 1994) of the relative difference of mean losses,
 * θ = E[candidate loss] / E[baseline loss] − 1: each resample applies the same blocks to both
 * loss series (so their dependence on each other and over time is kept) and yields
 * θ* = (mean of resampled candidate losses)/(mean of resampled baseline losses) − 1. Interval,
 * one-sided bound and p-values are the basic ones of `basicBootstrapInference` (Davison & Hinkley
 * 1997, ch. 5) on θ* − θ̂, with `margin` read as a relative margin r (0.02 = "at most 2% worse").
 *
 * This is a report companion, not the gate's test: docs/design.md ("Margins") tests a relative margin exactly as
 * δ = 0 on d_t = candidate_t − (1 + r)·baseline_t, which `stationaryBootstrap` does.
 *
 * Conventions: the same blocks and random streams as `stationaryBootstrap` with the same options
 * (resample b from stream ⌊b/256⌋), so the two describe the same resamples. A resample whose
 * baseline mean is 0 gives θ* = ±∞ (or NaN when both are 0, counted as +∞) and is noted.
 *
 * Example: candidate losses (2, 2, 2), baseline (1, 1, 1) → θ̂ = 1 ("100% worse"), every θ* = 1,
 * interval [1, 1].
 */
export function relativeDifferenceBootstrap(
  candidateLoss: Float64Array,
  baselineLoss: Float64Array,
  options: StationaryBootstrapOptions,
  random: SequentialRandomSourceFactory = createRandomSource,
): RelativeDifferenceResult {
  validateStationaryBootstrapOptions(options);
  const { resamples, expectedBlockLength, seed, confidence, margin } = options;
  const n = candidateLoss.length;
  if (baselineLoss.length !== n) {
    throw new RangeError(`loss series differ in length: ${n} vs ${baselineLoss.length}`);
  }
  for (let t = 0; t < n; t++) {
    if (!(Number.isFinite(candidateLoss[t]!) && Number.isFinite(baselineLoss[t]!))) {
      throw new RangeError(`loss at position ${t} is not a finite number`);
    }
  }
  const empty = {
    resamples,
    seed,
    expectedBlockLength,
    standardError: null,
    interval: null,
    oneSidedLower: null,
    pValue: null,
    pValueTwoSided: null,
    resampledDeviations: null,
  };
  if (n < MINIMUM_BOOTSTRAP_LENGTH) {
    return {
      state: 'too-short',
      ...empty,
      relativeDifference: null,
      notes: [`series has ${n} observation(s); the bootstrap needs ${MINIMUM_BOOTSTRAP_LENGTH}`],
    };
  }
  const candidateMean = mean(candidateLoss);
  const baselineMean = mean(baselineLoss);
  if (!(baselineMean > 0)) {
    return {
      state: 'baseline-zero',
      ...empty,
      relativeDifference: null,
      notes: [`the baseline's mean loss is ${baselineMean}; a relative difference needs it > 0`],
    };
  }
  const estimate = candidateMean / baselineMean - 1;
  const identical = candidateLoss.every((x, t) => x === baselineLoss[t]);
  const notes: string[] = [];
  const deviations = new Float64Array(resamples);
  const candidateDeviations = new Float64Array(resamples);
  const baselineDeviations = new Float64Array(resamples);
  if (identical) {
    notes.push('candidate and baseline losses are identical; no resampling needed');
  } else {
    const candidatePrefix = centredPrefixSums(candidateLoss, candidateMean);
    const baselinePrefix = centredPrefixSums(baselineLoss, baselineMean);
    let zeroDenominators = 0;
    forEachStationaryResample(n, expectedBlockLength, resamples, seed, random, (b, blocks) => {
      candidateDeviations[b] = resampleMeanDeviation(candidatePrefix, n, blocks);
      baselineDeviations[b] = resampleMeanDeviation(baselinePrefix, n, blocks);
      const c = candidateMean + candidateDeviations[b]!;
      const base = baselineMean + baselineDeviations[b]!;
      if (base === 0) zeroDenominators++;
      const theta = base === 0 && c === 0 ? Number.POSITIVE_INFINITY : c / base - 1;
      deviations[b] = theta - estimate;
    });
    if (zeroDenominators > 0) {
      notes.push(`${zeroDenominators} resample(s) had a zero baseline mean loss (θ* infinite)`);
    }
  }
  const summary = basicSummary(estimate, deviations, margin, confidence);
  return {
    state: identical ? 'identical' : 'ok',
    ...empty,
    relativeDifference: estimate,
    standardError: summary.standardError,
    interval: summary.interval,
    oneSidedLower: summary.oneSidedLower,
    pValue: summary.pValue,
    pValueTwoSided: summary.pValueTwoSided,
    resampledDeviations: { candidate: candidateDeviations, baseline: baselineDeviations },
    notes,
  };
}
