import type { CheckId, IntegrityCheck } from '../integrity/checkResult.js';
import { escapeMarkdown as esc } from './escapeMarkdown.js';
import type { Report } from './reportModel.js';

/** How many examples a line shows, and how many characters of each. */
const SHOWN = 2;
const MAX_CHARS = 200;
const clip = (text: string): string =>
  text.length <= MAX_CHARS ? text : `${text.slice(0, MAX_CHARS)}…`;

/** What each check looks for, in a few words (README, "Backtest checks", has the details). */
const CHECK_LABELS: Readonly<Record<CheckId, string>> = {
  'look-ahead': 'origin at or after the timestamp',
  'horizon-steps': 'horizon differs from the steps from origin to timestamp',
  'origin-after-actuals': 'issued after the last actual',
  'origin-sets': 'origins in one file only',
  'path-sets': 'paths in one file only',
  'horizon-sets': 'horizons in one file only',
  'time-spans': "timestamps outside the other file's span",
  'series-coverage': 'series in one file only',
  'fold-purge': 'training within the purge or embargo window',
  'outside-test-window': "rows outside their fold's test window",
  'exact-predictions': 'predictions equal to the actual far more often than the other model',
};

/**
 * The backtest checks' sentences in plain text, for every renderer to escape for its medium: the
 * outcome with the time step the checks used and what the mode does to the verdict, and one line
 * per check that could not run and why. When no check ran, `summary` says so with the reasons
 * and `notRun` is empty.
 */
export function backtestChecksNotes(report: Report): { summary: string; notRun: string[] } {
  const integrity = report.integrity;
  if (integrity.checks.length === 0 && integrity.notRun.length > 0) {
    const reasons = [...new Set(integrity.notRun.map((n) => n.reason))];
    return { summary: `not run (${reasons.join('; ')}).`, notRun: [] };
  }
  const mode =
    integrity.mode === 'report'
      ? ' Shown only: they do not change the verdict (backtest-checks report).'
      : integrity.mode === 'warn'
        ? ' Findings warn (backtest-checks warn).'
        : '';
  const step =
    integrity.frequency === null
      ? ''
      : ` Steps of ${integrity.frequency.text} (${integrity.frequency.source}).`;
  return {
    summary: `${integrity.outcome}.${step}${mode}`,
    notRun: integrity.notRun.map((n) => `not run · ${n.id}: ${n.reason}`),
  };
}

/**
 * The comment's "Backtest checks" section: one line per check (ok / warn / fail, the count,
 * two examples), then one line per check that could not run and why. Every example comes from
 * an input file and is escaped.
 */
export function backtestChecksSection(report: Report): string[] {
  const integrity = report.integrity;
  const notes = backtestChecksNotes(report);
  const out = [`**Backtest checks**: ${esc(notes.summary)}`, ''];
  if (integrity.checks.length === 0 && integrity.notRun.length > 0) return out;
  for (const check of integrity.checks) out.push(`- ${checkLine(check)}`);
  for (const line of notes.notRun) out.push(`- ${esc(line)}`);
  out.push('');
  return out;
}

function checkLine(check: IntegrityCheck): string {
  const shown = check.examples.slice(0, SHOWN).map((e) => esc(clip(e)));
  const examples = shown.length === 0 ? '' : `, e.g. ${shown.join('; ')}`;
  return `${check.status} · ${check.id} (${CHECK_LABELS[check.id]}): ${check.count}${examples}`;
}

/** The terminal's lines: the outcome, and each check that did not come out ok. */
export function backtestChecksLines(report: Report, clean: (text: string) => string): string[] {
  const integrity = report.integrity;
  if (integrity.checks.length === 0) return [];
  const flagged = integrity.checks.filter((c) => c.status !== 'ok');
  const out = [
    `backtest checks: ${integrity.outcome} (${integrity.checks.length} run, ${integrity.notRun.length} not run)`,
  ];
  for (const c of flagged) {
    const eg = c.examples
      .slice(0, SHOWN)
      .map((e) => clean(clip(e)))
      .join('; ');
    out.push(`  ${c.status} ${c.id}: ${c.count}${eg === '' ? '' : `, e.g. ${eg}`}`);
  }
  return out;
}
