import type { Report } from '../../src/report/reportModel.js';
import type { ReportView } from '../../src/report/reportView.js';
import type { PeriodSummary } from '../../src/stability/stabilityModel.js';

/**
 * Hand-built periods in the shape of `report.stability.periods` (weekly buckets of an invented
 * backtest): the candidate about 3% better for most weeks, then worse in the last five.
 */
export function weeklyPeriods(weeks = 34): PeriodSummary[] {
  const start = Date.UTC(2026, 2, 2);
  const day = (i: number) => new Date(start + i * 86_400_000).toISOString().slice(0, 10);
  return Array.from({ length: weeks }, (_, w) => {
    const relative = w < weeks - 5 ? -0.03 + 0.01 * Math.sin(w) : 0.04 + 0.01 * (w - weeks + 5);
    const baseline = 4 + 0.5 * Math.cos(w / 3);
    return {
      start: day(7 * w),
      end: day(7 * w + 6),
      n: 7,
      meanBaselineLoss: baseline,
      meanCandidateLoss: baseline * (1 + relative),
      relativeDifference: relative,
    };
  });
}

export function withPeriods(report: Report, periods = weeklyPeriods()): ReportView {
  return {
    ...report,
    stability: {
      fluctuation: null,
      recent: null,
      periods,
      levels: { adjustment: 'none', alpha: 0.05, fluctuation: null, recent: null },
    },
  };
}
