import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { longRunCovariance } from '../../src/intervals/longRunCovariance.js';
import { ewcLongRunCovariance } from '../../src/statistics/ewcLongRunCovariance.js';
import {
  ewcCosineTransforms,
  ewcLongRunVariance,
  WEIGHTS_KEPT,
} from '../../src/statistics/ewcLongRunVariance.js';

/** Ω of (x, y) by polarisation from three ewc variances, the construction it replaces. */
function byPolarisation(x: Float64Array, y: Float64Array, nu: number) {
  const sum = x.map((v, t) => v + y[t]!);
  return longRunCovariance(x, y, sum, (s) => ewcLongRunVariance(s, nu).value);
}

/** Values in ±1e3, none so small that products of two underflow (relative checks hold there). */
const value = fc
  .double({ min: -1e3, max: 1e3, noNaN: true })
  .filter((v) => v === 0 || Math.abs(v) > 1e-100);

const pairs = fc
  .array(fc.tuple(value, value), { minLength: 2, maxLength: 70 })
  .chain((rows) =>
    fc.record({ rows: fc.constant(rows), nu: fc.integer({ min: 1, max: rows.length - 1 }) }),
  );

describe('ewcLongRunCovariance (Lazarus et al. 2018)', () => {
  it('property: equals the polarisation of three ewc variances to 1e-12 of the data size', () => {
    fc.assert(
      fc.property(pairs, ({ rows, nu }) => {
        const x = Float64Array.from(rows, (r) => r[0]);
        const y = Float64Array.from(rows, (r) => r[1]);
        const direct = ewcLongRunCovariance(x, y, nu);
        const polar = byPolarisation(x, y, nu);
        // Ω_xx and Ω_yy are the variances themselves, to the bit.
        expect(direct.dd).toBe(ewcLongRunVariance(x, nu).value);
        expect(direct.bb).toBe(ewcLongRunVariance(y, nu).value);
        // Ω_xy: polarisation forms x + y and takes a difference of variances, so it is exact only
        // to rounding of the data's size (a Λ_j may cancel far below it): 1e-12 of Σ(x² + y²)/n.
        const scale = x.reduce((a, v, t) => a + v * v + y[t]! * y[t]!, 0) / x.length;
        expect(Math.abs(direct.db - polar.db)).toBeLessThanOrEqual(1e-12 * scale + 1e-300);
        // Cauchy–Schwarz: a Gram matrix.
        expect(Math.abs(direct.db)).toBeLessThanOrEqual(
          Math.sqrt(direct.dd) * Math.sqrt(direct.bb) * (1 + 1e-12) + 1e-300,
        );
      }),
    );
  });

  it('y = x gives Ω_xy = Ω_xx, y = −x gives −Ω_xx, a constant y gives 0 (hand identities)', () => {
    const x = Float64Array.from({ length: 50 }, (_, t) => Math.sin(t * 0.7) + t / 50);
    const nu = 9;
    const same = ewcLongRunCovariance(x, x, nu);
    expect(same.db).toBe(same.dd);
    expect(same.bb).toBe(same.dd);
    const opposite = ewcLongRunCovariance(
      x,
      x.map((v) => -v),
      nu,
    );
    expect(opposite.db).toBe(-opposite.dd);
    const constant = ewcLongRunCovariance(x, new Float64Array(50).fill(3.25), nu);
    expect(constant.db).toBe(0);
    expect(constant.bb).toBe(0);
  });

  it('the same to the bit with weights too many to keep, and kept (ν not a multiple of 4)', () => {
    const n = 2100;
    const x = Float64Array.from(
      { length: n },
      (_, t) => Math.sin(t * 0.37) + ((t * 7919) % 13) / 13,
    );
    const y = Float64Array.from({ length: n }, (_, t) => Math.cos(t * 0.11) * ((t * 31) % 7));
    for (const nu of [1001, 41, 41]) {
      expect(n * nu > WEIGHTS_KEPT).toBe(nu === 1001);
      const direct = ewcLongRunCovariance(x, y, nu);
      expect(direct.dd).toBe(ewcLongRunVariance(x, nu).value);
      expect(direct.bb).toBe(ewcLongRunVariance(y, nu).value);
      const polar = byPolarisation(x, y, nu);
      expect(Math.abs(direct.db - polar.db)).toBeLessThanOrEqual(1e-12 * (direct.dd + direct.bb));
    }
  });

  it('rejects series of different lengths and ν outside 1..n−1', () => {
    const x = new Float64Array([1, 2, 3]);
    expect(() => ewcLongRunCovariance(x, new Float64Array([1, 2]), 1)).toThrow(RangeError);
    expect(() => ewcLongRunCovariance(x, x, 3)).toThrow(RangeError);
    expect(() => ewcLongRunCovariance(x, x, 0)).toThrow(RangeError);
  });
});

describe('ewcCosineTransforms', () => {
  it('property: the transforms of u are the same to the bit with or without a second series', () => {
    fc.assert(
      fc.property(pairs, ({ rows, nu }) => {
        const u = Float64Array.from(rows, (r) => r[0]);
        const v = Float64Array.from(rows, (r) => r[1]);
        const alone = ewcCosineTransforms(u, null, nu);
        const both = ewcCosineTransforms(u, v, nu);
        expect(alone.second).toBeNull();
        expect(both.first).toEqual(alone.first);
        expect(both.second).toEqual(ewcCosineTransforms(v, null, nu).first);
      }),
    );
  });
});
