import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bartlettLongRunVariance } from '../../src/statistics/bartlettLongRunVariance.js';
import { expectClose } from '../helpers/tolerance.js';
import { loadDieboldMarianoReferences } from './referenceFixtures.js';

const entries = loadDieboldMarianoReferences().flatMap(({ file, ref }) =>
  ref.hac.filter((e) => e.estimator === 'bartlett').map((entry) => ({ file, ref, entry })),
);

describe('bartlettLongRunVariance', () => {
  it('[1, 2, 3, 4], lag 1: γ̂_0 + 2·½·γ̂_1 = 1.25 + 0.3125 (by hand)', () => {
    expect(bartlettLongRunVariance(new Float64Array([1, 2, 3, 4]), 1)).toBe(1.5625);
  });

  it('lag 0 is γ̂_0', () => {
    expect(bartlettLongRunVariance(new Float64Array([1, 2, 3, 4]), 0)).toBe(1.25);
  });

  it.each(entries)(
    '$file, lag $entry.lag: agrees with the fixture (1e-6 relative)',
    ({ file, ref, entry }) => {
      const value = bartlettLongRunVariance(Float64Array.from(ref.d), entry.lag);
      expectClose(
        value,
        entry.longRunVariance,
        { relative: 1e-6 },
        `${file}, lag ${entry.lag}: ${entry.source}`,
      );
    },
  );

  it('property: never negative (Newey & West 1987, Theorem 1)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 2, maxLength: 40 }),
        fc.nat(),
        (values, lagSeed) => {
          const x = Float64Array.from(values);
          const lag = lagSeed % x.length;
          const scale = Math.max(...values.map((v) => v * v));
          expect(bartlettLongRunVariance(x, lag)).toBeGreaterThanOrEqual(-1e-12 * scale);
        },
      ),
    );
  });
});
