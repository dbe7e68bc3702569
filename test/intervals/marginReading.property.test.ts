import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { LossSeries } from '../../src/aggregation/lossSeries.js';
import { compareLossSeries } from '../../src/comparison/compareLossSeries.js';
import { hypothesisFor } from '../../src/decision/hypothesis.js';
import { AGREEMENTS, POLICIES, type Policy } from '../../src/decision/policy.js';
import type { Verdict } from '../../src/decision/verdict.js';
import { resolveSettings } from '../../src/settings/resolveSettings.js';

// The interval of the relative change is the set of margins at which the gate does not reject
// (docs/decisions/0011-intervals-from-the-tests.md). Property: on random loss series, for every
// policy, agreement and variance estimator, the verdict the gate reaches at a relative margin just
// below and just above each end of the interval is the one read off the interval. Invented
// numbers: this checks an invariant, not values.

const scope = { loss: 'squared' as const, horizon: 'all' as const, series: 'all', timestamps: [] };

/** Losses of two models on a shared AR(1) signal, from a seeded xorshift (reproducible). */
function lossSeries(seed: number, n: number, worse: number, phi: number): LossSeries {
  let state = seed >>> 0 || 1;
  const uniform = () => {
    state ^= state << 13;
    state ^= state >>> 17;
    state ^= state << 5;
    return (state >>> 0) / 4294967296;
  };
  const normal = () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  let e = 0;
  for (let t = 0; t < n; t++) {
    e = phi * e + normal();
    const eb = e + 0.7 * normal();
    const ec = e * (1 + worse) + 0.7 * normal();
    baseline[t] = eb * eb;
    candidate[t] = ec * ec;
  }
  const time = Int32Array.from({ length: n }, (_, t) => t);
  return { time, baseline, candidate, rows: new Int32Array(n).fill(1), rowCount: n, maxHorizon: 1 };
}

function verdictAt(
  series: LossSeries,
  policy: Policy,
  r: number,
  extra: Record<string, string>,
): Verdict {
  const settings = resolveSettings(
    {
      baseline: 'b.csv',
      candidate: 'c.csv',
      resamples: '199',
      'min-points': '1',
      policy,
      ...extra,
    },
    (name) => `--${name}`,
  );
  // Superiority at margin m tests E[L_c] ≥ (1 − m) E[L_b]: the relative margin r is −m.
  const margin = policy === 'superiority' ? -r : r;
  const hypothesis = hypothesisFor(policy, margin, 'relative');
  return compareLossSeries(series, scope, hypothesis, settings).verdict;
}

describe('the relative-change interval shows the decision at any margin', () => {
  it('verdict at r just below / above each end equals the reading off the interval', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 2 ** 31 - 1 }),
        fc.integer({ min: 30, max: 120 }),
        fc.double({ min: -0.3, max: 0.4, noNaN: true }),
        fc.constantFrom(0, 0.4),
        fc.constantFrom(...POLICIES),
        fc.constantFrom(...AGREEMENTS),
        fc.constantFrom('ewc', 'bartlett', 'uniform'),
        (seed, n, worse, phi, policy, agreement, variance) => {
          const series = lossSeries(seed, n, worse, phi);
          const extra = { agreement, variance };
          const settings = resolveSettings(
            { baseline: 'b.csv', candidate: 'c.csv', resamples: '199', ...extra },
            (name) => `--${name}`,
          );
          const base = compareLossSeries(
            series,
            scope,
            hypothesisFor(policy, 0, 'relative'),
            settings,
          );
          const rc = base.relativeChange;
          expect(rc).not.toBeNull();
          fc.pre(rc!.pieces === undefined && rc!.lower !== null && rc!.upper !== null);
          const lower = rc!.lower!;
          const upper = rc!.upper!;
          const eps = 1e-7 * Math.max(upper - lower, 1e-6);
          // The reading: no-regression fails exactly when r < lower; the other two policies
          // pass exactly when r > upper (r = −margin for superiority).
          const expected = (r: number): 'fail' | 'pass' | 'not fail' | 'not pass' =>
            policy === 'no-regression'
              ? r < lower
                ? 'fail'
                : 'not fail'
              : r > upper
                ? 'pass'
                : 'not pass';
          for (const end of [lower, upper]) {
            for (const r of [end - eps, end + eps]) {
              const verdict = verdictAt(series, policy, r, extra);
              const want = expected(r);
              const got =
                want === 'fail' || want === 'not fail'
                  ? verdict === 'fail'
                    ? 'fail'
                    : 'not fail'
                  : verdict === 'pass'
                    ? 'pass'
                    : 'not pass';
              expect({ policy, agreement, variance, end, r, got }).toEqual({
                policy,
                agreement,
                variance,
                end,
                r,
                got: want,
              });
            }
          }
        },
      ),
      {
        numRuns: 120,
        seed: 15,
        // Found by this property: uniform weights at the automatic lag n − 1 are zero within
        // rounding at every margin, so the gate uses Bartlett throughout.
        examples: [[1417826281, 40, 0, 0, 'no-regression', 'either', 'uniform']],
      },
    );
  });
});
