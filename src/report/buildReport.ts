import type { Hypothesis } from '../decision/hypothesis.js';
import { type Verdict, worstVerdict } from '../decision/verdict.js';
import { noChecks } from '../integrity/checkPolicy.js';
import type { IntegrityReport } from '../integrity/checkResult.js';
import type { Settings } from '../settings/settings.js';
import { stabilityFinding } from '../stability/stabilityFinding.js';
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
  /** Backtest checks; absent for inputs with no rows to check (a pre-aggregated loss file). */
  readonly integrity?: IntegrityReport;
  readonly stability?: Stability | null;
}

/**
 * Assembles the report from the pieces of a run. The gate's verdict is the overall comparison's,
 * made a failure when the candidate lacks rows the baseline has (unless allowed): a candidate must
 * not pass by skipping hard cases. A failed backtest check fails the gate and a warning one makes
 * it warn (unless the checks' mode is 'report').
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
  const integrity =
    parts.integrity ??
    noChecks(settings.backtestChecks, 'a pre-aggregated loss file has no forecast rows to check');
  if (integrity.affectsVerdict && integrity.outcome !== 'ok') {
    verdicts.push(integrity.outcome === 'fail' ? 'fail' : 'warn');
    const which = integrity.checks.filter((c) => c.status === integrity.outcome).map((c) => c.id);
    reasons.push(
      integrity.outcome === 'fail'
        ? `A backtest check failed (${which.join(', ')}): the comparison cannot be trusted until the backtest is fixed.`
        : `A backtest check warns (${which.join(', ')}): look at the backtest checks before trusting the comparison.`,
    );
  }
  const stability = parts.stability ?? null;
  const finding = stabilityFinding(
    stability,
    hypothesis,
    settings,
    inputs.timestamps.kind,
    worstVerdict(verdicts),
  );
  reasons.push(...finding.reasons);
  const gateVerdict = worstVerdict(verdicts);
  const verdict = worstVerdict(finding.effect === null ? verdicts : [...verdicts, finding.effect]);
  return {
    tool: { name: 'skillgate', version: parts.version },
    name: settings.name,
    verdict,
    headline: [headline(gateVerdict, overall, hypothesis), finding.headline].join(' ').trim(),
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
    integrity,
    stability,
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
