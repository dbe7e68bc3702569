import { describe, expect, it } from 'vitest';
import { decideAdjusted } from '../../src/decision/decideAdjusted.js';
import { hypothesisFor } from '../../src/decision/hypothesis.js';

const noRegression = hypothesisFor('no-regression', 0, 'relative');
const nonInferiority = hypothesisFor('non-inferiority', 0.05, 'relative');
const input = (over: Partial<Parameters<typeof decideAdjusted>[0]> = {}) => ({
  hypothesis: noRegression,
  alpha: 0.05,
  adjustedPValue: 0.2,
  method: 'holm' as const,
  n: 100,
  minPoints: 30,
  ...over,
});

describe('decideAdjusted: one series of a family, from its adjusted p-value', () => {
  it('rejects when adjusted p ≤ α, at α exactly too', () => {
    expect(decideAdjusted(input({ adjustedPValue: 0.01 }))).toEqual({
      verdict: 'fail',
      rejected: true,
      reasons: [
        "Holm-adjusted Diebold–Mariano p = 0.0100 ≤ α = 0.05: evidence that the candidate's expected loss is higher than the baseline's.",
      ],
    });
    expect(decideAdjusted(input({ adjustedPValue: 0.05 })).rejected).toBe(true);
    expect(decideAdjusted(input({ adjustedPValue: 0.0500001 })).rejected).toBe(false);
  });

  it('keeps H0 above α: pass under no-regression, fail under non-inferiority', () => {
    const kept = decideAdjusted(input({ adjustedPValue: 0.2 }));
    expect(kept.verdict).toBe('pass');
    expect(kept.rejected).toBe(false);
    expect(kept.reasons[0]).toBe(
      "Holm-adjusted Diebold–Mariano p = 0.2000 > α = 0.05: no evidence that the candidate's expected loss is higher than the baseline's.",
    );
    expect(decideAdjusted(input({ hypothesis: nonInferiority, adjustedPValue: 0.2 })).verdict).toBe(
      'fail',
    );
    expect(
      decideAdjusted(input({ hypothesis: nonInferiority, adjustedPValue: 0.01 })).verdict,
    ).toBe('pass');
  });

  it('names the adjustment and writes tiny and huge p-values as bounds', () => {
    const bh = decideAdjusted(input({ method: 'bh', adjustedPValue: 0.00001 }));
    expect(bh.reasons[0]).toMatch(/^Benjamini–Hochberg-adjusted Diebold–Mariano p < 0\.0001 ≤ α/);
    const one = decideAdjusted(input({ adjustedPValue: 1 }));
    expect(one.reasons[0]).toMatch(/^Holm-adjusted Diebold–Mariano p > 0\.9999 > α/);
  });

  it('warns on too little data, after stating the evidence', () => {
    const short = decideAdjusted(input({ adjustedPValue: 0.01, n: 29 }));
    expect(short.verdict).toBe('warn');
    expect(short.rejected).toBe(true);
    expect(short.reasons).toHaveLength(2);
    expect(short.reasons[1]).toBe('Too little data: 29 time points, fewer than 30.');
    expect(decideAdjusted(input({ adjustedPValue: 0.01, n: 30 })).verdict).toBe('fail');
  });

  it('warns, with no rejection either way, when there is no p-value', () => {
    expect(decideAdjusted(input({ adjustedPValue: null }))).toEqual({
      verdict: 'warn',
      rejected: null,
      reasons: ['The Diebold–Mariano test could not be computed for this series.'],
    });
  });
});
