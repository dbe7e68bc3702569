import type { Comparison } from '../report/reportModel.js';
import type { StabilityLevels } from './stabilityLevels.js';

export type { StabilityLevels } from './stabilityLevels.js';

/**
 * Whether the difference between the models holds over time (`report.stability`): the
 * fluctuation test over rolling windows, the comparison on the most recent window, and the mean
 * losses by period. Fixed by the JSON report contract (docs/report.schema.json).
 */
export interface Stability {
  /** Giacomini & Rossi (2010) fluctuation test, or null when the series is too short for it. */
  readonly fluctuation: FluctuationSummary | null;
  /** The full comparison on the most recent window (`recent`), or null when none was asked for. */
  readonly recent: Comparison | null;
  /** Mean losses by period, oldest first (calendar buckets for dates, equal counts otherwise). */
  readonly periods: readonly PeriodSummary[];
  /** The level each check ran at: α/2 each (Bonferroni) when both ran, so the flag keeps α. */
  readonly levels: StabilityLevels;
}

/** A stretch of time named by its first and last timestamp label (both included). */
export interface TimeSpan {
  readonly start: string;
  readonly end: string;
}

export interface FluctuationSummary {
  /** max_t F_t (one-sided) or max_t |F_t| (two-sided) over the rolling windows. */
  readonly statistic: number;
  /** Critical value at levels.fluctuation for this μ (Giacomini & Rossi 2010, Table I, interpolated). */
  readonly criticalValue: number;
  /** Window size as a fraction of the time points, m = μ·n. */
  readonly mu: number;
  /** m, time points per window. */
  readonly windowSize: number;
  /** Whether equal accuracy at every time is rejected (statistic > criticalValue). */
  readonly rejected: boolean;
  /** The window where the statistic peaks. */
  readonly peak: TimeSpan;
  /** Stretches covered by windows where the candidate is significantly worse (F_t > critical value). */
  readonly worsePeriods: readonly TimeSpan[];
}

export interface PeriodSummary extends TimeSpan {
  /** Time points in the period. */
  readonly n: number;
  /** Mean over the period's time points of each model's per-time-point loss. */
  readonly meanBaselineLoss: number;
  readonly meanCandidateLoss: number;
  /** meanCandidateLoss / meanBaselineLoss − 1, or null when the baseline loss is 0. */
  readonly relativeDifference: number | null;
}
