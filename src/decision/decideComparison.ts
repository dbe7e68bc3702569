import { formatPValue } from '../core/formatNumber.js';
import type { Hypothesis } from './hypothesis.js';
import type { Agreement, ShortDataVerdict } from './policy.js';
import type { Verdict } from './verdict.js';

/** What one test says, reduced to what the decision needs. */
export interface TestEvidence {
  /** Display name, e.g. "Diebold–Mariano (ewc)". */
  readonly label: string;
  /**
   * p-value in the policy's direction (upper tail for no-regression, lower tail otherwise), or
   * null when the test could not be computed (`state` says why).
   */
  readonly pValue: number | null;
  /** Mean of the tested differential. */
  readonly mean: number;
  readonly state: 'ok' | 'identical' | 'zero-variance' | 'too-short' | 'not-run';
}

export interface DecisionInput {
  readonly hypothesis: Hypothesis;
  readonly alpha: number;
  readonly agreement: Agreement;
  readonly dieboldMariano: TestEvidence;
  readonly bootstrap: TestEvidence;
  /** Time points in the tested series. */
  readonly n: number;
  readonly minPoints: number;
  readonly shortData: ShortDataVerdict;
  /** Candidate and baseline losses are equal on every row. */
  readonly identicalLosses: boolean;
}

export interface Decision {
  readonly verdict: Verdict;
  readonly reasons: string[];
  /** Whether each test rejected H0 (null: it could not be computed). */
  readonly rejected: {
    readonly dieboldMariano: boolean | null;
    readonly bootstrap: boolean | null;
  };
}

/**
 * Turns the two tests' evidence into a verdict under a declared policy.
 *
 * A test rejects H0 when its p-value is ≤ α. With agreement `both`, two rejections give the
 * policy's rejection outcome, none the opposite, and a split `warn`; `either` takes the outcome on
 * any rejection; `dm` / `bootstrap` follow that test alone. A differential with zero variance is
 * decided by the sign of d̄ − δ (every time point says the same). Fewer than `minPoints` time
 * points turn the verdict into `warn` (or `fail`) with the reason "too little data".
 */
export function decideComparison(input: DecisionInput): Decision {
  const { hypothesis, alpha } = input;
  const reasons: string[] = [];
  if (input.identicalLosses) {
    const verdict: Verdict =
      hypothesis.rejectWhen === 'below' && hypothesis.boundary < 0 ? 'fail' : 'pass';
    reasons.push(
      verdict === 'pass'
        ? 'The candidate has exactly the same loss as the baseline on every row.'
        : 'The candidate has exactly the same loss as the baseline on every row, so it cannot be better by the margin.',
    );
    return { verdict, reasons, rejected: { dieboldMariano: null, bootstrap: null } };
  }

  const rejects = (e: TestEvidence): boolean | null => {
    if (e.state === 'zero-variance' || e.state === 'identical') {
      const gap = e.mean - hypothesis.boundary;
      return hypothesis.rejectWhen === 'above' ? gap > 0 : gap < 0;
    }
    if (e.pValue === null) return null;
    return e.pValue <= alpha;
  };
  const dm = rejects(input.dieboldMariano);
  const bs = rejects(input.bootstrap);
  const rejected = { dieboldMariano: dm, bootstrap: bs };
  const tests = [
    { e: input.dieboldMariano, r: dm },
    { e: input.bootstrap, r: bs },
  ];
  for (const { e, r } of tests) reasons.push(describeTest(e, r, alpha, hypothesis));

  const onReject = hypothesis.onReject;
  const onKeep: Verdict = onReject === 'fail' ? 'pass' : 'fail';
  let verdict: Verdict;
  const considered =
    input.agreement === 'dm' ? [dm] : input.agreement === 'bootstrap' ? [bs] : [dm, bs];
  const known = considered.filter((r): r is boolean => r !== null);
  if (known.length === 0) {
    verdict = 'warn';
    reasons.push('No test could be computed, so there is no evidence either way.');
  } else if (input.agreement === 'either') {
    verdict = known.includes(true) ? onReject : onKeep;
  } else if (known.length < considered.length) {
    verdict = known[0] ? onReject : onKeep;
    reasons.push('Only one test could be computed; the verdict rests on it alone.');
  } else if (known.every((r) => r)) {
    verdict = onReject;
  } else if (known.every((r) => !r)) {
    verdict = onKeep;
  } else {
    verdict = 'warn';
    reasons.push('The two tests disagree, so the gate asks a person to look (agreement: both).');
  }

  if (input.n < input.minPoints) {
    reasons.push(
      `Too little data: ${input.n} time points, fewer than the ${input.minPoints} required for a firm verdict.`,
    );
    verdict = input.shortData;
  }
  return { verdict, reasons, rejected };
}

function describeTest(
  e: TestEvidence,
  rejected: boolean | null,
  alpha: number,
  hypothesis: Hypothesis,
): string {
  if (rejected === null) return `${e.label}: could not be computed (${e.state}).`;
  if (e.state === 'zero-variance' || e.state === 'identical') {
    return `${e.label}: the differential is constant, so its sign decides: ${
      rejected ? 'evidence that' : 'no evidence that'
    } ${hypothesis.alternative}.`;
  }
  const text = formatPValue(e.pValue);
  const p = /^[<>]/.test(text) ? `p ${text}` : `p = ${text}`;
  return rejected
    ? `${e.label}: ${p} ≤ α = ${alpha}: evidence that ${hypothesis.alternative}.`
    : `${e.label}: ${p} > α = ${alpha}: no evidence that ${hypothesis.alternative}.`;
}
