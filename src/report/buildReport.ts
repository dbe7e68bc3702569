import type { Hypothesis } from '../decision/hypothesis.js';
import { type Verdict, worstVerdict } from '../decision/verdict.js';
import type { Settings } from '../settings/settings.js';
import type { Stability } from '../stability/stabilityModel.js';
import type {
  Comparison,
  InputsSummary,
  PathSummary,
  Report,
  SeriesSummary,
} from './reportModel.js';

export interface ReportParts {
  readonly version: string;
  readonly settings: Settings;
  readonly hypothesis: Hypothesis;
  readonly inputs: InputsSummary;
  /** The overall comparison first. */
  readonly comparisons: readonly Comparison[];
  readonly seriesSummary?: SeriesSummary | null;
  readonly pathSummary?: PathSummary | null;
  readonly stability?: Stability | null;
}

/**
 * Assembles the report from the pieces of a run. The gate's verdict is the overall comparison's,
 * made a failure when the candidate lacks rows the baseline has (unless allowed): a candidate must
 * not pass by skipping hard cases.
 */
export function buildReport(parts: ReportParts): Report {
  const { inputs, settings, hypothesis } = parts;
  const overall = parts.comparisons[0];
  if (overall === undefined) throw new Error('a report needs the overall comparison');
  const reasons: string[] = [];
  const verdicts: Verdict[] = [overall.verdict];
  const missing = inputs.rowsDropped.baseline;
  if (missing > 0) {
    if (settings.allowMissing) {
      reasons.push(
        `The candidate lacks ${missing} rows that the baseline has; allowed by allow-missing, they are left out of the comparison.`,
      );
    } else {
      verdicts.push('fail');
      reasons.push(
        `The candidate lacks ${missing} rows that the baseline has. A candidate must not pass by skipping hard cases; set allow-missing to compare on the common rows only.`,
      );
    }
  }
  const verdict = worstVerdict(verdicts);
  return {
    tool: { name: 'skillgate', version: parts.version },
    name: settings.name,
    verdict,
    headline: headline(verdict, overall, hypothesis),
    policy: {
      policy: settings.policy,
      agreement: settings.agreement,
      alpha: settings.alpha,
      margin: settings.margin,
      marginKind: settings.marginKind,
      nullHypothesis: hypothesis.nullHypothesis,
      alternative: hypothesis.alternative,
      onReject: hypothesis.onReject,
      baselineFactor: hypothesis.baselineFactor,
      boundary: hypothesis.boundary,
    },
    comparisons: parts.comparisons,
    inputs,
    settings,
    reasons,
    seriesSummary: parts.seriesSummary ?? null,
    pathSummary: parts.pathSummary ?? null,
    stability: parts.stability ?? null,
  };
}

function headline(verdict: Verdict, overall: Comparison, hypothesis: Hypothesis): string {
  const rel = overall.relativeDifference;
  const change =
    rel === null
      ? `mean loss ${overall.meanCandidateLoss} vs ${overall.meanBaselineLoss}`
      : `mean loss ${rel >= 0 ? 'up' : 'down'} ${Math.abs(rel * 100).toFixed(2)}% against the baseline`;
  const tested = `Tested whether ${hypothesis.alternative}, over ${overall.n} time points (${change}).`;
  switch (verdict) {
    case 'pass':
      return `${tested} The gate passes.`;
    case 'warn':
      return `${tested} The evidence is mixed or thin: the gate passes with a warning.`;
    case 'fail':
      return `${tested} The gate fails.`;
  }
}
