import { type LossSeries, lossDifferential } from '../aggregation/lossSeries.js';
import type { TimestampKind } from '../core/panel.js';
import { type Hypothesis, hypothesisFor } from '../decision/hypothesis.js';
import type { Settings } from '../settings/settings.js';
import type { ResampleRunner } from '../statistics/bootstrap/resampleJob.js';
import { fluctuationTest } from './fluctuationTest.js';
import { periodBreakdown } from './periodBreakdown.js';
import { recentComparison } from './recentComparison.js';
import type { FluctuationSummary, Stability } from './stabilityModel.js';

export interface StabilityInputs {
  /** The overall per-time-point loss series (the one that decides the gate). */
  readonly series: LossSeries;
  /** Labels that series.time indexes, and how they are ordered. */
  readonly timestamps: readonly string[];
  readonly kind: TimestampKind;
  readonly hypothesis: Hypothesis;
  readonly settings: Settings;
  readonly runner?: ResampleRunner;
}

/**
 * `report.stability` for the overall loss series: the fluctuation test on the differential
 * "candidate worse by more than the margin" (d_t = L_c,t − (1 + r) L_b,t − δ, whatever the
 * policy, since the question is where the candidate is worse), the full comparison on the
 * recent window under the gate's policy, and the breakdown by period.
 */
export function assessStability(inputs: StabilityInputs): Stability {
  const { series, timestamps, settings } = inputs;
  const label = (i: number): string => timestamps[series.time[i]!] ?? String(i);
  const { periods } = periodBreakdown(series, timestamps, inputs.kind);

  const worse = hypothesisFor('no-regression', settings.margin, settings.marginKind);
  const d = lossDifferential(series, worse.baselineFactor - 1);
  if (worse.boundary !== 0) for (let t = 0; t < d.length; t++) d[t]! -= worse.boundary;
  const test = fluctuationTest(d, {
    mu: settings.fluctuationWindow,
    alpha: settings.alpha,
    sides: settings.fluctuationSides,
    lag: settings.lag,
    horizon: series.maxHorizon,
  });
  const fluctuation: FluctuationSummary | null =
    test === null
      ? null
      : {
          statistic: test.statistic,
          criticalValue: test.criticalValue,
          mu: settings.fluctuationWindow,
          windowSize: test.windowSize,
          rejected: test.rejected,
          peak: {
            start: label(test.peakWindow),
            end: label(test.peakWindow + test.windowSize - 1),
          },
          worsePeriods: test.worseRuns.map(([from, to]) => ({
            start: label(from),
            end: label(to),
          })),
        };

  const recent =
    settings.recent === null || series.baseline.length === 0
      ? null
      : recentComparison(
          series,
          settings.recent,
          { loss: settings.loss, horizon: 'all', series: 'all', timestamps },
          inputs.hypothesis,
          settings,
          inputs.runner,
        );
  return { fluctuation, recent, periods };
}
