import type { Comparison, Report } from './reportModel.js';

/**
 * What the renderers read: the report, plus parts that other parts of the engine add when they
 * are present (optional, so a report without them still renders). The shape here is the
 * contract such a part fills:
 * - `integrity.checks`: the backtest checks and their status (a failed one fails the gate).
 */
export type ReportView = Report & {
  readonly integrity?: IntegrityView | null;
};

export type ComparisonView = Comparison;

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
