import type { LossSeries } from '../aggregation/lossSeries.js';
import type { Hypothesis } from '../decision/hypothesis.js';
import { createRandomSource } from '../random/randomSource.js';
import type { BootstrapSummary } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import { automaticBlockLength } from '../statistics/bootstrap/automaticBlockLength.js';
import { relativeDifferenceBootstrap } from '../statistics/bootstrap/relativeDifferenceBootstrap.js';
import type { ResampleRunner } from '../statistics/bootstrap/resampleJob.js';
import { stationaryBootstrap } from '../statistics/bootstrap/stationaryBootstrap.js';

/**
 * Runs the stationary bootstrap on the tested differential with the block length the settings
 * ask for (automatic: Politis & White 2004 with Patton, Politis & White 2009) and reduces the
 * result to the report's shape, with the p-value in the policy's direction.
 */
export function runBootstrap(
  d: Float64Array,
  series: LossSeries,
  hypothesis: Hypothesis,
  settings: Settings,
  runner?: ResampleRunner,
): BootstrapSummary {
  const auto =
    settings.blockLength.kind === 'auto' && d.length >= 2 ? automaticBlockLength(d) : null;
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
  // With a relative margin, also the interval for E[L_c]/E[L_b] − 1 from the same resamples.
  const relative =
    settings.marginKind === 'relative'
      ? relativeDifferenceBootstrap(series.candidate, series.baseline, {
          ...options,
          margin: hypothesis.baselineFactor - 1,
        })
      : null;
  const decisionPValue = hypothesis.rejectWhen === 'above' ? result.pValue : result.pValueBelow;
  return {
    state: result.state,
    resamples: result.resamples,
    seed: result.seed,
    expectedBlockLength,
    blockLengthRule: settings.blockLength.kind,
    blockLengthSelection: auto,
    standardError: result.standardError,
    interval: result.interval,
    relativeInterval: relative?.interval ?? null,
    pValue: result.pValue,
    pValueTwoSided: result.pValueTwoSided,
    decisionPValue,
    distribution: result.distribution,
    notes: result.notes,
  };
}
