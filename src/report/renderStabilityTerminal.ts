import { formatNumber, formatPValue } from '../core/formatNumber.js';
import { relativeChangeText } from './relativeChangeText.js';
import type { Report } from './reportModel.js';
import { terminalText as clean } from './terminalText.js';

/**
 * Terminal lines for `report.stability`: the recent window beside the overall comparison and
 * the fluctuation test, one line each (the headline already says what they found). Labels are
 * stripped of control characters.
 */
export function renderStabilityTerminal(report: Report): string[] {
  const s = report.stability;
  if (s === null) return [];
  const out: string[] = [];
  const r = s.recent;
  const split = s.levels.adjustment === 'bonferroni' ? ', α/2 each by Bonferroni' : '';
  if (r !== null) {
    out.push(
      `recent window: ${r.n} time points ${clean(r.firstTimestamp ?? '?')} to ${clean(r.lastTimestamp ?? '?')}, relative ${relativeChangeText(r)}, p (DM) ${formatPValue(r.dieboldMariano.decisionPValue)}, p (boot) ${formatPValue(r.bootstrap.decisionPValue)}, α = ${s.levels.recent ?? report.policy.alpha}${split}: ${r.verdict}`,
    );
  }
  const f = s.fluctuation;
  if (f !== null) {
    out.push(
      `fluctuation test: max ${formatNumber(f.statistic, 3)} vs ${formatNumber(f.criticalValue, 4)} (windows of ${f.windowSize}, μ = ${f.mu}, α = ${s.levels.fluctuation ?? report.policy.alpha}${split}); ${
        f.worsePeriods.length === 0
          ? 'no stretch significantly worse'
          : `worse over ${f.worsePeriods.map((w) => `${clean(w.start)} to ${clean(w.end)}`).join(', ')}`
      }`,
    );
  }
  return out;
}
