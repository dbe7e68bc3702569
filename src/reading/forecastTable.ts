import type { FileSummary, QuantileColumn } from '../core/panel.js';

/**
 * One file, validated and stored column by column: what reading hands to alignment. Rows are in
 * file order; `lines[i]` is the physical line of row i, so later checks (duplicates, disagreeing
 * actuals) can still name it. Text columns are interned: `ids[i]` indexes `labels`, which lists
 * each distinct label once, in order of first appearance, with the line it first appeared on.
 */
export interface ForecastTable {
  readonly summary: FileSummary;
  /** Data rows (same as summary.rows). */
  readonly size: number;
  readonly lines: Int32Array;
  /** Null when the file has no series column (one series). */
  readonly series: LabelColumn | null;
  readonly timestamp: LabelColumn;
  /** Null when the file has no horizon column (horizon 1), and always null for actuals files. */
  readonly horizon: IntegerColumn | null;
  /** Null when the file has no origin column, and always null for actuals files. */
  readonly origin: LabelColumn | null;
  /**
   * Backtest path (several out-of-sample paths over the same history): null when the file has no
   * path column, and always null for actuals files.
   */
  readonly path: LabelColumn | null;
  readonly actual: ValueColumn | null;
  /** Null for actuals files and for predictions files without a point forecast. */
  readonly prediction: ValueColumn | null;
  readonly weight: ValueColumn | null;
  /** Sorted by level ascending; empty for actuals files. */
  readonly quantiles: readonly QuantileColumn[];
}

export interface LabelColumn {
  /** The header name. */
  readonly column: string;
  readonly ids: Int32Array;
  readonly labels: readonly string[];
  /** Physical line on which each label first appears. */
  readonly firstLines: Int32Array;
}

export interface IntegerColumn {
  readonly column: string;
  readonly values: Int32Array;
}

export interface ValueColumn {
  readonly column: string;
  readonly values: Float64Array;
}
