import type { LossSeries } from '../aggregation/lossSeries.js';
import type { Hypothesis } from '../decision/hypothesis.js';
import { createRandomSource } from '../random/randomSource.js';
import type { BootstrapSummary } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import { automaticBlockLength } from '../statistics/bootstrap/automaticBlockLength.js';
import {
  basicBootstrapInference,
  reflectedSorted,
} from '../statistics/bootstrap/basicBootstrapInference.js';
import { relativeDifferenceBootstrap } from '../statistics/bootstrap/relativeDifferenceBootstrap.js';
import type { ResampleRunner } from '../statistics/bootstrap/resampleJob.js';
import { stationaryBootstrap } from '../statistics/bootstrap/stationaryBootstrap.js';
import { mean } from '../statistics/mean.js';

export interface BootstrapRun {
  readonly summary: BootstrapSummary;
  /** The candidate's and baseline's resampled-mean deviations (same blocks), or null. */
  readonly resampledDeviations: { candidate: Float64Array; baseline: Float64Array } | null;
}

/**
 * Runs the stationary bootstrap on the tested differential with the block length the settings
 * ask for (automatic: Politis & White 2004 with Patton, Politis & White 2009, chosen on the
 * unshifted differential L_c − L_b so that it, and with it every resample, is the same at any
 * margin) and reduces the result to the report's shape, with the p-value in the policy's
 * direction. The same blocks also resample both losses' means (`relativeDifferenceBootstrap`),
 * from which the interval for E[L_c − L_b] and the inverted test (`bootstrapMarginSet`) follow.
 */
export function runBootstrap(
  d: Float64Array,
  series: LossSeries,
  hypothesis: Hypothesis,
  settings: Settings,
  runner?: ResampleRunner,
  difference: Float64Array = d,
): BootstrapRun {
  const auto =
    settings.blockLength.kind === 'auto' && d.length >= 2 ? automaticBlockLength(difference) : null;
  const expectedBlockLength =
    settings.blockLength.kind === 'fixed' ? settings.blockLength.length : (auto?.blockLength ?? 1);
  const options = {
    resamples: settings.resamples,
    expectedBlockLength,
    seed: settings.seed,
    confidence: settings.confidence,
    margin: hypothesis.boundary,
  };
  const result = stationaryBootstrap(d, options, createRandomSource, runner);
  // The same resamples of both means: the ratio's interval and the inversion over margins.
  const relative = relativeDifferenceBootstrap(series.candidate, series.baseline, {
    ...options,
    margin: hypothesis.baselineFactor - 1,
  });
  const decisionPValue = hypothesis.rejectWhen === 'above' ? result.pValue : result.pValueBelow;
  const summary: BootstrapSummary = {
    state: result.state,
    resamples: result.resamples,
    seed: result.seed,
    expectedBlockLength,
    blockLengthRule: settings.blockLength.kind,
    blockLengthSelection: auto,
    standardError: result.standardError,
    interval:
      difference === d
        ? result.interval
        : differenceInterval(difference, relative.resampledDeviations, settings.confidence),
    relativeInterval: settings.marginKind === 'relative' ? relative.interval : null,
    pValue: result.pValue,
    pValueTwoSided: result.pValueTwoSided,
    decisionPValue,
    distribution: result.distribution,
    notes: result.notes,
  };
  return { summary, resampledDeviations: relative.resampledDeviations };
}

/** The basic interval for E[L_c − L_b] from the shared-block resamples of both means. */
function differenceInterval(
  difference: Float64Array,
  deviations: BootstrapRun['resampledDeviations'],
  level: number,
): BootstrapSummary['interval'] {
  if (deviations === null) return null;
  const shifts = new Float64Array(deviations.candidate.length);
  for (let b = 0; b < shifts.length; b++) {
    shifts[b] = deviations.candidate[b]! - deviations.baseline[b]!;
  }
  const { interval } = basicBootstrapInference(reflectedSorted(mean(difference), shifts), 0, level);
  return { ...interval, method: 'basic' };
}
