import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createRandomSource } from '../../src/random/randomSource.js';
import { fluctuationCriticalValue } from '../../src/stability/fluctuationCriticalValues.js';
import { fluctuationTest } from '../../src/stability/fluctuationTest.js';
import { rollingStatistic } from '../../src/stability/rollingStatistic.js';

describe('rollingStatistic', () => {
  it('matches hand sums: d = 1..5, m = 2, σ² = 2 → (3, 5, 7, 9)/2', () => {
    expect(Array.from(rollingStatistic(Float64Array.from([1, 2, 3, 4, 5]), 2, 2))).toEqual([
      1.5, 2.5, 3.5, 4.5,
    ]);
  });
  it('equals direct window sums on long series (running sums re-based every 1024 windows)', () => {
    const d = Float64Array.from({ length: 3000 }, (_, t) => Math.sin(t) * 1e3 + 1e-3 * t);
    const f = rollingStatistic(d, 500, 4);
    for (const k of [0, 1023, 1024, 1500, 2500]) {
      let s = 0;
      for (let j = k; j < k + 500; j++) s += d[j]!;
      expect(f[k]!).toBeCloseTo(s / Math.sqrt(500 * 4), 9);
    }
  });
  it('refuses a window outside 1..n and a zero variance', () => {
    expect(() => rollingStatistic(new Float64Array(3), 4, 1)).toThrow(RangeError);
    expect(() => rollingStatistic(new Float64Array(3), 2, 0)).toThrow(RangeError);
  });
});

describe('fluctuationCriticalValue', () => {
  it('returns Table I of Giacomini & Rossi (2010) at the tabulated μ', () => {
    // Two-sided 5% values as quoted from the paper in the project's issue.
    expect(fluctuationCriticalValue(0.1, 0.05, 'two')).toBe(3.393);
    expect(fluctuationCriticalValue(0.2, 0.05, 'two')).toBe(3.179);
    expect(fluctuationCriticalValue(0.3, 0.05, 'two')).toBe(3.012);
    expect(fluctuationCriticalValue(0.4, 0.05, 'two')).toBe(2.89);
    // One-sided 5%, μ = 0.2 (from memory; reproduced in docs/fluctuation-table.md).
    expect(fluctuationCriticalValue(0.2, 0.05, 'one')).toBe(2.938);
  });
  it('interpolates linearly in μ and in log α, and refuses outside the table', () => {
    expect(fluctuationCriticalValue(0.25, 0.05, 'two')!).toBeCloseTo((3.179 + 3.012) / 2, 12);
    const mid = fluctuationCriticalValue(0.2, Math.sqrt(0.05 * 0.1), 'one')!;
    expect(mid).toBeCloseTo((2.938 + 2.676) / 2, 12);
    expect(fluctuationCriticalValue(0.05, 0.05, 'one')).toBeNull();
    expect(fluctuationCriticalValue(0.2, 0.2, 'one')).toBeNull();
  });
  it('falls as μ grows and rises as α falls; two-sided above one-sided (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 0.89, noNaN: true }),
        fc.double({ min: 0.01, max: 0.099, noNaN: true }),
        (mu, alpha) => {
          const v = fluctuationCriticalValue(mu, alpha, 'one')!;
          expect(fluctuationCriticalValue(mu + 0.01, alpha, 'one')!).toBeLessThanOrEqual(v + 1e-12);
          expect(fluctuationCriticalValue(mu, alpha + 0.001, 'one')!).toBeLessThan(v);
          expect(fluctuationCriticalValue(mu, alpha, 'two')!).toBeGreaterThan(v);
        },
      ),
    );
  });
});

describe('fluctuationTest', () => {
  const options = {
    mu: 0.2,
    alpha: 0.05,
    sides: 'one',
    lag: { kind: 'auto' },
    horizon: 1,
  } as const;
  // Independent uniform noise on [−0.5, 0.5] (variance 1/12) from the project's seeded source.
  const noise = (n: number) => {
    const random = createRandomSource(7, 0);
    return Float64Array.from({ length: n }, () => random.nextDouble() - 0.5);
  };

  it('finds a late stretch where the candidate is worse, and where it peaks', () => {
    const d = noise(200);
    // Windows of 40 points, noise variance 1/12: a shift of 0.4 over the last 30 points adds
    // about 30·0.4/√(40·σ̂²) ≈ 3.6 to the last window's statistic (σ̂² ≈ 0.17 once the shift
    // itself inflates the prewhitened estimate), against 2.938.
    for (let t = 170; t < 200; t++) d[t]! += 0.4;
    const r = fluctuationTest(d, options)!;
    expect(r.windowSize).toBe(40);
    expect(r.rejected).toBe(true);
    expect(r.peakWindow + r.windowSize).toBeGreaterThan(180);
    expect(r.worseRuns.at(-1)![1]).toBe(199);
  });

  it('is unchanged by rescaling d (property: F is scale-free)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e3, noNaN: true }), (scale) => {
        const d = noise(120);
        const a = fluctuationTest(d, options)!;
        const b = fluctuationTest(
          d.map((x) => x * scale),
          options,
        )!;
        expect(b.statistic).toBeCloseTo(a.statistic, 8);
        expect(b.peakWindow).toBe(a.peakWindow);
      }),
    );
  });

  it('rejects pure noise at about its level (200 seeded streams; ≤ 10%, 3.2 MC standard errors above 5%)', () => {
    let rejections = 0;
    for (let stream = 0; stream < 200; stream++) {
      const random = createRandomSource(7, stream);
      const d = Float64Array.from({ length: 200 }, () => random.nextDouble() - 0.5);
      if (fluctuationTest(d, options)!.rejected) rejections++;
    }
    expect(rejections / 200).toBeLessThanOrEqual(0.1);
  });

  it('is not run on fewer than 20 points or a constant differential', () => {
    expect(fluctuationTest(noise(19), options)).toBeNull();
    expect(fluctuationTest(new Float64Array(50).fill(1), options)).toBeNull();
  });
});
