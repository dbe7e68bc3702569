import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  basicBootstrapInference,
  minimumResamples,
  tailOrderStatistic,
  tailProbability,
} from '../../../src/statistics/bootstrap/basicBootstrapInference.js';

/** The adjacent doubles below and above x. */
function neighbours(x: number): [number, number] {
  const buffer = new Float64Array(1);
  const bits = new BigInt64Array(buffer.buffer);
  const step = (direction: 1 | -1): number => {
    if (x === 0) return direction * Number.MIN_VALUE;
    buffer[0] = x;
    bits[0] = bits[0]! + BigInt(x > 0 ? direction : -direction);
    return buffer[0]!;
  };
  return [step(-1), step(1)];
}

describe('basicBootstrapInference', () => {
  it('matches the worked example in its doc comment (B = 19, level 0.9)', () => {
    const u = Float64Array.from({ length: 19 }, (_, i) => i + 1);
    const result = basicBootstrapInference(u, 1.5, 0.9);
    expect(result.interval).toEqual({ level: 0.9, lower: 1, upper: 19 });
    expect(result.oneSidedLower).toEqual({ level: 0.9, alpha: 0.1, lower: 2 });
    expect(result.pValue).toBe(0.1);
    expect(result.pValueTwoSided).toBe(0.2);
  });

  it('uses the (B + 1)-order-statistic rule (Davison & Hinkley 1997, ch. 5)', () => {
    expect(tailOrderStatistic(0.05, 9999)).toBe(500);
    expect(tailOrderStatistic(0.025, 9999)).toBe(250);
    expect(tailOrderStatistic(0.025, 999)).toBe(25);
    expect(tailOrderStatistic(0.05, 100)).toBe(5); // 5/101 ≤ 0.05 < 6/101
    expect(tailOrderStatistic(0.01, 50)).toBe(0);
    expect(tailProbability(0.9)).toBe(0.1); // not 0.09999999999999998
    expect(tailProbability(0.95)).toBe(0.05);
    expect(minimumResamples(0.95)).toBe(39); // 1/40 ≤ 0.025
    expect(minimumResamples(0.9)).toBe(19);
    expect(() => basicBootstrapInference(new Float64Array(38), 0, 0.95)).toThrow(RangeError);
  });

  it('rejects one-sided exactly when the margin is below the one-sided bound, and two-sided exactly outside the interval', () => {
    const resampled = fc
      .array(fc.integer({ min: -20, max: 20 }), { minLength: 19, maxLength: 400 })
      .map((xs) => Float64Array.from(xs, (x) => x / 7).sort());
    fc.assert(
      fc.property(resampled, fc.constantFrom(0.8, 0.9, 0.95), fc.nat(), (u, level, pick) => {
        fc.pre(tailOrderStatistic(tailProbability(level) / 2, u.length) >= 1);
        const bounds = basicBootstrapInference(u, 0, level);
        const anchor = [
          bounds.oneSidedLower.lower,
          bounds.interval.lower,
          bounds.interval.upper,
          u[pick % u.length]!,
        ][pick % 4]!;
        for (const margin of [anchor, ...neighbours(anchor)]) {
          const r = basicBootstrapInference(u, margin, level);
          const alpha = r.oneSidedLower.alpha;
          const oneSided = r.pValue <= alpha;
          const twoSided = r.pValueTwoSided <= alpha;
          const outside = margin < r.interval.lower || margin > r.interval.upper;
          if (oneSided !== margin < r.oneSidedLower.lower || twoSided !== outside) {
            throw new Error(
              `level ${level}, margin ${margin}: p ${r.pValue}, bound ${r.oneSidedLower.lower}, pTwo ${r.pValueTwoSided}, interval ${JSON.stringify(r.interval)}`,
            );
          }
        }
      }),
    );
  });

  it('gives p-values in [1/(B+1), 1] that do not decrease as the margin grows', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 39, maxLength: 200 }),
        fc.double({ min: -6, max: 6, noNaN: true }),
        fc.double({ min: 0, max: 3, noNaN: true }),
        (values, margin, step) => {
          const u = Float64Array.from(values).sort();
          const low = basicBootstrapInference(u, margin, 0.95);
          const high = basicBootstrapInference(u, margin + step, 0.95);
          const floor = 1 / (u.length + 1);
          return (
            low.pValue >= floor &&
            low.pValue <= 1 &&
            high.pValue >= low.pValue &&
            low.pValueTwoSided >= 2 * floor &&
            low.pValueTwoSided <= 1
          );
        },
      ),
    );
  });
});
