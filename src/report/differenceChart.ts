import { MARGIN_SIGN } from '../decision/policy.js';
import type { PeriodSummary } from '../stability/stabilityModel.js';
import { percent } from './cells.js';
import type { ReportView } from './reportView.js';

/**
 * The loss difference over time, drawn from `report.stability.periods` (the engine's own
 * buckets: this module never re-buckets): one point per period, the relative difference
 * E[L_c]/E[L_b] − 1 in percent, with the zero line and, for a relative margin, the margin line.
 */
export interface DifferenceSeries {
  readonly labels: readonly string[];
  /** Percent; periods whose baseline loss is 0 (no relative difference) are left out. */
  readonly values: readonly number[];
  readonly periods: readonly PeriodSummary[];
  /** The margin in percent on the same axis (+r for no-regression and non-inferiority, −r for superiority), or null. */
  readonly margin: number | null;
  readonly first: string;
  readonly last: string;
}

export function differenceSeries(report: ReportView): DifferenceSeries | null {
  const all = report.stability?.periods ?? [];
  const periods = all.filter(
    (p) => p.relativeDifference !== null && Number.isFinite(p.relativeDifference),
  );
  if (periods.length < 2) return null;
  const p = report.policy;
  const margin =
    p.marginKind === 'relative' && p.margin > 0 ? MARGIN_SIGN[p.policy] * p.margin * 100 : null;
  return {
    labels: periods.map((x) => periodLabel(x.start)),
    values: periods.map((x) => (x.relativeDifference as number) * 100),
    periods,
    margin,
    first: all[0]!.start,
    last: all.at(-1)!.end,
  };
}

/** A timestamp as a short axis label: a date without its midnight time, safe characters only. */
export function periodLabel(timestamp: string): string {
  const t = timestamp.replace(/T00:00(:00(\.0+)?)?Z?$/, '');
  return t.replace(/[^A-Za-z0-9 .:/+-]/g, '').slice(0, 16);
}

const BLOCKS = '▁▂▃▄▅▆▇█';
/**
 * Line colours in order: the difference (dark), zero (grey), the margin (rust). Colour names, not
 * hex codes: "#1…" in a comment reads to GitHub like an issue reference.
 */
const PALETTE = 'black, darkgray, sienna';

/**
 * One line of block characters, one per value, scaled between the smallest and largest value
 * (0 included, so bars above the midline read as "worse"): for renderers without charts.
 */
export function sparkline(values: readonly number[]): string {
  if (values.length === 0) return '';
  const lo = Math.min(0, ...values);
  const hi = Math.max(0, ...values);
  const span = hi - lo;
  return values
    .map((v) => BLOCKS[span === 0 ? 0 : Math.min(7, Math.floor(((v - lo) / span) * 8))]!)
    .join('');
}

/** "−2.10% … +8.40% per period, 2026-03-01 → 2026-10-27: ▃▄▅▇█" */
export function sparklineText(series: DifferenceSeries): string {
  const lo = Math.min(...series.values) / 100;
  const hi = Math.max(...series.values) / 100;
  return `change per period, ${periodLabel(series.first)} → ${periodLabel(series.last)}: ${sparkline(series.values)} (from ${percent(lo)} to ${percent(hi)})`;
}

/**
 * A Mermaid xychart (the `xychart-beta` diagram GitHub renders): the difference per period as a
 * line, a flat line at 0 and, when there is one, a flat line at the margin. Labels are reduced
 * to safe characters, so input text cannot end the diagram or the code block.
 */
export function mermaidChart(series: DifferenceSeries): string[] {
  const n = series.values.length;
  const values = series.values.map(round);
  const top = Math.max(0, series.margin ?? 0, ...values);
  const bottom = Math.min(0, series.margin ?? 0, ...values);
  const pad = Math.max(0.5, (top - bottom) * 0.08);
  // A numbered axis (dates in its title): n date labels would overlap in a comment column.
  const lines = [
    '```mermaid',
    `%%{init: {"themeVariables": {"xyChart": {"plotColorPalette": "${PALETTE}"}}}}%%`,
    'xychart-beta',
    '    title "Candidate vs baseline: change in mean loss per period (%)"',
    `    x-axis "period, ${periodLabel(series.first)} to ${periodLabel(series.last)}" 1 --> ${n}`,
    `    y-axis "change in mean loss (%)" ${round(bottom - pad)} --> ${round(top + pad)}`,
    `    line [${values.join(', ')}]`,
    `    line [${Array(n).fill(0).join(', ')}]`,
  ];
  if (series.margin !== null)
    lines.push(`    line [${Array(n).fill(round(series.margin)).join(', ')}]`);
  lines.push('```');
  return lines;
}

/** What the lines of the chart are, in words (Mermaid's xychart has no legend). */
export function chartCaption(series: DifferenceSeries): string {
  return `The first line is the candidate's mean loss against the baseline's in each of ${series.values.length} periods (above 0: the candidate is worse then); the flat line at 0 is no difference${
    series.margin === null ? '' : `; the flat line at ${percent(series.margin / 100)} is the margin`
  }.`;
}

function round(x: number): number {
  return Number(x.toFixed(2));
}
