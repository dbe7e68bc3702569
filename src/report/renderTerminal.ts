import { candidatesSection } from './candidatesSection.js';
import { differenceSeries, sparklineText } from './differenceChart.js';
import { backtestChecksLines } from './renderBacktestChecks.js';
import { renderStabilityTerminal } from './renderStabilityTerminal.js';
import type { Report } from './reportModel.js';
import { reportSections } from './reportSections.js';
import type { ReportTable } from './reportTable.js';
import type { ReportView } from './reportView.js';
import { terminalText as clean } from './terminalText.js';

export interface TerminalOptions {
  /** Use ANSI colours (only when stdout is a terminal and NO_COLOR is unset). */
  readonly color: boolean;
  /** File paths are shown relative to this directory. */
  readonly workingDirectory?: string;
}

/**
 * Renders the report for a terminal: the verdict with its deciding reason, the change with its
 * interval, the main table, a one-line sparkline of the difference over time, the per-horizon
 * rows (for locating only) and what was left out. Input strings are stripped of control
 * characters so a hostile series name cannot move the cursor or recolour the screen.
 */
export function renderTerminal(report: Report, options: TerminalOptions): string {
  const view = report as ReportView;
  const s = reportSections(view, options);
  const paint = (code: string, text: string) =>
    options.color ? `\x1b[${code}m${text}\x1b[0m` : text;
  const verdictColor = { pass: '32', warn: '33', fail: '31' }[report.verdict];
  const out: string[] = [];
  out.push(
    `${paint('1', clean(s.title))}: ${paint(`1;${verdictColor}`, report.verdict.toUpperCase())}`,
  );
  out.push(wrap(`${s.lead} ${s.change}`, 100), '');
  out.push(...textTable(s.main, paint));
  out.push('', paint('2', wrap(s.intervalNote, 100)));
  const candidates = candidatesSection(report);
  if (candidates !== null) {
    out.push('', wrap(candidates.heading, 100));
    out.push(...textTable({ ...candidates.ranking, header: candidates.shortHeader }, paint));
    out.push(wrap(candidates.spaSentence, 100, '  '), wrap(candidates.setSentence, 100, '  '));
  }
  const chart = differenceSeries(view);
  if (chart !== null) out.push('', clean(sparklineText(chart)));
  const overTime = renderStabilityTerminal(report);
  if (overTime.length > 0) out.push(...overTime.map((l) => wrap(l, 100, '  ')));
  if (s.notes.length > 0) out.push('');
  for (const note of s.notes) out.push(wrap(`- ${note}`, 100, '  '));
  if (s.horizons !== null) {
    out.push('', paint('2', 'by horizon (for locating only; p Holm-adjusted across horizons):'));
    out.push(...textTable(s.horizons, paint));
  }
  if (s.series !== null) out.push('', wrap(s.series.summary, 100));
  if (s.paths !== null) out.push('', wrap(s.paths.summary, 100));
  const checks = backtestChecksLines(report, clean);
  if (checks.length > 0) out.push('', ...checks);
  for (const r of report.reasons) {
    if (r.startsWith('The candidate lacks')) out.push(wrap(`- ${r}`, 100, '  '));
  }
  out.push('');
  const i = report.inputs;
  out.push(
    paint(
      '2',
      clean(
        `rows matched ${i.rowsMatched}; left out: ${i.rowsDropped.baseline} baseline-only, ${i.rowsDropped.candidate} candidate-only, ${i.rowsDropped.withoutActual} without actual, ${i.rowsDropped.skippedByLoss} skipped by loss`,
      ),
    ),
  );
  for (const l of s.inputs.lines) {
    if (!l.startsWith('Rows matched') && !l.startsWith('Left out')) {
      out.push(paint('2', wrap(l, 100, '  ')));
    }
  }
  if (s.changedSettings !== '') out.push(paint('2', clean(`settings: ${s.changedSettings}`)));
  return `${out.join('\n')}\n`;
}

function textTable(t: ReportTable, paint: (code: string, text: string) => string): string[] {
  const rows = t.rows.map((r) => r.map(clean));
  const widths = t.header.map((h, j) =>
    Math.max(h.length, ...rows.map((r) => (r[j] ?? '').length)),
  );
  const line = (cells: readonly string[]) =>
    cells
      .map((cell, j) =>
        t.align[j] === 'right' ? cell.padStart(widths[j]!) : cell.padEnd(widths[j]!),
      )
      .join('  ')
      .trimEnd();
  return [paint('2', line(t.header)), ...rows.map(line)];
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
