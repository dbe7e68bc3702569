import type { Hypothesis } from '../decision/hypothesis.js';
import type { BootstrapSummary } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import { automaticBlockLength } from '../statistics/bootstrap/automaticBlockLength.js';
import { stationaryBootstrap } from '../statistics/bootstrap/stationaryBootstrap.js';

/**
 * Runs the stationary bootstrap on the tested differential with the block length the settings
 * ask for (automatic: Politis & White 2004 with Patton, Politis & White 2009) and reduces the
 * result to the report's shape, with the p-value in the policy's direction.
 */
export function runBootstrap(
  d: Float64Array,
  hypothesis: Hypothesis,
  settings: Settings,
): BootstrapSummary {
  const auto =
    settings.blockLength.kind === 'auto' && d.length >= 2 ? automaticBlockLength(d) : null;
  const expectedBlockLength =
    settings.blockLength.kind === 'fixed' ? settings.blockLength.length : (auto?.blockLength ?? 1);
  const result = stationaryBootstrap(d, {
    resamples: settings.resamples,
    expectedBlockLength,
    seed: settings.seed,
    confidence: settings.confidence,
    margin: hypothesis.boundary,
  });
  const decisionPValue =
    hypothesis.rejectWhen === 'above'
      ? result.pValue
      : ((result as { pValueBelow?: number | null }).pValueBelow ?? null);
  return {
    state: result.state,
    resamples: result.resamples,
    seed: result.seed,
    expectedBlockLength,
    blockLengthRule: settings.blockLength.kind,
    blockLengthSelection: auto,
    standardError: result.standardError,
    interval: result.interval,
    pValue: result.pValue,
    pValueTwoSided: result.pValueTwoSided,
    decisionPValue,
    notes: result.notes,
  };
}
