import { type Verdict, worstVerdict } from '../decision/verdict.js';

/** How several candidates decide the gate (`--selection-rule`; see decideCandidates). */
export const SELECTION_RULES = ['preferred-in-set', 'none-worse', 'some-better'] as const;
export type SelectionRule = (typeof SELECTION_RULES)[number];

export interface CandidateDecisionInput {
  readonly rule: SelectionRule;
  readonly alpha: number;
  readonly setAlpha: number;
  readonly preferred: {
    readonly name: string;
    readonly verdict: Verdict;
    readonly inConfidenceSet: boolean;
    readonly mcsPValue: number;
  };
  /** The SPA test the rule uses: consistent p-value (Hansen 2005) in the rule's direction. */
  readonly spaPValue: number;
  /** Candidates whose own comparison failed for a reason of the gate (e.g. missing rows). */
  readonly missingRows: readonly string[];
}

/**
 * The gate's decision with several candidates (docs/decisions/0015-several-candidates.md):
 * - preferred-in-set: pass when the preferred candidate is in the model confidence set at
 *   1 − setAlpha and its own comparison passes (its warning stays a warning); fail when it is
 *   out of the set or its comparison fails. A candidate among the best, not worse than the
 *   baseline, fails with probability at most about setAlpha + alpha (union bound).
 * - none-worse: fail when the SPA test (H0 "no candidate is worse than the baseline") rejects at
 *   alpha with the consistent p-value; else pass. False failures ≤ alpha asymptotically.
 * - some-better: pass when the SPA test (H0 "no candidate beats the baseline") rejects at alpha;
 *   else fail. False passes ≤ alpha asymptotically.
 * Under every rule a candidate lacking baseline rows fails the gate (unless allow-missing).
 */
export function decideCandidates(input: CandidateDecisionInput): {
  verdict: Verdict;
  reasons: string[];
} {
  const { rule, alpha, setAlpha, preferred, spaPValue } = input;
  const reasons: string[] = [];
  const verdicts: Verdict[] = [];
  const p = spaPValue.toPrecision(3);
  switch (rule) {
    case 'preferred-in-set': {
      const level = `${Math.round((1 - setAlpha) * 1000) / 10}%`;
      if (!preferred.inConfidenceSet) {
        verdicts.push('fail');
        reasons.push(
          `The preferred candidate ${preferred.name} is not in the ${level} model confidence set (MCS p-value ${preferred.mcsPValue.toPrecision(3)} < ${setAlpha}): other models are significantly more accurate.`,
        );
      } else {
        reasons.push(
          `The preferred candidate ${preferred.name} is in the ${level} model confidence set (MCS p-value ${preferred.mcsPValue.toPrecision(3)}).`,
        );
      }
      verdicts.push(preferred.verdict);
      reasons.push(`Its own comparison against the baseline: ${preferred.verdict}.`);
      break;
    }
    case 'none-worse':
      if (spaPValue <= alpha) {
        verdicts.push('fail');
        reasons.push(
          `The SPA test finds some candidate worse than the baseline (consistent p-value ${p} ≤ ${alpha}).`,
        );
      } else {
        verdicts.push('pass');
        reasons.push(
          `No evidence that any candidate is worse than the baseline (SPA consistent p-value ${p} > ${alpha}).`,
        );
      }
      break;
    case 'some-better':
      if (spaPValue <= alpha) {
        verdicts.push('pass');
        reasons.push(
          `The SPA test finds some candidate better than the baseline, allowing for the choice among all of them (consistent p-value ${p} ≤ ${alpha}).`,
        );
      } else {
        verdicts.push('fail');
        reasons.push(
          `No evidence, after allowing for the choice among the candidates, that any beats the baseline (SPA consistent p-value ${p} > ${alpha}).`,
        );
      }
      break;
  }
  if (input.missingRows.length > 0) {
    verdicts.push('fail');
    reasons.push(
      `Candidates lacking rows the baseline has: ${input.missingRows.join(', ')} (set allow-missing to compare on the common rows).`,
    );
  }
  return { verdict: worstVerdict(verdicts), reasons };
}
