import type { LossSeries } from '../aggregation/lossSeries.js';
import type { TimestampKind } from '../core/panel.js';
import { mean } from '../statistics/mean.js';
import { type PeriodBuckets, periodBuckets } from './periodBuckets.js';
import type { PeriodSummary } from './stabilityModel.js';

/**
 * Mean losses by period: the per-time-point losses of the series (each time point weighs the
 * same, as in the tests) averaged over each period of `periodBuckets`, with the relative
 * difference meanCandidate / meanBaseline − 1 (null when the baseline's mean is 0). `timestamps`
 * are the labels that `series.time` indexes.
 */
export function periodBreakdown(
  series: LossSeries,
  timestamps: readonly string[],
  kind: TimestampKind,
): { buckets: PeriodBuckets; periods: PeriodSummary[] } {
  const labels = Array.from(series.time, (t) => timestamps[t] ?? String(t));
  const buckets = periodBuckets(labels, kind);
  const periods: PeriodSummary[] = [];
  for (let j = 0; j + 1 < buckets.bounds.length; j++) {
    const from = buckets.bounds[j]!;
    const to = buckets.bounds[j + 1]!;
    if (to <= from) continue;
    const meanBaselineLoss = mean(series.baseline.subarray(from, to));
    const meanCandidateLoss = mean(series.candidate.subarray(from, to));
    periods.push({
      start: labels[from]!,
      end: labels[to - 1]!,
      n: to - from,
      meanBaselineLoss,
      meanCandidateLoss,
      relativeDifference: meanBaselineLoss === 0 ? null : meanCandidateLoss / meanBaselineLoss - 1,
    });
  }
  return { buckets, periods };
}
