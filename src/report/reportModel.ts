import type { TimeFormatName } from '../alignment/timeFormat.js';
import type {
  CandidateSummary,
  ConfidenceSetSummary,
  SelectionSummary,
  SpaSummary,
} from '../candidates/candidatesModel.js';
import type { FileSummary, TimestampKind } from '../core/panel.js';
import type { SeriesDirection } from '../decision/decideAdjusted.js';
import type { ON_REJECT_VERDICTS } from '../decision/hypothesis.js';
import type { Verdict } from '../decision/verdict.js';
import type { IntegrityReport } from '../integrity/checkResult.js';
import type { MeasuredCoverage } from '../intervals/measuredCoverage.js';
import type { RelativeChange } from '../intervals/relativeChange.js';
import type { LossName } from '../losses/lossName.js';
import type { AdjustmentMethod } from '../multiplicity/adjustmentMethod.js';
import type { Settings } from '../settings/settings.js';
import type { Stability } from '../stability/stabilityModel.js';
import type { AutomaticBlockLength } from '../statistics/bootstrap/automaticBlockLength.js';
import type { BlockLengthRule } from '../statistics/bootstrap/blockLengthRule.js';
import type { ResampleHistogram } from '../statistics/bootstrap/resampleHistogram.js';
import type { DieboldMarianoResult, DieboldMarianoState } from '../statistics/dieboldMariano.js';
import type { MissingRowsSummary } from './missingRows.js';

export type { MeasuredCoverage } from '../intervals/measuredCoverage.js';
export type { RelativeChange } from '../intervals/relativeChange.js';

/**
 * The JSON report: the one artefact every renderer (terminal, Markdown comment, job summary)
 * reads. Its shape is fixed by docs/design.md ("The JSON report") and described by
 * docs/report.schema.json; numbers that cannot be computed are null, never NaN.
 */
export interface Report {
  readonly tool: { readonly name: 'skillgate'; readonly version: string };
  readonly name: string;
  readonly verdict: Verdict;
  /** One sentence in plain words: what was tested and what came out. */
  readonly headline: string;
  readonly policy: PolicySummary;
  /** The overall comparison first (horizon "all", series "all"). */
  readonly comparisons: readonly Comparison[];
  readonly inputs: InputsSummary;
  readonly settings: Settings;
  /** Reasons that concern the whole gate (e.g. rows the candidate lacks). */
  readonly reasons: readonly string[];
  /** Per-series findings when the panel has more than one series, else null. */
  readonly seriesSummary: SeriesSummary | null;
  /** Per-path findings when the files have a path column with several paths, else null. */
  readonly pathSummary: PathSummary | null;
  /**
   * Backtest checks (look-ahead, like for like, folds, exactness): each check's status, count
   * and examples, and `outcome`, the worst status (a 'fail' fails the gate).
   */
  readonly integrity: IntegrityReport;
  /** Whether the difference holds over time (fluctuation test, recent window, periods), or null. */
  readonly stability: Stability | null;
  /** Several candidates (src/candidates/): each one's overall comparison, set membership, ranks. */
  readonly candidates?: readonly CandidateSummary[];
  /** Several candidates: Hansen's (2005) SPA test over them, in the selection rule's direction. */
  readonly spa?: SpaSummary;
  /** Several candidates: the model confidence set over the baseline and every candidate. */
  readonly confidenceSet?: ConfidenceSetSummary;
  /** Several candidates: the rule that decided the gate and why. */
  readonly selection?: SelectionSummary;
}

/**
 * Backtest paths (each a complete out-of-sample history): on how many the candidate's mean loss
 * is higher, and on how many that is significant (one-sided Diebold–Mariano p ≤ α, unadjusted:
 * paths overlap in time, so this describes consistency rather than testing each path).
 */
export interface PathSummary {
  readonly paths: number;
  readonly worse: number;
  readonly shareWorse: number;
  readonly significantlyWorse: number;
}

/**
 * Where regressions live across series: counts by direction (from multiplicity-adjusted
 * one-sided p-values at α) and the series with the largest significant regressions.
 */
export interface SeriesSummary {
  readonly method: AdjustmentMethod;
  readonly alpha: number;
  readonly series: number;
  readonly worse: number;
  readonly better: number;
  readonly noEvidence: number;
  /** Names of the significantly worse series, largest relative difference first (top N). */
  readonly topRegressions: readonly string[];
}

export interface PolicySummary {
  readonly policy: Settings['policy'];
  readonly agreement: Settings['agreement'];
  readonly alpha: number;
  readonly margin: number;
  readonly marginKind: Settings['marginKind'];
  /** H0 and H1 in plain words. */
  readonly nullHypothesis: string;
  readonly alternative: string;
  /** What rejecting H0 does to the gate. */
  readonly onReject: (typeof ON_REJECT_VERDICTS)[number];
  /** d_t = L_c,t − k·L_b,t and the boundary δ of H0 (E[d] = δ). */
  readonly baselineFactor: number;
  readonly boundary: number;
}

export interface Comparison {
  readonly loss: LossName;
  readonly horizon: 'all' | number;
  readonly series: 'all' | string;
  /** Set when the comparison covers one backtest path only. */
  readonly path?: string;
  /** Time points in the tested series. */
  readonly n: number;
  /** Rows averaged into those time points. */
  readonly rows: number;
  readonly maxHorizon: number;
  readonly firstTimestamp: string | null;
  readonly lastTimestamp: string | null;
  readonly meanBaselineLoss: number;
  readonly meanCandidateLoss: number;
  /** Mean of d_t = loss(candidate) − loss(baseline) (no margin applied). */
  readonly meanDifference: number;
  /** meanCandidateLoss / meanBaselineLoss − 1, or null when the baseline loss is 0. */
  readonly relativeDifference: number | null;
  /** Mean of the tested differential d_t = L_c,t − k·L_b,t (k from the margin). */
  readonly meanTestedDifferential: number;
  /**
   * E[L_c]/E[L_b] − 1 with the set of relative margins at which the gate would not reject
   * (its tests inverted; see src/intervals/relativeChange.ts), or null when the baseline's mean
   * loss is not positive or no test could be inverted.
   */
  readonly relativeChange: RelativeChange | null;
  readonly dieboldMariano: DieboldMarianoSummary;
  readonly bootstrap: BootstrapSummary;
  readonly verdict: Verdict;
  readonly reasons: readonly string[];
  readonly rejected: {
    readonly dieboldMariano: boolean | null;
    readonly bootstrap: boolean | null;
  };
  /** Per-series comparisons: the multiplicity-adjusted p-value in the policy's direction. */
  readonly adjustedPValue?: number | null;
  /** Per-series comparisons: what the adjusted one-sided tests found. */
  readonly direction?: SeriesDirection;
  /**
   * Per-series comparisons: the adjusted one-sided p-value of the plain difference L_c − L_b
   * behind `direction` (upper tail for worse and no evidence, lower tail for better).
   */
  readonly directionPValue?: number | null;
}

export interface DieboldMarianoSummary {
  readonly state: DieboldMarianoState;
  readonly estimator: Settings['variance'];
  readonly requestedEstimator: Settings['variance'];
  readonly statistic: number | null;
  /** One-sided: H1 E[d] > δ (the candidate worse by more than the margin). */
  readonly pValue: number | null;
  readonly pValueTwoSided: number | null;
  /** p-value in the policy's direction, the one the decision used. */
  readonly decisionPValue: number | null;
  /** ω̂²/n, the estimated variance of d̄. */
  readonly variance: number | null;
  readonly longRunVariance: number | null;
  readonly lag: number | null;
  readonly degreesOfFreedom: number | null;
  readonly smallSample: {
    readonly statistic: number;
    readonly pValue: number;
    readonly pValueTwoSided: number;
    readonly degreesOfFreedom: number;
  } | null;
  /**
   * Two-sided interval for E[L_c − L_b] (the mean difference, no margin applied), from the same
   * variance and reference as the test.
   */
  readonly interval: Interval | null;
  readonly lagSelection: DieboldMarianoResult['lagSelection'];
  readonly notes: readonly string[];
}

/**
 * The bootstrap's state in the report: the stationary bootstrap's (`ok`, `identical`,
 * `too-short`), or `not-run` (per-series comparisons use the Diebold–Mariano test alone).
 */
export const BOOTSTRAP_STATES = ['ok', 'identical', 'too-short', 'not-run'] as const;
export type BootstrapState = (typeof BOOTSTRAP_STATES)[number];

export interface BootstrapSummary {
  readonly state: BootstrapState;
  readonly resamples: number;
  readonly seed: number;
  readonly expectedBlockLength: number;
  readonly blockLengthRule: BlockLengthRule['kind'];
  /** Politis–White quantities when the block length was chosen automatically. */
  readonly blockLengthSelection: AutomaticBlockLength | null;
  readonly standardError: number | null;
  /** Basic interval for E[L_c − L_b] (the mean difference, no margin applied). */
  readonly interval: Interval | null;
  /**
   * With a relative margin: interval for E[L_c]/E[L_b] − 1 from the same resamples (basic
   * method), e.g. [−0.02, 0.05] = "between 2% better and 5% worse".
   */
  readonly relativeInterval: Interval | null;
  /** One-sided: H1 E[d] > δ. */
  readonly pValue: number | null;
  readonly pValueTwoSided: number | null;
  readonly decisionPValue: number | null;
  /** The resample means of the tested differential in equal-width bins, for drawing. */
  readonly distribution?: ResampleHistogram | null;
  readonly notes: readonly string[];
}

export interface Interval {
  readonly level: number;
  readonly lower: number;
  readonly upper: number;
  readonly method: string;
  /** Present when the coverage study measured this interval > 2 points under its level. */
  readonly measuredCoverage?: MeasuredCoverage;
}

export interface InputsSummary {
  readonly files: readonly FileSummary[];
  readonly rowsMatched: number;
  readonly rowsDropped: {
    /** Baseline keys the candidate lacks. */
    readonly baseline: number;
    /** Candidate keys the baseline lacks. */
    readonly candidate: number;
    /** Matched keys without an actual. */
    readonly withoutActual: number;
    /** Actuals rows that matched no forecast. */
    readonly actualsUnused: number;
    /** Rows skipped by the loss (zero actuals under ape with zero-actuals: skip). */
    readonly skippedByLoss: number;
  };
  readonly examples: {
    readonly baselineOnly: readonly string[];
    readonly candidateOnly: readonly string[];
  };
  readonly timestamps: {
    readonly count: number;
    readonly kind: TimestampKind;
    readonly first: string | null;
    readonly last: string | null;
    /** How the labels were read (the time-format option). */
    readonly format: TimeFormatName;
    /** The time order in one sentence (numeric, chronological, or text on request). */
    readonly order: string;
  };
  readonly series: number;
  readonly horizons: readonly number[];
  readonly quantileLevels: readonly number[];
  /** With the interval loss: each model's empirical coverage of the central interval. */
  readonly intervalCoverage: {
    readonly nominal: number;
    readonly baseline: number | null;
    readonly candidate: number | null;
  } | null;
  /** Where the rows the candidate lacks are (null or absent when it lacks none). */
  readonly missingRows?: MissingRowsSummary | null;
}
