import type { LossSeries } from '../aggregation/lossSeries.js';
import { type ComparisonScope, compareLossSeries } from '../comparison/compareLossSeries.js';
import type { Hypothesis } from '../decision/hypothesis.js';
import type { Comparison } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import type { ResampleRunner } from '../statistics/bootstrap/resampleJob.js';
import { type RecentWindow, recentPoints } from './recentWindow.js';

/** The last `count` time points of a loss series (views, no copy). */
export function lastPoints(series: LossSeries, count: number): LossSeries {
  const from = series.baseline.length - count;
  const rows = series.rows.subarray(from);
  let rowCount = 0;
  for (let t = 0; t < rows.length; t++) rowCount += rows[t]!;
  return {
    time: series.time.subarray(from),
    baseline: series.baseline.subarray(from),
    candidate: series.candidate.subarray(from),
    rows,
    rowCount,
    maxHorizon: series.maxHorizon,
  };
}

/**
 * The full comparison (Diebold–Mariano, stationary bootstrap, intervals, decision under the
 * policy) on the most recent window of the overall loss series, with the same settings and
 * seed as the overall comparison. Its firstTimestamp and lastTimestamp bound the window.
 */
export function recentComparison(
  series: LossSeries,
  window: RecentWindow,
  scope: ComparisonScope,
  hypothesis: Hypothesis,
  settings: Settings,
  runner?: ResampleRunner,
): Comparison {
  const count = recentPoints(window, series.baseline.length);
  return compareLossSeries(
    lastPoints(series, count),
    scope,
    hypothesis,
    settings,
    runner === undefined ? {} : { runner },
  );
}
