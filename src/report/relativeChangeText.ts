import { formatNumber, formatSignedPercent } from '../core/formatNumber.js';
import type { IntervalPiece } from '../intervals/intervalSet.js';
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
  return `${point} ${pieces.map(pieceText).join(' ∪ ')}`;
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
  return (
    `Intervals are ${pct} (1 − 2α): each end is a one-sided bound at α = ${alpha}. The relative ` +
    'change interval holds the relative margins at which the gate would not reject: a margin ' +
    'below its lower end means evidence of a regression larger than that margin.'
  );
}
