import { formatPValue } from '../core/formatNumber.js';
import type { MeasuredCoverage } from '../intervals/measuredCoverage.js';
import { measuredCoverageText } from './relativeChangeText.js';
import type { ComparisonView, ReportView } from './reportView.js';

/**
 * Cell texts shared by the Markdown, HTML and terminal renderers. Each column keeps a fixed
 * number of significant digits (trailing zeros kept, so a column reads evenly); p-values show
 * four decimals and their ends as "< 0.0001" / "> 0.9999". Texts are plain: each renderer
 * escapes them for its medium.
 */

/** Significant digits of loss columns. */
export const LOSS_DIGITS = 4;
/** Significant digits of percentages. */
export const PERCENT_DIGITS = 3;

/** x with `digits` significant digits, trailing zeros kept (1.200), exponent form outside 1e-4…1e6. */
export function significant(x: number | null | undefined, digits = LOSS_DIGITS): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return 'n/a';
  if (x === 0) return '0';
  const magnitude = Math.abs(x);
  if (magnitude >= 1e6 || magnitude < 1e-4) return x.toExponential(digits - 1);
  return x.toPrecision(digits);
}

/** A fraction as a signed percentage with fixed significant digits: 0.0372 → "+3.72%". */
export function percent(x: number | null | undefined, digits = PERCENT_DIGITS): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return 'n/a';
  if (x === 0) return '0%';
  const text = significant(x * 100, digits);
  return `${x > 0 ? '+' : ''}${text}%`;
}

/** A p-value: four decimals, with its ends as "< 0.0001" and "> 0.9999" (core/formatNumber). */
export const pValue = formatPValue;

/** An interval for E[L_c]/E[L_b] − 1; a null end is unbounded on that side. */
export interface RelativeInterval {
  readonly lower: number | null;
  readonly upper: number | null;
  readonly level: number;
  readonly method: string;
  /** Disjoint pieces when the set is not one interval (empty: no margin is kept). */
  readonly pieces?: readonly { readonly lower: number | null; readonly upper: number | null }[];
  /** The coverage study's measured coverage when it falls short of the level. */
  readonly measuredCoverage?: MeasuredCoverage;
}

/**
 * An interval for E[L_c]/E[L_b] − 1, the quantity the "change" column prints: the engine's
 * test-inversion set (`relativeChange`) when the report has it, else the bootstrap's interval
 * for the same ratio (computed with a relative margin). Never an interval for another quantity.
 */
export function relativeInterval(c: ComparisonView): RelativeInterval | null {
  const r = c.relativeChange ?? null;
  if (r !== null) {
    return {
      lower: r.lower,
      upper: r.upper,
      level: r.level,
      method: r.method,
      ...(r.pieces === undefined ? {} : { pieces: r.pieces }),
      ...(r.measuredCoverage === undefined ? {} : { measuredCoverage: r.measuredCoverage }),
    };
  }
  const b = c.bootstrap.relativeInterval;
  return b === null ? null : { lower: b.lower, upper: b.upper, level: b.level, method: b.method };
}

/** "[+1.10%, +6.40%]"; "[−∞, +6.40%]" for an unbounded end; pieces joined by ∪; ∅ when empty. */
export function intervalText(i: RelativeInterval): string {
  const piece = (p: { lower: number | null; upper: number | null }) =>
    `[${p.lower === null ? '−∞' : percent(p.lower)}, ${p.upper === null ? '+∞' : percent(p.upper)}]`;
  if (i.pieces !== undefined) return i.pieces.length === 0 ? '∅' : i.pieces.map(piece).join(' ∪ ');
  return piece(i);
}

/** "+3.72% [+1.10%, +6.40%]", or the point alone when no interval for the ratio exists. */
export function changeCell(c: ComparisonView): string {
  const point = percent(c.relativeDifference);
  const i = relativeInterval(c);
  return i === null
    ? point
    : `${point} ${intervalText(i)}${measuredCoverageText(i.measuredCoverage)}`;
}

export type Evidence = 'worse' | 'better' | 'no clear difference' | 'n/a';

/**
 * Evidence in words about the plain difference E[L_c] − E[L_b], whatever the policy: "worse"
 * when the interval for the relative change lies above 0, "better" when below (at the default
 * level 1 − 2α, exactly when the tests reject equal loss at α on that side). Without such an
 * interval, both tests' intervals for E[L_c − L_b] must exclude 0 on the same side. Per-series
 * comparisons use their multiplicity-adjusted direction.
 */
export function evidenceOf(c: ComparisonView, _report: ReportView): Evidence {
  if (c.direction !== undefined) {
    return c.direction === 'no evidence' ? 'no clear difference' : c.direction;
  }
  const i = relativeInterval(c);
  if (i !== null) return sideOf(i.pieces ?? [i]);
  const intervals = [c.dieboldMariano.interval, c.bootstrap.interval].filter((x) => x !== null);
  if (intervals.length === 0) return 'n/a';
  return sideOf(intervals);
}

function sideOf(intervals: readonly { lower: number | null; upper: number | null }[]): Evidence {
  if (intervals.every((i) => i.lower !== null && i.lower > 0)) return 'worse';
  if (intervals.every((i) => i.upper !== null && i.upper < 0)) return 'better';
  return 'no clear difference';
}
