import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { autocovariances } from '../../src/statistics/autocovariance.js';
import { expectClose } from '../helpers/tolerance.js';
import { loadDieboldMarianoReferences } from './referenceFixtures.js';

describe('autocovariances', () => {
  it('divides by n: [1, 2, 3, 4] gives γ̂_0 = 5/4, γ̂_1 = 5/16, γ̂_3 = −9/16 (by hand)', () => {
    const gamma = autocovariances(new Float64Array([1, 2, 3, 4]), 3);
    // u = (−1.5, −0.5, 0.5, 1.5); γ̂_2 = (0.5·(−1.5) + 1.5·(−0.5))/4; γ̂_3 = 1.5·(−1.5)/4
    expect([...gamma]).toEqual([1.25, 0.3125, -0.375, -0.5625]);
  });

  it.each(loadDieboldMarianoReferences())(
    'γ̂_0..γ̂_5 agree with $ref.autocovariances.source ($file)',
    ({ file, ref }) => {
      const gamma = autocovariances(Float64Array.from(ref.d), 5);
      ref.autocovariances.values.forEach((expected, k) => {
        expectClose(
          gamma[k],
          expected,
          { relative: 1e-9 },
          `${file}: γ̂_${k}, ${ref.autocovariances.source}`,
        );
      });
    },
  );

  it('rejects lags outside 0..n−1', () => {
    const x = new Float64Array([1, 2, 3]);
    expect(() => autocovariances(x, 3)).toThrow(RangeError);
    expect(() => autocovariances(x, -1)).toThrow(RangeError);
    expect(() => autocovariances(x, 0.5)).toThrow(RangeError);
  });

  it('property: |γ̂_k| ≤ γ̂_0 (divide-by-n autocovariances are positive semi-definite)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 2, maxLength: 40 }),
        (values) => {
          const gamma = autocovariances(Float64Array.from(values), values.length - 1);
          const g0 = gamma[0]!;
          for (const g of gamma) expect(Math.abs(g)).toBeLessThanOrEqual(g0 * (1 + 1e-12) + 1e-300);
        },
      ),
    );
  });
});
