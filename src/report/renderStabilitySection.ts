import { formatNumber, formatPValue, formatSignedPercent } from '../core/formatNumber.js';
import type { Stability } from '../stability/stabilityModel.js';
import { escapeMarkdown as esc } from './escapeMarkdown.js';
import { relativeChangeText } from './relativeChangeText.js';
import type { Comparison, Report } from './reportModel.js';
import { markdownTable, type ReportTable, table } from './reportTable.js';

/**
 * What the "Over time" section says, from `report.stability`, as plain text and tables that each
 * renderer escapes for its medium: the recent window beside the overall comparison, the
 * fluctuation test in one sentence, how α was shared, and the mean losses by period. Null when
 * the report has no stability part.
 */
export interface OverTimeParts {
  readonly windows: ReportTable | null;
  readonly sentences: readonly string[];
  readonly periods: ReportTable | null;
}

export function overTimeParts(report: Report): OverTimeParts | null {
  const stability = report.stability;
  const overall = report.comparisons[0];
  if (stability === null || overall === undefined) return null;
  const sentences = [fluctuationSentence(stability, report)];
  if (stability.levels.adjustment === 'bonferroni') sentences.push(levelsSentence(stability));
  return {
    windows: stability.recent === null ? null : windowTable(overall, stability.recent),
    sentences,
    periods: stability.periods.length > 0 ? periodTable(stability) : null,
  };
}

/**
 * The comment's "Over time" section (Markdown). Every timestamp label is escaped (it came from
 * an input file). Empty when the report has no stability part.
 */
export function renderStabilitySection(report: Report): string[] {
  const parts = overTimeParts(report);
  if (parts === null) return [];
  const out = ['**Over time**', ''];
  if (parts.windows !== null) out.push(...markdownTable(parts.windows), '');
  for (const sentence of parts.sentences) out.push(esc(sentence), '');
  if (parts.periods !== null) {
    out.push(
      `<details><summary>Mean loss by period (${parts.periods.rows.length} periods)</summary>`,
      '',
      ...markdownTable(parts.periods),
      '',
      '</details>',
      '',
    );
  }
  return out;
}

function windowTable(overall: Comparison, recent: Comparison): ReportTable {
  const level = recent.relativeChange?.level;
  const head =
    level === undefined ? 'relative' : `relative [${formatNumber(level * 100, 3)}% interval]`;
  const row = (name: string, c: Comparison) => [
    name,
    `${c.firstTimestamp ?? 'n/a'} to ${c.lastTimestamp ?? 'n/a'}`,
    String(c.n),
    formatNumber(c.meanBaselineLoss),
    formatNumber(c.meanCandidateLoss),
    relativeChangeText(c),
    formatPValue(c.dieboldMariano.decisionPValue),
    formatPValue(c.bootstrap.decisionPValue),
    c.verdict,
  ];
  return table(
    [
      'window',
      'from – to',
      'time points',
      'baseline loss',
      'candidate loss',
      head,
      'p (DM)',
      'p (bootstrap)',
      'verdict',
    ],
    ['left', 'left', 'right', 'right', 'right', 'right', 'right', 'right', 'left'],
    [row('whole backtest', overall), row('most recent', recent)],
  );
}

function fluctuationSentence(stability: Stability, report: Report): string {
  const f = stability.fluctuation;
  if (f === null) {
    return 'Fluctuation test: not run (it needs at least 20 time points, a non-zero long-run variance and a level between 0.01 and 0.10; beside a recent window it runs at α/2).';
  }
  const sides = report.settings.fluctuationSides === 'one' ? 'one-sided' : 'two-sided';
  const setup = `Fluctuation test (Giacomini & Rossi 2010, ${sides}): the Diebold–Mariano statistic over rolling windows of ${f.windowSize} time points (μ = ${f.mu}); its largest value ${formatNumber(f.statistic, 3)}, over ${f.peak.start} to ${f.peak.end}, against the critical value ${formatNumber(f.criticalValue, 4)} at α = ${stability.levels.fluctuation ?? report.policy.alpha}.`;
  if (f.worsePeriods.length > 0) {
    const spans = f.worsePeriods.map((s) => `${s.start} to ${s.end}`).join(', ');
    return `${setup} The candidate is significantly worse over ${spans}.`;
  }
  return f.rejected
    ? `${setup} Accuracy is not equal throughout, but in no stretch is the candidate significantly worse.`
    : `${setup} No stretch where the candidate is significantly worse.`;
}

/** How α was shared: each check at α/2 so that "not stable" (either check) keeps α. */
function levelsSentence(stability: Stability): string {
  const { alpha, fluctuation, recent } = stability.levels;
  return `Both checks ran, so each ran at half the level (Bonferroni): the recent window at α = ${recent} and the fluctuation test at α = ${fluctuation}; together they call the difference not stable at most α = ${alpha} of the time when accuracy is equal throughout.`;
}

function periodTable(stability: Stability): ReportTable {
  return table(
    ['period', 'time points', 'baseline loss', 'candidate loss', 'relative'],
    ['left', 'right', 'right', 'right', 'right'],
    stability.periods.map((p) => [
      p.start === p.end ? p.start : `${p.start} to ${p.end}`,
      String(p.n),
      formatNumber(p.meanBaselineLoss),
      formatNumber(p.meanCandidateLoss),
      formatSignedPercent(p.relativeDifference),
    ]),
  );
}
