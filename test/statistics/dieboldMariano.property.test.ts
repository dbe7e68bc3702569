/**
 * Invariants of the Diebold–Mariano statistic (fast-check). Series are arbitrary doubles in
 * [−1000, 1000], with magnitudes below 1e−100 set to 0 (their squares would leave the normal
 * double range, where no computation keeps relative accuracy); cases that are not in state 'ok'
 * are skipped (fc.pre), and fast-check fails if too many are.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { autocovariances } from '../../src/statistics/autocovariance.js';
import { type DieboldMarianoOptions, dieboldMariano } from '../../src/statistics/dieboldMariano.js';
import type { LagRule } from '../../src/statistics/neweyWestLag.js';
import type { VarianceEstimator } from '../../src/statistics/varianceEstimator.js';

const value = fc
  .double({ min: -1000, max: 1000, noNaN: true })
  .map((v) => (Math.abs(v) < 1e-100 ? 0 : v));
const series = fc
  .array(value, { minLength: 3, maxLength: 60 })
  .map((values) => Float64Array.from(values));
const estimator = fc.constantFrom<VarianceEstimator>('ewc', 'bartlett', 'uniform');
const lagRule = fc.oneof(
  fc.constant<LagRule>({ kind: 'auto' }),
  fc.constant<LagRule>({ kind: 'horizon' }),
  fc.integer({ min: 0, max: 8 }).map<LagRule>((lag) => ({ kind: 'fixed', lag })),
);
const horizon = fc.integer({ min: 1, max: 4 });

function options(e: VarianceEstimator, lag: LagRule, h: number, margin = 0): DieboldMarianoOptions {
  return { estimator: e, lag, horizon: h, margin };
}

/** |a − b| ≤ relative·max(|a|, |b|) + absolute, with a readable failure message. */
function expectNear(a: number, b: number, relative: number, absolute: number, label: string) {
  const diff = Math.abs(a - b);
  expect(
    diff <= relative * Math.max(Math.abs(a), Math.abs(b)) + absolute,
    `${label}: ${a} vs ${b}, |diff| ${diff}`,
  ).toBe(true);
}

describe('dieboldMariano properties', () => {
  it('negating d flips the sign of the statistic (δ = 0); the one-sided p-values sum to 1', () => {
    fc.assert(
      fc.property(series, estimator, lagRule, horizon, (d, e, lag, h) => {
        const a = dieboldMariano(d, options(e, lag, h));
        const b = dieboldMariano(
          d.map((v) => -v),
          options(e, lag, h),
        );
        fc.pre(a.state === 'ok');
        expect(b.state).toBe('ok');
        expect(b.lag).toBe(a.lag);
        expectNear(b.statistic!, -a.statistic!, 1e-12, 0, `d = [${d}]`);
        expectNear(a.pValue! + b.pValue!, 1, 0, 1e-12, `p-values, d = [${d}]`);
      }),
    );
  });

  it('scaling d by c > 0 leaves the statistic unchanged', () => {
    fc.assert(
      fc.property(
        series,
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        estimator,
        lagRule,
        horizon,
        (d, c, e, lag, h) => {
          const a = dieboldMariano(d, options(e, lag, h));
          const b = dieboldMariano(
            d.map((v) => c * v),
            options(e, lag, h),
          );
          fc.pre(a.state === 'ok' && b.state === 'ok');
          // the automatic lag may move by one when the bandwidth sits within rounding of an integer
          fc.pre(a.lag === b.lag);
          expectNear(b.statistic!, a.statistic!, 1e-9, 1e-9, `c = ${c}, d = [${d}]`);
        },
      ),
    );
  });

  it('statistic(d, δ) equals statistic(d − δ, 0)', () => {
    fc.assert(
      fc.property(
        series,
        fc.double({ min: -100, max: 100, noNaN: true }),
        estimator,
        lagRule,
        horizon,
        (d, margin, e, lag, h) => {
          const a = dieboldMariano(d, options(e, lag, h, margin));
          const b = dieboldMariano(
            d.map((v) => v - margin),
            options(e, lag, h, 0),
          );
          fc.pre(a.state === 'ok' && b.state === 'ok');
          fc.pre(a.lag === b.lag); // as above: a bandwidth at an integer may round either way
          // Forming d_t − δ rounds each value by up to ε·scale, scale = max|d| + |δ|. That moves
          // the mean by ~ε·scale (absolute error ε·scale/se in the statistic) and the centred
          // series by a relative ε·scale/sd (sd = √γ̂_0), which n-term sums can amplify n-fold.
          // Skip series whose spread is at rounding level of δ: their information is lost in d − δ.
          const scale = Math.max(...d.map(Math.abs)) + Math.abs(margin);
          const sd = Math.sqrt(autocovariances(d, 0)[0]!);
          fc.pre(sd > 1e-6 * scale);
          const eps = Number.EPSILON;
          const relative = 100 * d.length * eps * (scale / sd);
          const absolute = (100 * eps * scale) / Math.sqrt(a.variance!);
          expectNear(b.statistic!, a.statistic!, relative, absolute, `δ = ${margin}, d = [${d}]`);
        },
      ),
    );
  });

  it('every result is JSON-safe (no NaN or Infinity), degenerate inputs included', () => {
    const anySeries = fc.oneof(
      series,
      fc.array(value, { maxLength: 4 }).map((values) => Float64Array.from(values)),
      fc
        .tuple(fc.double({ min: -10, max: 10, noNaN: true }), fc.integer({ min: 0, max: 20 }))
        .map(([v, n]) => new Float64Array(n).fill(v)),
    );
    fc.assert(
      fc.property(
        anySeries,
        estimator,
        lagRule,
        horizon,
        fc.double({ min: -10, max: 10, noNaN: true }),
        (d, e, lag, h, margin) => {
          const result = dieboldMariano(d, options(e, lag, h, margin));
          expect(JSON.parse(JSON.stringify(result))).toEqual(result);
          if (result.state === 'ok') {
            expect(result.pValue!).toBeGreaterThanOrEqual(0);
            expect(result.pValue!).toBeLessThanOrEqual(1);
            expect(result.longRunVariance!).toBeGreaterThan(0);
          }
        },
      ),
    );
  });

  it('the uniform → Bartlett fallback never changes the lag', () => {
    fc.assert(
      fc.property(series, lagRule, horizon, (d, lag, h) => {
        const uniform = dieboldMariano(d, options('uniform', lag, h));
        const bartlett = dieboldMariano(d, options('bartlett', lag, h));
        expect(uniform.lag).toBe(bartlett.lag);
        if (uniform.estimator === 'bartlett') {
          expect(uniform.longRunVariance).toBe(bartlett.longRunVariance);
          expect(uniform.notes.join(' ')).toContain(`same lag ${uniform.lag}`);
        }
      }),
    );
  });
});
