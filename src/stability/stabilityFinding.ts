import { formatNumber, formatSignedPercent } from '../core/formatNumber.js';
import type { TimestampKind } from '../core/panel.js';
import type { Hypothesis } from '../decision/hypothesis.js';
import type { Verdict } from '../decision/verdict.js';
import { relativeChangeText } from '../report/relativeChangeText.js';
import type { Comparison } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import { describeSpan } from './describeSpan.js';
import type { Stability, TimeSpan } from './stabilityModel.js';

/**
 * What a candidate significantly worse recently or in some stretch does to the gate
 * (`--stability-gate`): nothing, warn, or fail.
 */
export const STABILITY_GATE_MODES = ['off', 'warn', 'fail'] as const;
export type StabilityGateMode = (typeof STABILITY_GATE_MODES)[number];

/** What the stability checks add to the gate: a verdict to merge, words for the headline. */
export interface StabilityFinding {
  /** 'warn' or 'fail' when the candidate is significantly worse recently or in some stretch. */
  readonly effect: Exclude<StabilityGateMode, 'off'> | null;
  /** Sentences appended to the headline, or '' when there is nothing to say. */
  readonly headline: string;
  readonly reasons: readonly string[];
}

/**
 * Turns `report.stability` into plain words and the gate's response. Findings: the recent
 * window's comparison fails under the policy (both tests, as overall), or the fluctuation test
 * finds stretches where the candidate is significantly worse. Either makes the gate warn
 * (`stability-gate warn`, the default), fail (`fail`), or nothing (`off`); the headline says which.
 */
export function stabilityFinding(
  stability: Stability | null,
  hypothesis: Hypothesis,
  settings: Settings,
  kind: TimestampKind,
  overallVerdict?: Verdict,
): StabilityFinding {
  if (stability === null) return { effect: null, headline: '', reasons: [] };
  const sentences: string[] = [];
  const reasons: string[] = [];
  const recent = stability.recent;
  const recentWorse = recent !== null && recent.verdict === 'fail';
  if (recent !== null && recentWorse) {
    const where = recentWords(recent, kind);
    const change = changeWords(recent);
    sentences.push(
      hypothesis.onReject === 'fail'
        ? `The candidate is worse in ${where}: ${change}.`
        : `In ${where} the candidate does not meet the policy: ${change}.`,
    );
    const split =
      stability.levels.adjustment === 'bonferroni'
        ? ` at α = ${stability.levels.recent}, half of α = ${stability.levels.alpha} (Bonferroni, beside the fluctuation test)`
        : '';
    reasons.push(
      `Recent window (${recent.n} time points, ${recent.firstTimestamp} to ${recent.lastTimestamp})${split}: ${recent.reasons.join(' ')}`,
    );
  }
  const f = stability.fluctuation;
  const stretchWorse = f?.rejected && f.worsePeriods.length > 0;
  if (f !== null && stretchWorse) {
    const spans = f.worsePeriods.slice(0, 3).map(spanWords).join(', ');
    const more = f.worsePeriods.length > 3 ? ` and ${f.worsePeriods.length - 3} more` : '';
    sentences.push(
      `${recentWorse ? 'The candidate is also' : 'Over time, the candidate is'} significantly worse over ${spans}${more} (fluctuation test, windows of ${f.windowSize} time points, ${formatNumber(f.statistic, 3)} > ${formatNumber(f.criticalValue, 4)}).`,
    );
    reasons.push(
      `Fluctuation test (Giacomini & Rossi 2010, μ = ${f.mu}, ${settings.fluctuationSides}-sided, α = ${stability.levels.fluctuation ?? settings.alpha}${splitNote(stability)}): the largest rolling statistic ${formatNumber(f.statistic)} exceeds the critical value ${formatNumber(f.criticalValue)}; it peaks over ${spanWords(f.peak)}.`,
    );
  }
  if (!recentWorse && !stretchWorse) return { effect: null, headline: '', reasons };
  const gate = settings.stabilityGate;
  const response =
    gate === 'off'
      ? 'This does not change the verdict (stability-gate off).'
      : overallVerdict === 'fail'
        ? `On its own this would ${gate === 'warn' ? 'make the gate warn' : 'fail the gate'} (stability-gate ${gate}).`
        : gate === 'warn'
          ? 'This makes the gate warn; it does not fail it (stability-gate warn).'
          : 'This fails the gate (stability-gate fail).';
  return {
    effect: gate === 'off' ? null : gate,
    headline: [...sentences, response].join(' '),
    reasons,
  };
}

function recentWords(c: Comparison, kind: TimestampKind): string {
  const first = c.firstTimestamp ?? '?';
  const last = c.lastTimestamp ?? '?';
  return `the most recent ${describeSpan(first, last, c.n, kind)} (${first} to ${last})`;
}

/**
 * "+18% mean loss (90% interval +9% to +27%)": the comparison's relative-change interval (the
 * one the comparison table shows), else the bare relative difference.
 */
function changeWords(c: Comparison): string {
  const rel = c.relativeDifference;
  if (rel === null) {
    return `mean loss ${formatNumber(c.meanCandidateLoss)} vs ${formatNumber(c.meanBaselineLoss)}`;
  }
  const rc = c.relativeChange;
  const shown = `${formatSignedPercent(rel)} mean loss`;
  if (rc === null) return shown;
  const single = rc.pieces === undefined || rc.pieces.length === 1;
  const level = `${formatNumber(rc.level * 100, 3)}% interval`;
  if (single && rc.lower !== null && rc.upper !== null) {
    return `${shown} (${level} ${formatSignedPercent(rc.lower)} to ${formatSignedPercent(rc.upper)})`;
  }
  return `${shown} (${level} ${relativeChangeText(c).replace(/^\S+ /, '')})`;
}

/** ", α/2 of 0.05 (Bonferroni, beside the recent window)" when the checks shared α. */
function splitNote(stability: Stability): string {
  return stability.levels.adjustment === 'bonferroni'
    ? `, half of α = ${stability.levels.alpha} (Bonferroni, beside the recent window)`
    : '';
}

function spanWords(span: TimeSpan): string {
  return `${span.start} to ${span.end}`;
}
