import { formatPValue } from '../core/formatNumber.js';
import type { Hypothesis } from './hypothesis.js';
import type { Verdict } from './verdict.js';

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
  readonly method: 'holm' | 'bh';
  readonly n: number;
  readonly minPoints: number;
}): { verdict: Verdict; reasons: string[]; rejected: boolean | null } {
  const { hypothesis, alpha, adjustedPValue: p } = input;
  const name = input.method === 'holm' ? 'Holm-adjusted' : 'Benjamini–Hochberg-adjusted';
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
