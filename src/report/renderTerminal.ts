import { formatNumber, formatPValue } from '../core/formatNumber.js';
import { inputNotes } from './inputNotes.js';
import { intervalNote, measuredCoverageText, relativeChangeText } from './relativeChangeText.js';
import { backtestChecksLines } from './renderBacktestChecks.js';
import { renderCandidatesTerminal } from './renderCandidatesTerminal.js';
import { renderStabilityTerminal } from './renderStabilityTerminal.js';
import type { Comparison, Report } from './reportModel.js';

export interface TerminalOptions {
  /** Use ANSI colours (only when stdout is a terminal and NO_COLOR is unset). */
  readonly color: boolean;
}

/**
 * Renders the report for a terminal: the verdict, the headline, an aligned table of the
 * comparisons and the reasons. Input strings are stripped of control characters so a hostile
 * series name cannot move the cursor or recolour the screen.
 */
export function renderTerminal(report: Report, options: TerminalOptions): string {
  const paint = (code: string, text: string) =>
    options.color ? `\x1b[${code}m${text}\x1b[0m` : text;
  const verdictColor = { pass: '32', warn: '33', fail: '31' }[report.verdict];
  const title = report.name === '' ? 'skillgate' : `skillgate · ${clean(report.name)}`;
  const out: string[] = [];
  out.push(`${paint('1', title)}: ${paint(`1;${verdictColor}`, report.verdict.toUpperCase())}`);
  out.push(wrap(report.headline, 100), '');
  const header = [
    'comparison',
    'n',
    'baseline',
    'candidate',
    'diff',
    'relative',
    'p (DM)',
    'p (boot)',
    'interval (boot)',
    'verdict',
  ];
  const rows = report.comparisons
    .filter((c) => c.series === 'all' && c.path === undefined)
    .map((c) => [
      scope(c),
      String(c.n),
      formatNumber(c.meanBaselineLoss),
      formatNumber(c.meanCandidateLoss),
      formatNumber(c.meanDifference),
      relativeChangeText(c),
      formatPValue(c.dieboldMariano.decisionPValue),
      formatPValue(c.bootstrap.decisionPValue),
      c.bootstrap.interval === null
        ? 'n/a'
        : `[${formatNumber(c.bootstrap.interval.lower)}, ${formatNumber(c.bootstrap.interval.upper)}]${measuredCoverageText(c.bootstrap.interval.measuredCoverage)}`,
      c.verdict,
    ]);
  const widths = header.map((h, j) => Math.max(h.length, ...rows.map((r) => (r[j] ?? '').length)));
  const line = (cells: string[]) =>
    cells
      .map((cell, j) => (j === 0 || j >= 8 ? cell.padEnd(widths[j]!) : cell.padStart(widths[j]!)))
      .join('  ');
  out.push(paint('2', line(header)));
  for (const r of rows) out.push(line(r));
  out.push(...renderStabilityTerminal(report));
  out.push(wrap(intervalNote(report), 100), '');
  out.push(...renderCandidatesTerminal(report));
  for (const reason of [...report.reasons, ...(report.comparisons[0]?.reasons ?? [])]) {
    out.push(wrap(`- ${reason}`, 100, '  '));
  }
  const summary = report.seriesSummary;
  if (summary !== null) {
    const top = summary.topRegressions.slice(0, 5).map(clean).join(', ');
    out.push(
      `series: ${summary.worse} worse, ${summary.better} better, ${summary.noEvidence} no evidence (${summary.method}-adjusted)${top === '' ? '' : `; largest regressions: ${top}`}`,
    );
  }
  const paths = report.pathSummary;
  if (paths !== null) {
    out.push(
      `paths: candidate worse on ${paths.worse} of ${paths.paths} (${paths.significantlyWorse} significantly)`,
    );
  }
  out.push(...backtestChecksLines(report, clean));
  const i = report.inputs;
  out.push(
    '',
    paint(
      '2',
      `rows matched ${i.rowsMatched}; left out: ${i.rowsDropped.baseline} baseline-only, ${i.rowsDropped.candidate} candidate-only, ${i.rowsDropped.withoutActual} without actual, ${i.rowsDropped.skippedByLoss} skipped by loss`,
    ),
  );
  for (const note of inputNotes(report)) out.push(paint('2', wrap(clean(note), 100, '  ')));
  return `${out.join('\n')}\n`;
}

function scope(c: Comparison): string {
  if (c.horizon === 'all' && c.series === 'all') return 'overall';
  const parts: string[] = [];
  if (c.horizon !== 'all') parts.push(`h=${c.horizon}`);
  if (c.series !== 'all') parts.push(clean(c.series));
  return parts.join(' ');
}

function clean(text: string): string {
  // biome-ignore lint/suspicious/noControlCharactersInRegex: stripping control characters is the point
  return text.replace(/[\u0000-\u001f\u007f-\u009f]/g, ' ');
}

function wrap(text: string, width: number, indent = ''): string {
  const words = clean(text).split(' ');
  const lines: string[] = [];
  let current = '';
  for (const w of words) {
    if (current !== '' && current.length + 1 + w.length > width) {
      lines.push(current);
      current = indent + w;
    } else {
      current = current === '' ? w : `${current} ${w}`;
    }
  }
  if (current !== '') lines.push(current);
  return lines.join('\n');
}
