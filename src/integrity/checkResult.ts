/**
 * What the backtest checks report: one entry per check that ran, with what it found, and the
 * checks that could not run on these inputs. Part of the JSON report (`report.integrity`).
 */

/** Check ids, in the order the report lists them (documented in README.md, "Backtest checks"). */
export const CHECK_IDS = [
  'look-ahead',
  'horizon-steps',
  'origin-after-actuals',
  'origin-sets',
  'path-sets',
  'horizon-sets',
  'time-spans',
  'series-coverage',
  'fold-purge',
  'outside-test-window',
  'exact-predictions',
] as const;
export type CheckId = (typeof CHECK_IDS)[number];

export const CHECK_STATUSES = ['ok', 'warn', 'fail'] as const;
export type CheckStatus = (typeof CHECK_STATUSES)[number];

/** The checks that fail the gate under the default mode (`--backtest-checks enforce`). */
export const FAILING_CHECKS: readonly CheckId[] = ['look-ahead', 'outside-test-window'];

/** How the checks' findings act on the gate (`--backtest-checks`). */
export const CHECK_MODES = ['enforce', 'warn', 'report'] as const;
export type CheckMode = (typeof CHECK_MODES)[number];

/** Where the grid step came from: inferred from the timestamps or given (`--frequency`). */
export const FREQUENCY_SOURCES = ['inferred', 'given'] as const;
export type FrequencySource = (typeof FREQUENCY_SOURCES)[number];

export interface CheckFinding {
  readonly id: CheckId;
  /** Rows, labels or segments found (what is counted is said in `summary`); 0 means clean. */
  readonly count: number;
  /** A few of them (at most 5), as readable keys. */
  readonly examples: readonly string[];
  /** One sentence: what was checked and what was found. */
  readonly summary: string;
}

export interface IntegrityCheck extends CheckFinding {
  readonly status: CheckStatus;
}

export interface CheckNotRun {
  readonly id: CheckId;
  readonly reason: string;
}

export interface IntegrityReport {
  readonly mode: CheckMode;
  /**
   * The worst status over the checks: 'fail' when a check failed (the gate then fails, unless
   * the mode is 'report'), 'warn' when one warned, else 'ok'.
   */
  readonly outcome: CheckStatus;
  /** Whether the outcome is part of the gate's verdict (false with mode 'report'). */
  readonly affectsVerdict: boolean;
  /** The grid step used to count steps ("1d", "1h", "1mo", "2"), or null when none was known. */
  readonly frequency: { readonly text: string; readonly source: FrequencySource } | null;
  readonly checks: readonly IntegrityCheck[];
  readonly notRun: readonly CheckNotRun[];
}

/** Most examples kept per check. */
export const MAX_EXAMPLES = 5;

/** Collects the count and the first few examples of one check. */
export class FindingCollector {
  count = 0;
  readonly examples: string[] = [];

  add(example: () => string): void {
    if (this.count++ < MAX_EXAMPLES) this.examples.push(example());
  }
}
