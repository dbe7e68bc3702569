import { describe, expect, it } from 'vitest';
import { decideCandidates } from '../../src/candidates/decideCandidates.js';

const base = {
  alpha: 0.05,
  setAlpha: 0.1,
  preferred: { name: 'gbm', verdict: 'pass' as const, inConfidenceSet: true, mcsPValue: 0.4 },
  spaPValue: 0.5,
  missingRows: [] as string[],
};

describe('selection rules for several candidates', () => {
  it('preferred-in-set: pass in the set, fail out of it, keep its own warning or failure', () => {
    expect(decideCandidates({ ...base, rule: 'preferred-in-set' }).verdict).toBe('pass');
    const out = { ...base.preferred, inConfidenceSet: false, mcsPValue: 0.03 };
    const r = decideCandidates({ ...base, rule: 'preferred-in-set', preferred: out });
    expect(r.verdict).toBe('fail');
    expect(r.reasons[0]).toContain('not in the 90% model confidence set');
    for (const verdict of ['warn', 'fail'] as const) {
      const own = { ...base.preferred, verdict };
      expect(decideCandidates({ ...base, rule: 'preferred-in-set', preferred: own }).verdict).toBe(
        verdict,
      );
    }
  });

  it('none-worse fails exactly when the SPA p-value is at most alpha', () => {
    expect(decideCandidates({ ...base, rule: 'none-worse', spaPValue: 0.05 }).verdict).toBe('fail');
    expect(decideCandidates({ ...base, rule: 'none-worse', spaPValue: 0.0501 }).verdict).toBe(
      'pass',
    );
  });

  it('some-better passes exactly when the SPA p-value is at most alpha', () => {
    expect(decideCandidates({ ...base, rule: 'some-better', spaPValue: 0.05 }).verdict).toBe(
      'pass',
    );
    expect(decideCandidates({ ...base, rule: 'some-better', spaPValue: 0.2 }).verdict).toBe('fail');
  });

  it('a candidate lacking baseline rows fails the gate under every rule', () => {
    for (const rule of ['preferred-in-set', 'none-worse', 'some-better'] as const) {
      const r = decideCandidates({ ...base, rule, spaPValue: 0.01, missingRows: ['ets'] });
      expect(r.verdict).toBe('fail');
      expect(r.reasons.at(-1)).toContain('ets');
    }
  });
});
