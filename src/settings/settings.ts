import type { TimeFormatName } from '../alignment/timeFormat.js';
import type { CandidateFile } from '../candidates/candidateList.js';
import type { SelectionRule } from '../candidates/decideCandidates.js';
import type { Agreement, MarginKind, Policy, ShortDataVerdict } from '../decision/policy.js';
import type { CheckMode } from '../integrity/checkResult.js';
import type { LossName } from '../losses/lossName.js';
import type { ZeroActualsRule } from '../losses/rowLosses.js';
import type { AdjustmentMethod } from '../multiplicity/adjustmentMethod.js';
import type { ColumnMapping } from '../reading/columnMapping.js';
import type { DecimalMark, DelimiterName, InputFormat } from '../reading/inputFormat.js';
import type { Pooling, ScaleKind } from '../scaling/pooling.js';
import type { FluctuationSides } from '../stability/fluctuationCriticalValues.js';
import type { RecentWindow } from '../stability/recentWindow.js';
import type { StabilityGateMode } from '../stability/stabilityFinding.js';
import type { BlockLengthRule } from '../statistics/bootstrap/blockLengthRule.js';
import type { ConfidenceSetStatistic } from '../statistics/modelConfidenceSet.js';
import type { LagRule } from '../statistics/neweyWestLag.js';
import type { VarianceEstimator } from '../statistics/varianceEstimator.js';

/** Everything one comparison needs, validated; built once at the edge (CLI flags or action inputs). */
export interface Settings {
  readonly name: string;
  /** Forecast files; empty strings when a pre-aggregated `losses` file is given instead. */
  readonly baseline: string;
  readonly candidate: string;
  /** Every candidate (name and file) when several are compared or a model column is given, else []. */
  readonly candidates: readonly CandidateFile[];
  /** Column of the candidate file that names each row's model (several candidates), or null. */
  readonly modelColumn: string | null;
  /** With modelColumn: the model of the candidate file that is the baseline, or null. */
  readonly baselineModel: string | null;
  /** With several candidates: the one the pull request would ship (null: lowest mean loss). */
  readonly preferred: string | null;
  /** With several candidates: how they decide the gate (docs/decisions/0015-several-candidates.md). */
  readonly selectionRule: SelectionRule;
  /** α of the model confidence set (level 1 − α). */
  readonly setAlpha: number;
  readonly setStatistic: ConfidenceSetStatistic;
  /** A pre-aggregated loss file (timestamp, baseline_loss, candidate_loss), or null. */
  readonly losses: string | null;
  readonly actuals: string | null;
  /** Column-role → header-name remapping, e.g. { actual: 'observed' }. */
  readonly columns: ColumnMapping;
  /** Renames for one file only, applied over `columns`. */
  readonly baselineColumns: ColumnMapping;
  readonly candidateColumns: ColumnMapping;
  readonly format: InputFormat;
  /** CSV dialect: field separator and decimal mark. */
  readonly delimiter: DelimiterName;
  readonly decimal: DecimalMark;
  /** How timestamp and origin labels are read and ordered (see alignment/timeFormat). */
  readonly timeFormat: TimeFormatName;
  /** Longest line or field a text file may have, in UTF-16 code units. */
  readonly lineLimit: number;
  readonly loss: LossName;
  readonly zeroActuals: ZeroActualsRule;
  readonly alpha: number;
  readonly margin: number;
  readonly marginKind: MarginKind;
  readonly policy: Policy;
  readonly agreement: Agreement;
  readonly variance: VarianceEstimator;
  readonly lag: LagRule;
  readonly blockLength: BlockLengthRule;
  readonly resamples: number;
  readonly seed: number;
  readonly confidence: number;
  readonly minPoints: number;
  readonly shortData: ShortDataVerdict;
  readonly allowMissing: boolean;
  /** Levels [lower, upper] of the central interval for the interval score, or null. */
  readonly interval: readonly [number, number] | null;
  readonly pooling: Pooling;
  readonly scale: ScaleKind;
  readonly history: string | null;
  readonly season: number;
  readonly weights: boolean;
  readonly adjust: AdjustmentMethod;
  readonly top: number;
  /** The most recent window to compare on as well, or null. */
  readonly recent: RecentWindow | null;
  /** μ of the fluctuation test, the window as a fraction of the time points. */
  readonly fluctuationWindow: number;
  readonly fluctuationSides: FluctuationSides;
  /** What a significantly worse recent window or stretch does to the gate. */
  readonly stabilityGate: StabilityGateMode;
  /** Step of the time grid for the backtest checks: 'auto' or e.g. '1h', '1mo', '1'. */
  readonly frequency: string;
  /** Fold layout file for the fold checks, or null. */
  readonly folds: string | null;
  /** Steps after each test window that training must avoid (with folds). */
  readonly embargo: number;
  /** How backtest-check findings act on the verdict. */
  readonly backtestChecks: CheckMode;
  readonly json: string | null;
  readonly markdown: string | null;
  /** Where to write the self-contained HTML report, or null. */
  readonly html: string | null;
}
