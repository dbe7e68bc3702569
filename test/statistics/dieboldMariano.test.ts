import { describe, expect, it } from 'vitest';
import { bartlettLongRunVariance } from '../../src/statistics/bartlettLongRunVariance.js';
import {
  type DieboldMarianoOptions,
  dieboldMariano,
  MINIMUM_LENGTH,
} from '../../src/statistics/dieboldMariano.js';
import { expectClose } from '../helpers/tolerance.js';

const bartlett0: DieboldMarianoOptions = {
  estimator: 'bartlett',
  lag: { kind: 'fixed', lag: 0 },
  horizon: 1,
  margin: 0,
};

/** Strongly negatively autocorrelated: d_t = (−1)^t (2 + sin t) + 0.3, t = 1..40 (a formula). */
const alternating = Float64Array.from(
  { length: 40 },
  (_, i) => (-1) ** (i + 1) * (2 + Math.sin(i + 1)) + 0.3,
);

function expectJsonSafe(value: unknown): void {
  expect(JSON.parse(JSON.stringify(value))).toEqual(value);
}

describe('dieboldMariano: a worked example', () => {
  it('[1, 2, 0, 3, 1], Bartlett lag 0: DM = 1.4/√(1.04/5) (by hand), p from R pnorm', () => {
    const result = dieboldMariano(new Float64Array([1, 2, 0, 3, 1]), bartlett0);
    expect(result.state).toBe('ok');
    expect(result.mean).toBe(1.4);
    expectClose(result.longRunVariance, 1.04, { relative: 1e-14 }, 'γ̂_0 = 5.2/5');
    expectClose(result.statistic, 1.4 / Math.sqrt(1.04 / 5), { relative: 1e-14 }, 'statistic');
    // R: pnorm(1.4 / sqrt(1.04 / 5), lower.tail = FALSE) = 0.001071358
    expectClose(result.pValue, 0.001071358, { relative: 1e-6 }, 'one-sided p');
    expectClose(result.pValueTwoSided, 2 * 0.001071358, { relative: 1e-6 }, 'two-sided p');
    expectJsonSafe(result);
  });

  it('the margin shifts the mean: δ = 1.4 gives statistic 0 and p = ½', () => {
    const result = dieboldMariano(new Float64Array([1, 2, 0, 3, 1]), { ...bartlett0, margin: 1.4 });
    expect(result.statistic).toBe(0);
    expect(result.pValue).toBe(0.5);
    expect(result.pValueTwoSided).toBe(1);
  });
});

describe('dieboldMariano: degenerate cases are states', () => {
  it.each(['ewc', 'bartlett', 'uniform'] as const)('identical forecasts (%s)', (estimator) => {
    const result = dieboldMariano(new Float64Array(10), { ...bartlett0, estimator });
    expect(result.state).toBe('identical');
    expect(result.statistic).toBeNull();
    expect(result.pValue).toBeNull();
    expect(result.mean).toBe(0);
    expect(result.notes.join(' ')).toContain('Every loss differential is 0');
    expectJsonSafe(result);
  });

  it('negative zeros count as identical', () => {
    expect(dieboldMariano(new Float64Array([-0, 0, -0]), bartlett0).state).toBe('identical');
  });

  it.each(['ewc', 'bartlett', 'uniform'] as const)(
    'a constant non-zero differential (%s)',
    (estimator) => {
      const result = dieboldMariano(new Float64Array(12).fill(0.1), {
        estimator,
        lag: { kind: 'auto' },
        horizon: 2,
        margin: 0,
      });
      expect(result.state).toBe('zero-variance');
      expect(result.mean).toBe(0.1);
      expect(result.statistic).toBeNull();
      expect(result.notes.join(' ')).toContain('does not vary');
      expectJsonSafe(result);
    },
  );

  it('a long-run variance that is zero within rounding', () => {
    // d_t = cos(3π(t − ½)/6), t = 1..6: the third cosine, orthogonal to the constant and to the
    // cosines j = 1, 2 that ewc uses at n = 6 (ν = 2), so ω̂² is 0 up to rounding.
    const d = Float64Array.from({ length: 6 }, (_, i) => Math.cos((3 * Math.PI * (i + 0.5)) / 6));
    const result = dieboldMariano(d, { ...bartlett0, estimator: 'ewc' });
    expect(result.state).toBe('zero-variance');
    expect(result.statistic).toBeNull();
    expect(result.longRunVariance).not.toBeNull();
    expect(Math.abs(result.longRunVariance!)).toBeLessThan(1e-20);
    expect(result.notes.join(' ')).toContain('zero within rounding');
    expectJsonSafe(result);
  });

  it(`too short: fewer than ${MINIMUM_LENGTH} values`, () => {
    for (const n of [0, 1, 2]) {
      const result = dieboldMariano(new Float64Array(n).fill(1 + n), bartlett0);
      expect(result.state, `n = ${n}`).toBe('too-short');
      expect(result.n).toBe(n);
      expect(result.statistic).toBeNull();
      expect(result.notes.join(' ')).toContain(`needs at least ${MINIMUM_LENGTH}`);
      expectJsonSafe(result);
    }
    expect(dieboldMariano(new Float64Array([1, 2, 4]), bartlett0).state).toBe('ok');
    expect(
      dieboldMariano(new Float64Array([1, 2, 4]), { ...bartlett0, estimator: 'ewc' }).state,
    ).toBe('ok');
  });

  it('invalid arguments throw RangeError', () => {
    const d = new Float64Array([1, 2, 4]);
    expect(() => dieboldMariano(d, { ...bartlett0, horizon: 0 })).toThrow(RangeError);
    expect(() => dieboldMariano(d, { ...bartlett0, margin: Number.NaN })).toThrow(RangeError);
    expect(() => dieboldMariano(d, { ...bartlett0, lag: { kind: 'fixed', lag: -2 } })).toThrow(
      RangeError,
    );
    expect(() =>
      dieboldMariano(new Float64Array([1, Number.POSITIVE_INFINITY, 2]), bartlett0),
    ).toThrow(RangeError);
  });
});

describe('dieboldMariano: uniform → Bartlett fallback', () => {
  it('falls back with the same lag, says so, and reports the estimator used', () => {
    const result = dieboldMariano(alternating, {
      estimator: 'uniform',
      lag: { kind: 'horizon' },
      horizon: 2,
      margin: 0,
    });
    expect(result.state).toBe('ok');
    expect(result.requestedEstimator).toBe('uniform');
    expect(result.estimator).toBe('bartlett');
    expect(result.lag).toBe(1);
    expect(result.lagSelection).toEqual({ rule: 'horizon' });
    expect(result.longRunVariance).toBe(bartlettLongRunVariance(alternating, 1));
    expect(result.notes.join(' ')).toMatch(
      /uniform-weight long-run variance at lag 1 is not positive/,
    );
    expect(result.notes.join(' ')).toContain('same lag 1');
    expect(result.smallSample).not.toBeNull();
    const direct = dieboldMariano(alternating, {
      estimator: 'bartlett',
      lag: { kind: 'fixed', lag: 1 },
      horizon: 2,
      margin: 0,
    });
    expect(result.statistic).toBe(direct.statistic);
  });
});

describe('dieboldMariano: reporting', () => {
  const d = Float64Array.from({ length: 80 }, (_, t) => Math.sin((t * t) / 7) + 0.2);

  it('auto lag reports the pilot lag, s0, s1 and bandwidth', () => {
    const result = dieboldMariano(d, {
      estimator: 'bartlett',
      lag: { kind: 'auto' },
      horizon: 1,
      margin: 0,
    });
    const selection = result.lagSelection!;
    expect(selection.rule).toBe('auto');
    expect(selection.pilotLag).toBe(3); // ⌊4 (0.8)^{2/9}⌋ = ⌊3.81⌋
    expect(result.lag).toBe(Math.floor(selection.bandwidth!));
    expect(Number.isFinite(selection.s0)).toBe(true);
    expect(Number.isFinite(selection.s1)).toBe(true);
  });

  it('ewc reports ν and no lag or small-sample result', () => {
    const result = dieboldMariano(d, {
      estimator: 'ewc',
      lag: { kind: 'auto' },
      horizon: 3,
      margin: 0,
    });
    expect(result.degreesOfFreedom).toBe(7); // round(0.4 · 80^{2/3}) = round(7.43)
    expect(result.lag).toBeNull();
    expect(result.lagSelection).toBeNull();
    expect(result.smallSample).toBeNull();
  });

  it('h ≥ n: no small-sample result, with a note; lag capped at n − 1', () => {
    const result = dieboldMariano(new Float64Array([3, 1, 4, 1, 5]), {
      estimator: 'bartlett',
      lag: { kind: 'horizon' },
      horizon: 6,
      margin: 0,
    });
    expect(result.state).toBe('ok');
    expect(result.lag).toBe(4);
    expect(result.smallSample).toBeNull();
    expect(result.notes.join(' ')).toContain('exceeds n − 1 = 4');
    expect(result.notes.join(' ')).toContain('small-sample correction needs the horizon');
  });
});
