import type { Verdict } from '../decision/verdict.js';
import type { Comparison, Report } from './reportModel.js';

/**
 * What the renderers read: the report, plus the parts that other parts of the engine add when
 * they are present (each optional, so a report without them still renders). The shapes here are
 * the contracts those parts fill:
 * - `relativeChange` on a comparison: an interval for E[L_c]/E[L_b] − 1 (test inversion),
 * - `stability.periods`: the relative loss difference per period of time,
 * - `integrity.checks`: the backtest checks and their status,
 * - `inputs.missingRows`: where the rows the candidate lacks are (see missingRows.ts).
 */
export type ReportView = Report & {
  readonly comparisons: readonly ComparisonView[];
  readonly stability?: StabilityView | null;
  readonly integrity?: IntegrityView | null;
};

export type ComparisonView = Comparison & {
  readonly relativeChange?: RelativeChangeView | null;
};

export interface RelativeChangeView {
  readonly estimate: number | null;
  readonly level: number;
  readonly lower: number | null;
  readonly upper: number | null;
  readonly method: string;
}

export interface PeriodView {
  readonly start: string;
  readonly end: string;
  readonly n: number;
  readonly meanBaselineLoss: number;
  readonly meanCandidateLoss: number;
  /** meanCandidateLoss / meanBaselineLoss − 1, null when the baseline loss is 0. */
  readonly relativeDifference: number | null;
}

export interface StabilityView {
  readonly periods: readonly PeriodView[];
  /** The most recent stretch, when the engine judged it on its own. */
  readonly recent?: {
    readonly start?: string;
    readonly end?: string;
    readonly relativeDifference?: number | null;
    readonly verdict?: Verdict;
    readonly summary?: string;
  } | null;
  readonly fluctuation?: unknown;
}

export interface IntegrityCheckView {
  readonly id: string;
  readonly status: 'ok' | 'warn' | 'fail';
  readonly count: number;
  readonly examples: readonly string[];
  readonly message?: string;
}

export interface IntegrityView {
  readonly checks: readonly IntegrityCheckView[];
}
