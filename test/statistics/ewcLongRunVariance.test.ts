import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  ewcDegreesOfFreedom,
  ewcLongRunVariance,
  WEIGHTS_KEPT,
} from '../../src/statistics/ewcLongRunVariance.js';
import { expectClose } from '../helpers/tolerance.js';
import { loadDieboldMarianoReferences } from './referenceFixtures.js';

/** The published formula term by term with Math.cos, for comparison with the table-driven code. */
function directFormula(x: Float64Array, nu: number): number {
  const n = x.length;
  const m = x.reduce((a, b) => a + b, 0) / n;
  let sum = 0;
  for (let j = 1; j <= nu; j++) {
    let lambda = 0;
    for (let t = 1; t <= n; t++)
      lambda += Math.cos((Math.PI * j * (t - 0.5)) / n) * (x[t - 1]! - m);
    lambda *= Math.sqrt(2 / n);
    sum += lambda * lambda;
  }
  return sum / nu;
}

describe('ewcDegreesOfFreedom: ν = max(2, round(0.4 n^{2/3})) (Lazarus et al. 2018)', () => {
  it.each([
    [3, 2], // 0.4·2.08 = 0.83
    [10, 2], // 0.4·4.64 = 1.86
    [100, 9], // 0.4·21.54 = 8.62
    [132, 10], // 0.4·25.93 = 10.37
    [1000, 40], // 0.4·100 = 40 exactly
    [100000, 862], // 0.4·2154.43 = 861.77
  ])('n = %i → ν = %i (hand arithmetic)', (n, nu) => {
    expect(ewcDegreesOfFreedom(n)).toBe(nu);
  });
});

describe('ewcLongRunVariance', () => {
  it('[1, 2, 3, 4]: ν = 2, ω̂² = 2.487436867076458 (numpy evaluation of the formula)', () => {
    // /usr/bin/python3: u = x − mean; Λ_j = √(2/n) Σ cos(π j (t − ½)/n) u_t; mean of Λ_1², Λ_2²
    const result = ewcLongRunVariance(new Float64Array([1, 2, 3, 4]));
    expect(result.degreesOfFreedom).toBe(2);
    expectClose(result.value, 2.487436867076458, { relative: 1e-12 }, 'ewc of [1, 2, 3, 4]');
  });

  it.each(loadDieboldMarianoReferences())('$file: agrees with $ref.ewc.source', ({ file, ref }) => {
    const result = ewcLongRunVariance(Float64Array.from(ref.d));
    expect(result.degreesOfFreedom).toBe(ref.ewc.degreesOfFreedom);
    expectClose(
      result.value,
      ref.ewc.longRunVariance,
      { relative: 1e-6 },
      `${file}: ${ref.ewc.source}`,
    );
  });

  it('rejects ν outside 1..n−1', () => {
    expect(() => ewcLongRunVariance(new Float64Array([1, 2]))).toThrow(RangeError); // ν = 2 > 1
    expect(() => ewcLongRunVariance(new Float64Array([1, 2, 3]), 3)).toThrow(RangeError);
  });

  it('property: the cosine table gives the direct formula, for any n and ν', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 2, maxLength: 70 }),
        fc.nat(),
        (values, nuSeed) => {
          const x = Float64Array.from(values);
          const nu = 1 + (nuSeed % (x.length - 1));
          const expected = directFormula(x, nu);
          const actual = ewcLongRunVariance(x, nu).value;
          const scale = values.reduce((a, v) => a + v * v, 0) / x.length;
          expect(Math.abs(actual - expected)).toBeLessThanOrEqual(1e-12 * scale + 1e-300);
        },
      ),
    );
  });

  it('gives the direct formula when the weights are too many to keep, and again when kept', () => {
    // n·ν above WEIGHTS_KEPT: weights computed row by row; below: kept and reused.
    const n = 2100;
    const x = Float64Array.from(
      { length: n },
      (_, t) => Math.sin(t * 0.37) + ((t * 7919) % 13) / 13,
    );
    for (const nu of [1000, 40, 40]) {
      expect(n * nu > WEIGHTS_KEPT).toBe(nu === 1000);
      const expected = directFormula(x, nu);
      expect(Math.abs(ewcLongRunVariance(x, nu).value - expected)).toBeLessThanOrEqual(
        1e-12 * expected,
      );
    }
  });
});
