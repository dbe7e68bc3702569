import { formatNumber, formatSignedPercent } from '../core/formatNumber.js';
import type { IntervalPiece } from '../intervals/intervalSet.js';
import type { MeasuredCoverage } from '../intervals/measuredCoverage.js';
import { confidenceOverridesDefault } from '../settings/defaultConfidence.js';
import type { Comparison, Report } from './reportModel.js';

/**
 * The relative change with its interval as the renderers print it, e.g. "+3.2% [−1.0%, +7.5%]".
 * An unbounded end prints as −∞ / +∞; a set of several pieces as their union, "∅" when empty.
 * Falls back to the bare relative difference when no interval exists.
 */
export function relativeChangeText(c: Comparison): string {
  const rc = c.relativeChange;
  const point = formatSignedPercent(c.relativeDifference);
  if (rc === null) return point;
  const pieces: readonly IntervalPiece[] = rc.pieces ?? [{ lower: rc.lower, upper: rc.upper }];
  if (pieces.length === 0) return `${point} ∅`;
  return `${point} ${pieces.map(pieceText).join(' ∪ ')}${measuredCoverageText(rc.measuredCoverage)}`;
}

/**
 * " (measured coverage 84%)" when the coverage study found the interval more than 2 points under
 * its level (src/intervals/measuredCoverage.ts), else ""; `intervalNote` says what it means.
 */
export function measuredCoverageText(measured: MeasuredCoverage | undefined): string {
  if (measured === undefined) return '';
  return ` (measured coverage ${formatNumber(measured.coverage * 100, 2)}%)`;
}

function pieceText(p: IntervalPiece): string {
  const lower = p.lower === null ? '−∞' : formatSignedPercent(p.lower);
  const upper = p.upper === null ? '+∞' : formatSignedPercent(p.upper);
  return `[${lower}, ${upper}]`;
}

/**
 * One sentence on what the intervals mean: at the default level 1 − 2α each end is a one-sided
 * α bound and the relative-change interval shows the decision at any margin; with another
 * `--confidence` the intervals and the tests may disagree.
 */
export function intervalNote(report: Report): string {
  const { confidence, alpha } = report.settings;
  const pct = `${formatNumber(confidence * 100, 3)}%`;
  if (confidenceOverridesDefault(confidence, alpha)) {
    return (
      `Intervals are ${pct}, set by --confidence instead of the default 1 − 2α = ` +
      `${formatNumber((1 - 2 * alpha) * 100, 3)}%: the intervals and the tests (α = ${alpha} each side) may disagree.`
    );
  }
  const base =
    `Intervals are ${pct} (1 − 2α): each end is a one-sided bound at α = ${alpha}. The relative ` +
    'change interval holds the relative margins at which the gate would not reject: a margin ' +
    'below its lower end means evidence of a regression larger than that margin.';
  const measured = report.comparisons
    .flatMap((c) => [
      c.relativeChange?.measuredCoverage,
      c.dieboldMariano.interval?.measuredCoverage,
      c.bootstrap.interval?.measuredCoverage,
    ])
    .find((m) => m !== undefined);
  return measured === undefined
    ? base
    : `${base} A measured coverage beside an interval is the lowest the validation study ` +
        `(docs/validation.md) found at n = ${measured.studiedN} time points, over designs up to ` +
        'strong persistence and heavy tails.';
}
