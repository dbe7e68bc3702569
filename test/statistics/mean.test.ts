import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { mean } from '../../src/statistics/mean.js';
import { expectClose } from '../helpers/tolerance.js';
import { loadDieboldMarianoReferences } from './referenceFixtures.js';

describe('mean', () => {
  it('small exact cases (exact arithmetic by hand)', () => {
    expect(mean(new Float64Array([1, 2, 4]))).toBe(7 / 3);
    expect(mean(new Float64Array([-3]))).toBe(-3);
    expect(mean(new Float64Array([0.5, 0.25, 0.25, 1]))).toBe(0.5);
  });

  it('refines the plain sum: 0.1 × 10 averages to 0.1 exactly (naive sum/10 gives 0.09999999999999999)', () => {
    expect(mean(new Float64Array(10).fill(0.1))).toBe(0.1);
  });

  it.each(loadDieboldMarianoReferences())(
    'agrees with the fixture mean, $file',
    ({ file, ref }) => {
      // R: mean(d); numpy: np.mean(d). Tolerance 1e-12 relative.
      expectClose(
        mean(Float64Array.from(ref.d)),
        ref.mean,
        { relative: 1e-12 },
        `${file}: mean(d) (${ref.dataset})`,
      );
    },
  );

  it('rejects an empty series', () => {
    expect(() => mean(new Float64Array(0))).toThrow(RangeError);
  });

  it('property: lies between the minimum and the maximum', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 50 }),
        (values) => {
          const m = mean(Float64Array.from(values));
          expect(m).toBeGreaterThanOrEqual(Math.min(...values));
          expect(m).toBeLessThanOrEqual(Math.max(...values));
        },
      ),
    );
  });
});
