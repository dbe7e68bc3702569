import { describe, expect, it } from 'vitest';
import { bartlettLongRunVariance } from '../../src/statistics/bartlettLongRunVariance.js';
import { prewhitenedLongRunVariance } from '../../src/statistics/prewhitenedLongRunVariance.js';

describe('prewhitenedLongRunVariance', () => {
  it('matches the formula by hand on y = (1, 3, 2, 5, 4), lag 0', () => {
    // x = y − 3.0 = (−2, 0, −1, 2, 1); â = Σ x_t x_{t−1} / Σ x_{t−1}² = (0 + 0 − 2 + 2)/(4 + 0 + 1 + 4) = 0;
    // e = x_2..x_5 = (0, −1, 2, 1), its variance about its mean 0.5: (0.25 + 2.25 + 2.25 + 0.25)/4 = 1.25.
    const r = prewhitenedLongRunVariance(
      Float64Array.from([1, 3, 2, 5, 4]),
      { kind: 'fixed', lag: 0 },
      1,
    );
    expect(r.coefficient).toBe(0);
    expect(r.longRunVariance).toBeCloseTo(1.25, 14);
  });
  it('recolours by 1/(1 − â)² and caps â at 0.97', () => {
    const y = Float64Array.from({ length: 50 }, (_, t) => t);
    const r = prewhitenedLongRunVariance(y, { kind: 'fixed', lag: 1 }, 1);
    expect(r.coefficient).toBe(0.97);
    const x = Float64Array.from(y, (v) => v - 24.5);
    const e = Float64Array.from({ length: 49 }, (_, t) => x[t + 1]! - 0.97 * x[t]!);
    expect(r.longRunVariance).toBeCloseTo(bartlettLongRunVariance(e, 1) / 0.03 ** 2, 8);
  });
  it('refuses fewer than 3 values', () => {
    expect(() => prewhitenedLongRunVariance(new Float64Array(2), { kind: 'auto' }, 1)).toThrow(
      RangeError,
    );
  });
});
