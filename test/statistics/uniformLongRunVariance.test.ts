import { describe, expect, it } from 'vitest';
import { bartlettLongRunVariance } from '../../src/statistics/bartlettLongRunVariance.js';
import {
  uniformLongRunVariance,
  uniformWeightSum,
} from '../../src/statistics/uniformLongRunVariance.js';
import { expectClose } from '../helpers/tolerance.js';
import { loadDieboldMarianoReferences } from './referenceFixtures.js';

const entries = loadDieboldMarianoReferences().flatMap(({ file, ref }) =>
  ref.hac.filter((e) => e.estimator === 'uniform').map((entry) => ({ file, ref, entry })),
);

/** Strongly negatively autocorrelated: d_t = (−1)^t (2 + sin t), t = 1..40 (a formula, no RNG). */
const alternating = Float64Array.from(
  { length: 40 },
  (_, i) => (-1) ** (i + 1) * (2 + Math.sin(i + 1)),
);

describe('uniformWeightSum', () => {
  it('[1, −1, 1, −1], lag 1: γ̂_0 + 2 γ̂_1 = 1 − 1.5 (by hand)', () => {
    expect(uniformWeightSum(new Float64Array([1, -1, 1, -1]), 1)).toBe(-0.5);
  });
});

describe('uniformLongRunVariance', () => {
  it.each(entries)(
    '$file, lag $entry.lag: agrees with the fixture (1e-6 relative)',
    ({ file, ref, entry }) => {
      const result = uniformLongRunVariance(Float64Array.from(ref.d), entry.lag);
      const label = `${file}, lag ${entry.lag}: ${entry.source}`;
      expect(result.estimator, label).toBe(entry.usedEstimator);
      expect(result.lag).toBe(entry.lag);
      expectClose(result.value, entry.longRunVariance, { relative: 1e-6 }, label);
      if (entry.uniformLongRunVariance !== undefined) {
        expectClose(
          result.uniformValue,
          entry.uniformLongRunVariance,
          { relative: 1e-6 },
          `raw sum, ${label}`,
        );
      }
    },
  );

  it('the fixtures include a real series whose uniform sum is negative (co2, h = 6)', () => {
    expect(entries.some(({ entry }) => entry.usedEstimator === 'bartlett')).toBe(true);
  });

  it('falls back to Bartlett with the same lag when the uniform sum is negative', () => {
    for (const lag of [1, 3]) {
      const result = uniformLongRunVariance(alternating, lag);
      expect(result.uniformValue, `lag ${lag}`).toBeLessThan(0);
      expect(result.estimator).toBe('bartlett');
      expect(result.lag).toBe(lag);
      expect(result.value).toBe(bartlettLongRunVariance(alternating, lag));
      expect(result.note).toContain(`same lag ${lag}`);
    }
  });

  it('keeps the uniform sum when positive, with no note', () => {
    const result = uniformLongRunVariance(alternating, 2); // γ̂_1 < 0 < γ̂_2 nearly cancel, sum > 0
    expect(result.uniformValue).toBeGreaterThan(0);
    expect(result.estimator).toBe('uniform');
    expect(result.value).toBe(result.uniformValue);
    expect(result.note).toBeNull();
  });
});
