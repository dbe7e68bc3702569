import { type LossSeries, lossDifferential } from '../aggregation/lossSeries.js';
import type { TimestampKind } from '../core/panel.js';
import { type Hypothesis, hypothesisFor } from '../decision/hypothesis.js';
import type { Settings } from '../settings/settings.js';
import type { ResampleRunner } from '../statistics/bootstrap/resampleJob.js';
import { fluctuationTest } from './fluctuationTest.js';
import { periodBreakdown } from './periodBreakdown.js';
import { recentComparison } from './recentComparison.js';
import { splitLevel } from './stabilityLevels.js';
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
 * recent window under the gate's policy, and the breakdown by period. When both checks run,
 * each runs at α/2 (Bonferroni; src/stability/stabilityLevels.ts, decision 0010), so the
 * combined "not stable" flag keeps the level α; a check that runs alone runs at α.
 */
export function assessStability(inputs: StabilityInputs): Stability {
  const { series, timestamps, settings } = inputs;
  const label = (i: number): string => timestamps[series.time[i]!] ?? String(i);
  const { periods } = periodBreakdown(series, timestamps, inputs.kind);

  const worse = hypothesisFor('no-regression', settings.margin, settings.marginKind);
  const d = lossDifferential(series, worse.baselineFactor - 1);
  if (worse.boundary !== 0) for (let t = 0; t < d.length; t++) d[t]! -= worse.boundary;
  const withRecent = settings.recent !== null && series.baseline.length > 0;
  const fluctuationAlpha = splitLevel(settings.alpha, withRecent ? 2 : 1);
  const test = fluctuationTest(d, {
    mu: settings.fluctuationWindow,
    alpha: fluctuationAlpha,
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

  // The recent window shares α only with a fluctuation test that actually ran.
  const recentAlpha = splitLevel(settings.alpha, test === null ? 1 : 2);
  const recent =
    settings.recent === null || !withRecent
      ? null
      : recentComparison(
          series,
          settings.recent,
          { loss: settings.loss, horizon: 'all', series: 'all', timestamps },
          inputs.hypothesis,
          recentAlpha === settings.alpha ? settings : { ...settings, alpha: recentAlpha },
          inputs.runner,
        );
  const levels = {
    adjustment:
      fluctuation !== null && recent !== null ? ('bonferroni' as const) : ('none' as const),
    alpha: settings.alpha,
    fluctuation: fluctuation === null ? null : fluctuationAlpha,
    recent: recent === null ? null : recentAlpha,
  };
  return { fluctuation, recent, periods, levels };
}
