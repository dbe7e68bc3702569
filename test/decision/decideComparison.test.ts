import { describe, expect, it } from 'vitest';
import { type DecisionInput, decideComparison } from '../../src/decision/decideComparison.js';
import { hypothesisFor } from '../../src/decision/hypothesis.js';

const base = (over: Partial<DecisionInput> = {}): DecisionInput => ({
  hypothesis: hypothesisFor('no-regression', 0, 'relative'),
  alpha: 0.05,
  agreement: 'both',
  dieboldMariano: { label: 'DM', pValue: 0.5, mean: 0, state: 'ok' },
  bootstrap: { label: 'bootstrap', pValue: 0.5, mean: 0, state: 'ok' },
  n: 100,
  minPoints: 30,
  shortData: 'warn',
  identicalLosses: false,
  ...over,
});
const ev = (
  pValue: number | null,
  state: 'ok' | 'too-short' | 'zero-variance' = 'ok',
  mean = 0,
) => ({
  label: 't',
  pValue,
  mean,
  state,
});

describe('decideComparison under the default policy (no-regression)', () => {
  it('fails when both tests reject, passes when neither does, warns on a split', () => {
    expect(decideComparison(base({ dieboldMariano: ev(0.01), bootstrap: ev(0.02) })).verdict).toBe(
      'fail',
    );
    expect(decideComparison(base()).verdict).toBe('pass');
    const split = decideComparison(base({ dieboldMariano: ev(0.01), bootstrap: ev(0.2) }));
    expect(split.verdict).toBe('warn');
    expect(split.reasons.join(' ')).toMatch(/disagree/);
  });
  it('rejects at p = α exactly (p ≤ α)', () => {
    expect(decideComparison(base({ dieboldMariano: ev(0.05), bootstrap: ev(0.05) })).verdict).toBe(
      'fail',
    );
  });
  it('agreement either/dm/bootstrap', () => {
    const split = { dieboldMariano: ev(0.01), bootstrap: ev(0.2) };
    expect(decideComparison(base({ ...split, agreement: 'either' })).verdict).toBe('fail');
    expect(decideComparison(base({ ...split, agreement: 'dm' })).verdict).toBe('fail');
    expect(decideComparison(base({ ...split, agreement: 'bootstrap' })).verdict).toBe('pass');
  });
  it('too little data gives warn, or fail when asked', () => {
    const short = decideComparison(base({ n: 10 }));
    expect(short.verdict).toBe('warn');
    expect(short.reasons.join(' ')).toMatch(/Too little data/);
    expect(decideComparison(base({ n: 10, shortData: 'fail' })).verdict).toBe('fail');
  });
  it('identical losses pass', () => {
    expect(decideComparison(base({ identicalLosses: true })).verdict).toBe('pass');
  });
  it('a constant positive differential is decided by its sign', () => {
    const d = decideComparison(
      base({
        dieboldMariano: ev(null, 'zero-variance', 1),
        bootstrap: ev(null, 'zero-variance', 1),
      }),
    );
    expect(d.verdict).toBe('fail');
  });
  it('uncomputable tests give warn', () => {
    const d = decideComparison(
      base({ dieboldMariano: ev(null, 'too-short'), bootstrap: ev(null, 'too-short') }),
    );
    expect(d.verdict).toBe('warn');
  });
});

describe('decideComparison under non-inferiority and superiority', () => {
  it('passes only on evidence', () => {
    for (const policy of ['non-inferiority', 'superiority'] as const) {
      const hypothesis = hypothesisFor(policy, 0.02, 'relative');
      expect(
        decideComparison(base({ hypothesis, dieboldMariano: ev(0.01), bootstrap: ev(0.01) }))
          .verdict,
      ).toBe('pass');
      expect(decideComparison(base({ hypothesis })).verdict).toBe('fail');
      expect(decideComparison(base({ hypothesis, dieboldMariano: ev(0.01) })).verdict).toBe('warn');
    }
  });
  it('identical forecasts cannot show superiority by a margin', () => {
    const hypothesis = hypothesisFor('superiority', 0.02, 'relative');
    expect(hypothesis.baselineFactor).toBeCloseTo(0.98, 15);
    expect(decideComparison(base({ hypothesis, identicalLosses: true })).verdict).toBe('pass');
  });
});

describe('hypothesisFor', () => {
  it('maps margins to the tested differential', () => {
    expect(hypothesisFor('no-regression', 0.02, 'relative')).toMatchObject({
      baselineFactor: 1.02,
      boundary: 0,
    });
    expect(hypothesisFor('no-regression', 0.5, 'absolute')).toMatchObject({
      baselineFactor: 1,
      boundary: 0.5,
    });
    expect(hypothesisFor('superiority', 0.5, 'absolute')).toMatchObject({
      baselineFactor: 1,
      boundary: -0.5,
    });
  });
});
