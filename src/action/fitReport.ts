import type { Report } from '../report/reportModel.js';

/** GitHub refuses comment bodies longer than this many characters. */
export const COMMENT_LIMIT_CHARS = 65_536;
/** GitHub keeps at most 1 MiB of job summary per step. */
export const SUMMARY_LIMIT_BYTES = 1024 * 1024;

export interface FitOptions {
  /** Renders a (possibly reduced) report. */
  readonly render: (report: Report) => string;
  /** Size of a text in the limit's unit (characters or bytes). */
  readonly measure: (text: string) => number;
  readonly limit: number;
  /** Text placed before the rendering (the comment marker), counted against the limit. */
  readonly prefix?: string;
  /** Where the whole report can be read, for the shortening note. */
  readonly fullReportUrl?: string;
}

export interface Fitted {
  readonly text: string;
  readonly shortened: boolean;
}

/** UTF-16 code units: never fewer than the characters GitHub counts, so a safe measure. */
export const measureChars = (text: string): number => text.length;
export const measureBytes = (text: string): number => Buffer.byteLength(text, 'utf8');

/**
 * Renders the report so that prefix + text stays within the limit. When the whole report is too
 * long, the comparison table keeps the overall row and as many further rows as fit (found by
 * bisection), and a note says so and links to the full report; if even the overall comparison
 * alone is too long (say, absurdly long names), the rendering is cut at a line boundary, open
 * `<details>` sections are closed, and the note is added.
 */
export function fitReport(report: Report, options: FitOptions): Fitted {
  const prefix = options.prefix ?? '';
  const budget = options.limit - options.measure(prefix);
  const full = options.render(report);
  if (options.measure(full) <= budget) return { text: prefix + full, shortened: false };

  const total = report.comparisons.length;
  const reduced = (k: number): string => {
    const kept = { ...report, comparisons: report.comparisons.slice(0, k) };
    return options.render(kept) + shortenedNote(options, `It shows ${k} of ${total} comparisons.`);
  };
  const fits = (k: number): boolean => options.measure(reduced(k)) <= budget;
  if (total > 1 && fits(1)) {
    let lo = 1;
    let hi = total - 1;
    while (lo < hi) {
      const mid = Math.ceil((lo + hi) / 2);
      if (fits(mid)) lo = mid;
      else hi = mid - 1;
    }
    return { text: prefix + reduced(lo), shortened: true };
  }

  const note = shortenedNote(options, 'It was cut short.');
  const source = options.render({ ...report, comparisons: report.comparisons.slice(0, 1) });
  return {
    text: prefix + cutAtLines(source, budget - options.measure(note) - 64, options.measure) + note,
    shortened: true,
  };
}

function shortenedNote(options: FitOptions, what: string): string {
  const where =
    options.fullReportUrl === undefined
      ? 'the full report is in the JSON report this step wrote'
      : `the full report is in the job summary of [this run](${options.fullReportUrl})`;
  return `\n> [!NOTE]\n> This report was shortened to fit GitHub's size limit. ${what} Read ${where}.\n`;
}

/** The longest run of whole lines within `budget`, with unclosed `<details>` closed. */
export function cutAtLines(text: string, budget: number, measure: (t: string) => number): string {
  const kept: string[] = [];
  let used = 0;
  let open = 0;
  for (const line of text.split('\n')) {
    const cost = measure(line) + 1;
    const closing = measure('\n</details>\n') * (open + 1);
    if (used + cost + closing > budget) {
      if (kept.length === 0)
        kept.push(sliceCodePoints(line, Math.max(0, budget - closing - 1), measure));
      break;
    }
    kept.push(line);
    used += cost;
    open += (line.match(/<details>/g) ?? []).length - (line.match(/<\/details>/g) ?? []).length;
  }
  for (; open > 0; open -= 1) kept.push('', '</details>');
  return `${kept.join('\n')}\n`;
}

function sliceCodePoints(line: string, budget: number, measure: (t: string) => number): string {
  let out = '';
  let used = 0;
  for (const ch of line) {
    used += measure(ch);
    if (used > budget) break;
    out += ch;
  }
  return out;
}
