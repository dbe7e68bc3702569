import { formatPValue } from '../core/formatNumber.js';
import { ADJUSTMENTS, type AdjustmentMethod } from '../multiplicity/adjustmentMethod.js';
import type { Hypothesis } from './hypothesis.js';
import type { Verdict } from './verdict.js';

/**
 * What the adjusted one-sided tests found for one series of a family, whatever the policy:
 * `worse` and `better` need evidence in that direction.
 */
export const SERIES_DIRECTIONS = ['worse', 'better', 'no evidence'] as const;
export type SeriesDirection = (typeof SERIES_DIRECTIONS)[number];

/**
 * The verdict of one member of a family of comparisons (one series among many), from its
 * multiplicity-adjusted p-value in the policy's direction: rejected when adjusted p ≤ α. This
 * verdict locates a regression; it does not decide the gate, which rests on the overall
 * comparison (whole time points, all series).
 */
export function decideAdjusted(input: {
  readonly hypothesis: Hypothesis;
  readonly alpha: number;
  readonly adjustedPValue: number | null;
  readonly method: AdjustmentMethod;
  readonly n: number;
  readonly minPoints: number;
}): { verdict: Verdict; reasons: string[]; rejected: boolean | null } {
  const { hypothesis, alpha, adjustedPValue: p } = input;
  const name = `${ADJUSTMENTS[input.method].name}-adjusted`;
  if (p === null) {
    return {
      verdict: 'warn',
      reasons: ['The Diebold–Mariano test could not be computed for this series.'],
      rejected: null,
    };
  }
  const rejected = p <= alpha;
  const onKeep: Verdict = hypothesis.onReject === 'fail' ? 'pass' : 'fail';
  const text = formatPValue(p);
  const shown = /^[<>]/.test(text) ? `p ${text}` : `p = ${text}`;
  const reasons = [
    `${name} Diebold–Mariano ${shown} ${rejected ? '≤' : '>'} α = ${alpha}: ${rejected ? 'evidence' : 'no evidence'} that ${hypothesis.alternative}.`,
  ];
  let verdict: Verdict = rejected ? hypothesis.onReject : onKeep;
  if (input.n < input.minPoints) {
    verdict = 'warn';
    reasons.push(`Too little data: ${input.n} time points, fewer than ${input.minPoints}.`);
  }
  return { verdict, reasons, rejected };
}
