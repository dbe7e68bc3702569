import type { Verdict } from '../decision/verdict.js';
import type { Comparison } from '../report/reportModel.js';
import type { BlockLengthRule } from '../statistics/bootstrap/blockLengthRule.js';
import type { ConfidenceSetStatistic } from '../statistics/modelConfidenceSet.js';
import type { SelectionRule } from './decideCandidates.js';
import type { SpaHypothesis } from './superiorAbilityTest.js';

/**
 * The report's several-candidates sections (docs/design.md, "Several candidates"): present only
 * when more than one candidate was given (or a model column); absent in a two-model report.
 */
export interface CandidateSummary {
  readonly name: string;
  /** The file the candidate was read from. */
  readonly file: string;
  /** This candidate's overall comparison against the baseline, as in `comparisons`. */
  readonly comparison: Comparison;
  /** Whether the model confidence set at report.confidenceSet.level contains it. */
  readonly inConfidenceSet: boolean;
  readonly mcsPValue: number;
  /**
   * Single-step adjusted p-value of the SPA test for this candidate (the test's consistent
   * p-value had the maximum been this candidate's studentised mean), in the direction of
   * report.spa.hypothesis.
   */
  readonly spaPValue: number;
  /** 1 = the lowest mean loss among the candidates. */
  readonly rank: number;
}

/** Hansen's (2005) test over all candidates, with White's (2000) reality check beside it. */
export interface SpaSummary {
  /** none-better: "no candidate beats the baseline"; none-worse: "no candidate is worse". */
  readonly hypothesis: SpaHypothesis;
  readonly statistic: number;
  readonly pValueLower: number;
  readonly pValueConsistent: number;
  readonly pValueUpper: number;
  readonly resamples: number;
  readonly expectedBlockLength: number;
  readonly realityCheck: { readonly statistic: number; readonly pValue: number };
}

/** The model confidence set (Hansen, Lunde & Nason 2011) over the baseline and all candidates. */
export interface ConfidenceSetSummary {
  readonly level: number;
  readonly statistic: ConfidenceSetStatistic;
  /** Names of the models in the set, baseline included when it is in. */
  readonly members: readonly string[];
  /** All model names in the order they were eliminated; the last was never eliminated. */
  readonly eliminationOrder: readonly string[];
  /** The p-value of each elimination step (aligned with eliminationOrder; the last is 1). */
  readonly stepPValues: readonly number[];
  readonly baseline: {
    readonly name: string;
    readonly meanLoss: number;
    readonly inConfidenceSet: boolean;
    readonly mcsPValue: number;
  };
}

/** How the preferred candidate was chosen: named by the option, or the lowest mean loss. */
export const PREFERRED_BY = ['option', 'lowest-mean-loss'] as const;

/** How the several candidates decided the gate (docs/decisions/0015-several-candidates.md). */
export interface SelectionSummary {
  readonly rule: SelectionRule;
  /** The candidate the pull request would ship, and whether it was named or the lowest loss. */
  readonly preferred: string;
  readonly preferredBy: (typeof PREFERRED_BY)[number];
  readonly verdict: Verdict;
  readonly reasons: readonly string[];
  /** Time points every model was scored on (the joint tests' n). */
  readonly timePoints: number;
  /** The one block length of every candidate's bootstrap and the joint tests. */
  readonly expectedBlockLength: number;
  readonly blockLengthRule: BlockLengthRule['kind'];
}
