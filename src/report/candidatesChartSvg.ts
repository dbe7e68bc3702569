import type { CandidateSummary } from '../candidates/candidatesModel.js';
import { formatSignedPercent } from '../core/formatNumber.js';
import type { Report } from './reportModel.js';
import { xml } from './svgCharts.js';

/** Layout of the chart, in SVG user units. */
const ROW = 26;
const LEFT = 170;
const PLOT = 420;
const RIGHT = 24;
const TOP = 34;
const BOTTOM = 34;

/**
 * A dot-and-interval chart of the candidates' relative changes against the baseline, for the
 * HTML report: one row per candidate (lowest mean loss first), the point estimate
 * E[L_k]/E[L_baseline] − 1 as a dot and the relative-change set of its comparison as a bar, a
 * vertical line at no change and, with a relative margin, a dashed line at the margin. Filled
 * dots are candidates in the model confidence set, hollow ones are out. The axis is logarithmic in
 * the loss ratio 1 + change (so "half the loss" and "twice the loss" lie equally far from 0, and
 * one very poor candidate does not squash the others); ratios below 10⁻³ are drawn at 10⁻³. An
 * end of the set beyond the plotted range (or unbounded) is drawn to the edge with an arrow
 * head. Returns '' for a two-model report.
 *
 * Safe to inline in HTML: every text is escaped for XML (&, <, >, ", '), names come from files.
 * Pure: the same report gives the same string.
 */
export function candidatesChartSvg(report: Report): string {
  const candidates = report.candidates;
  if (candidates === undefined || candidates.length === 0) return '';
  const rows = [...candidates].sort((a, b) => a.rank - b.rank);
  const margin = report.settings.marginKind === 'relative' ? report.settings.margin : null;
  const [lo, hi] = axisRange(rows, margin);
  const x = (v: number) =>
    LEFT + ((logRatio(v) - logRatio(lo)) / (logRatio(hi) - logRatio(lo))) * PLOT;
  const width = LEFT + PLOT + RIGHT;
  const height = TOP + rows.length * ROW + BOTTOM;
  const parts: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} ${height}" width="${width}" height="${height}" role="img" aria-label="Relative change of each candidate against the baseline">`,
    `<title>Relative change against the baseline, with the ${pct(report.settings.confidence)} set of each comparison</title>`,
    `<text x="${LEFT}" y="18" font-size="12" font-family="sans-serif">change in mean loss against the baseline (● in the set, ○ out)</text>`,
    line(x(0), TOP - 6, x(0), TOP + rows.length * ROW, '#555', ''),
  ];
  if (margin !== null && margin > 0 && margin <= hi) {
    parts.push(line(x(margin), TOP - 6, x(margin), TOP + rows.length * ROW, '#b35900', '4 3'));
  }
  rows.forEach((c, i) => {
    const y = TOP + i * ROW + ROW / 2;
    parts.push(
      `<text x="${LEFT - 8}" y="${y + 4}" font-size="12" font-family="sans-serif" text-anchor="end">${xml(c.name)}</text>`,
    );
    const rc = c.comparison.relativeChange;
    if (rc !== null) {
      for (const piece of rc.pieces ?? [{ lower: rc.lower, upper: rc.upper }]) {
        const a = piece.lower === null || piece.lower < lo ? lo : piece.lower;
        const b = piece.upper === null || piece.upper > hi ? hi : piece.upper;
        parts.push(line(x(a), y, x(b), y, '#1f4e79', ''));
        if (a === lo && (piece.lower === null || piece.lower < lo)) parts.push(arrow(x(lo), y, -1));
        if (b === hi && (piece.upper === null || piece.upper > hi)) parts.push(arrow(x(hi), y, 1));
      }
    }
    const estimate = c.comparison.relativeDifference;
    if (estimate !== null) {
      const cx = x(Math.min(hi, Math.max(lo, estimate)));
      parts.push(
        `<circle cx="${num(cx)}" cy="${y}" r="4.5" stroke="#1f4e79" stroke-width="1.5" fill="${c.inConfidenceSet ? '#1f4e79' : '#ffffff'}"><title>${xml(`${c.name}: ${formatSignedPercent(estimate)}`)}</title></circle>`,
      );
    }
  });
  const axisY = TOP + rows.length * ROW + 14;
  for (const tick of ticks(lo, hi)) {
    parts.push(
      `<text x="${num(x(tick))}" y="${axisY}" font-size="11" font-family="sans-serif" text-anchor="middle">${xml(formatSignedPercent(tick))}</text>`,
    );
  }
  parts.push('</svg>');
  return parts.join('\n');
}

/** The plotted range: every estimate and finite interval end, 0 and the margin, padded by 5% (log scale). */
function axisRange(rows: readonly CandidateSummary[], margin: number | null): [number, number] {
  const values = [0];
  if (margin !== null) values.push(margin);
  for (const c of rows) {
    if (c.comparison.relativeDifference !== null) values.push(c.comparison.relativeDifference);
    const rc = c.comparison.relativeChange;
    for (const p of rc?.pieces ?? (rc === null ? [] : [{ lower: rc.lower, upper: rc.upper }])) {
      if (p.lower !== null) values.push(p.lower);
      if (p.upper !== null) values.push(p.upper);
    }
  }
  const lo = Math.min(...values.map(logRatio));
  const hi = Math.max(...values.map(logRatio));
  const pad = hi > lo ? (hi - lo) * 0.05 : 0.01;
  return [Math.expm1(lo - pad), Math.expm1(hi + pad)];
}

/** log(1 + change), with the ratio floored at 10⁻³. */
function logRatio(change: number): number {
  return Math.log(Math.max(1e-3, 1 + change));
}

const TICKS = [
  -0.99, -0.9, -0.5, -0.2, -0.1, -0.05, -0.02, -0.01, 0, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1, 2, 5,
  10, 20, 50, 100, 200, 500, 1000,
];

/** Round changes inside [lo, hi], thinned so that neighbours are at least a sixth of the axis apart. */
function ticks(lo: number, hi: number): number[] {
  const span = logRatio(hi) - logRatio(lo);
  const out: number[] = [];
  for (const t of TICKS) {
    if (t < lo || t > hi) continue;
    const last = out.at(-1);
    if (last === undefined || logRatio(t) - logRatio(last) >= span / 6 || t === 0) {
      if (t === 0 && last !== undefined && logRatio(0) - logRatio(last) < span / 6) out.pop();
      out.push(t);
    }
  }
  return out;
}

function line(
  x1: number,
  y1: number,
  x2: number,
  y2: number,
  colour: string,
  dash: string,
): string {
  const dashed = dash === '' ? '' : ` stroke-dasharray="${dash}"`;
  return `<line x1="${num(x1)}" y1="${num(y1)}" x2="${num(x2)}" y2="${num(y2)}" stroke="${colour}" stroke-width="2"${dashed}/>`;
}

function arrow(x: number, y: number, direction: 1 | -1): string {
  const tip = x + 6 * direction;
  return `<polygon points="${num(tip)},${y} ${num(x)},${y - 4} ${num(x)},${y + 4}" fill="#1f4e79"/>`;
}

function num(v: number): string {
  return (Math.round(v * 10) / 10).toString();
}

function pct(level: number): string {
  return `${Math.round(level * 1000) / 10}%`;
}
