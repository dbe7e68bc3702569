import type { TimeFormatName } from '../alignment/timeFormat.js';

/**
 * The aligned panel: what the reading + alignment edge hands to the pure core. One entry per
 * matched key (series, timestamp, horizon, origin, path), in no particular order; columnar typed
 * arrays so millions of rows stay cheap.
 */

/** How timestamps are ordered: numbers numerically, ISO 8601 chronologically, else as text. */
export const TIMESTAMP_KINDS = ['number', 'datetime', 'text'] as const;
export type TimestampKind = (typeof TIMESTAMP_KINDS)[number];

/** Point and quantile forecasts of one model, aligned to the panel's rows. */
export interface ModelForecasts {
  /** Point forecasts, or null unless both models' files have a prediction column. */
  readonly prediction: Float64Array | null;
  /**
   * Quantile forecasts by level (0 < level < 1), sorted by level ascending; only the levels both
   * models have (see AlignedPanel.quantileLevels).
   */
  readonly quantiles: readonly QuantileColumn[];
}

export interface QuantileColumn {
  readonly level: number;
  /** The header name it came from, e.g. "q0.1". */
  readonly column: string;
  readonly values: Float64Array;
}

/** Rows read, matched and left out, per side: nothing is dropped silently. */
export interface InputCoverage {
  readonly files: readonly FileSummary[];
  /** Keys present in baseline, candidate and actuals. */
  readonly rowsMatched: number;
  /** Keys in the baseline that the candidate lacks. */
  readonly baselineOnly: number;
  /** Keys in the candidate that the baseline lacks. */
  readonly candidateOnly: number;
  /** Matched prediction keys that had no actual (only with a separate actuals file). */
  readonly withoutActual: number;
  /** Rows of a separate actuals file that matched no prediction key. */
  readonly actualsUnused: number;
  /** A few example keys from each one-sided set, for the report (at most 5 each). */
  readonly examples: {
    readonly baselineOnly: readonly string[];
    readonly candidateOnly: readonly string[];
    /** Matched prediction keys that had no actual (at most 5). */
    readonly withoutActual: readonly string[];
  };
  /** Every baseline row the candidate lacks, for the report's breakdown of them. */
  readonly lacking?: LackingRows;
}

/** Baseline rows without a candidate row: where they are, and the baseline's forecast on them. */
export interface LackingRows {
  /** Index into seriesNames, per row. */
  readonly series: Int32Array;
  readonly seriesNames: readonly string[];
  /** Index into timestamps (in time order), per row. */
  readonly time: Int32Array;
  readonly timestamps: readonly string[];
  readonly horizon: Int32Array;
  /** NaN where unknown. */
  readonly actual: Float64Array;
  /** The baseline's point forecast; NaN when the baseline has none. */
  readonly prediction: Float64Array;
}

/** The part a file plays in a comparison, as the report's file list names it. */
export const FILE_ROLES = ['baseline', 'candidate', 'actuals', 'losses'] as const;
export type FileSummaryRole = (typeof FILE_ROLES)[number];

export interface FileSummary {
  readonly role: FileSummaryRole;
  readonly path: string;
  /** Data rows (excluding the header). */
  readonly rows: number;
  /** "sha256:<hex>" of the file's bytes as stored (before decompression). */
  readonly sha256: string;
  readonly columns: readonly string[];
  /** Header columns that play no role in this file (unknown extras), in header order. */
  readonly ignoredColumns: readonly string[];
  /** Empty lines that were skipped (not counted in rows). */
  readonly blankLines: number;
}

/** Which quantile levels the two models share; only common levels are in the panel. */
export interface QuantileLevels {
  readonly common: readonly number[];
  readonly baselineOnly: readonly number[];
  readonly candidateOnly: readonly number[];
}

export interface AlignedPanel {
  /** Number of matched rows. */
  readonly size: number;
  /** Series id per row; names in seriesNames. */
  readonly series: Int32Array;
  readonly seriesNames: readonly string[];
  /**
   * Timestamp rank per row: 0..timestamps.length−1 in time order (numeric, chronological or
   * text order per timestampKind). timestamps[rank] is the label as written in the files.
   */
  readonly time: Int32Array;
  readonly timestamps: readonly string[];
  readonly timestampKind: TimestampKind;
  /** One sentence on why this kind was chosen (e.g. which label forced text order). */
  readonly timestampKindReason: string;
  /** The time format the labels were read with (the `time-format` option). */
  readonly timeFormat: TimeFormatName;
  /**
   * The parsed time of each timestamp rank (same indexing as `timestamps`): epoch milliseconds
   * (UTC) for date-times, the number itself for numeric timestamps, null in text order. For
   * anything that needs real time distances (e.g. inferring the data's frequency).
   */
  readonly timeInstants: Float64Array | null;
  /** Steps ahead per row (integer ≥ 1; 1 when the files have no horizon column). */
  readonly horizon: Int32Array;
  /**
   * Origin rank per row (like time: 0..origins.length−1 in time order, origins[rank] the label),
   * or null when the files have no origin column.
   */
  readonly origin: Int32Array | null;
  readonly origins: readonly string[];
  /** How origins are ordered ('text' when there is no origin column). */
  readonly originKind: TimestampKind;
  /**
   * Backtest path id per row (several out-of-sample paths over the same history, e.g. the folds
   * of a combinatorial cross-validation), or null when the files have no path column. paths[id]
   * is the label as written; ids follow numeric order when every path label is a decimal number,
   * else code-unit order. Labels are matched exactly ("1" and "01" are different paths).
   */
  readonly path: Int32Array | null;
  /** Path labels by id; empty when there is no path column. */
  readonly paths: readonly string[];
  readonly actual: Float64Array;
  /**
   * Where each row's actual was read: the actuals file when there is one, else the baseline
   * file (the candidate's agrees, or alignment refused it), and the 1-based physical line.
   */
  readonly actualSource: { readonly file: string; readonly lines: Int32Array };
  readonly baseline: ModelForecasts;
  readonly candidate: ModelForecasts;
  /** Optional per-row weights (weight column), else null. */
  readonly weight: Float64Array | null;
  readonly quantileLevels: QuantileLevels;
  readonly coverage: InputCoverage;
}
