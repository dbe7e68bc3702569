import { MARGIN_SIGN, type MarginKind, type Policy } from './policy.js';

/** What rejecting H0 does to the gate, by policy. */
export const ON_REJECT_VERDICTS = ['pass', 'fail'] as const;

/**
 * How a policy and a margin become the differential that is tested and the side of the test.
 *
 * - no-regression:   H0 E[L_c] ≤ (1 + r) E[L_b]  vs  H1 worse by more than the margin; the gate
 *                    fails when H0 is rejected.
 * - non-inferiority: H0 E[L_c] ≥ (1 + r) E[L_b]  vs  H1 not worse than the margin; the gate
 *                    passes when H0 is rejected.
 * - superiority:     H0 E[L_c] ≥ (1 − r) E[L_b]  vs  H1 better by more than the margin; the gate
 *                    passes when H0 is rejected.
 *
 * A relative margin r is tested as δ = 0 on d_t = L_c,t − (1 ± r) L_b,t (docs/design.md, "Margins"); an absolute
 * margin m on d_t = L_c,t − L_b,t against δ = ±m.
 */
export interface Hypothesis {
  /** Multiplier k in d_t = L_c,t − k · L_b,t. */
  readonly baselineFactor: number;
  /** δ, the value of E[d] at the boundary of H0, in loss units. */
  readonly boundary: number;
  /** 'above': evidence is d̄ well above δ (no-regression); 'below': well below δ. */
  readonly rejectWhen: 'above' | 'below';
  /** What rejecting H0 means for the gate. */
  readonly onReject: (typeof ON_REJECT_VERDICTS)[number];
  /** H0 and the alternative H1 in plain words. */
  readonly nullHypothesis: string;
  readonly alternative: string;
}

export function hypothesisFor(policy: Policy, margin: number, kind: MarginKind): Hypothesis {
  const signed = MARGIN_SIGN[policy] * margin;
  const marginText =
    margin === 0
      ? ''
      : kind === 'relative'
        ? ` by more than ${formatPercent(margin)}`
        : ` by more than ${margin} loss units`;
  const base = {
    baselineFactor: kind === 'relative' ? 1 + signed : 1,
    boundary: kind === 'relative' ? 0 : signed,
  };
  switch (policy) {
    case 'no-regression':
      return {
        ...base,
        rejectWhen: 'above',
        onReject: 'fail',
        nullHypothesis: `the candidate's expected loss is not higher than the baseline's${marginText}`,
        alternative: `the candidate's expected loss is higher than the baseline's${marginText}`,
      };
    case 'non-inferiority':
      return {
        ...base,
        rejectWhen: 'below',
        onReject: 'pass',
        nullHypothesis:
          margin === 0
            ? "the candidate's expected loss is at least the baseline's"
            : `the candidate is worse than the baseline by ${describeMargin(margin, kind)} or more`,
        alternative:
          margin === 0
            ? "the candidate's expected loss is lower than the baseline's"
            : `the candidate is not worse than the baseline by ${describeMargin(margin, kind)} or more`,
      };
    case 'superiority':
      return {
        ...base,
        rejectWhen: 'below',
        onReject: 'pass',
        nullHypothesis: `the candidate's expected loss is not lower than the baseline's${marginText}`,
        alternative: `the candidate's expected loss is lower than the baseline's${marginText}`,
      };
  }
}

function describeMargin(margin: number, kind: MarginKind): string {
  return kind === 'relative' ? formatPercent(margin) : `${margin} loss units`;
}

function formatPercent(fraction: number): string {
  return `${Number((fraction * 100).toPrecision(6))}%`;
}
