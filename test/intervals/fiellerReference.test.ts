import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { dieboldMarianoMarginSet } from '../../src/intervals/dieboldMarianoMarginSet.js';
import { FIXTURES } from '../statistics/referenceFixtures.js';

// Reference: test/reference/scripts/fieller_reference.py (numpy builds the 2x2 long-run
// covariance matrix directly and solves the quadratic with numpy.roots; scipy.stats.t.ppf gives
// the critical value) on forecasts of R's open datasets AirPassengers, Nile and co2 written by
// dm_reference.R. Tolerance: 1e-9 relative to max(1, |end|).

interface FiellerCase {
  name: string;
  estimator: 'ewc' | 'bartlett';
  lag: number | null;
  horizon: number;
  degreesOfFreedom: number | null;
  tail: number;
  critical: number;
  baselineLoss: number[];
  candidateLoss: number[];
  lower: number;
  upper: number;
}

const reference = JSON.parse(readFileSync(join(FIXTURES, 'fieller_reference.json'), 'utf8')) as {
  cases: FiellerCase[];
};

describe('Fieller interval of the Diebold–Mariano test against numpy', () => {
  for (const c of reference.cases) {
    it(`${c.name}, ${c.estimator}`, () => {
      const found = dieboldMarianoMarginSet({
        candidate: Float64Array.from(c.candidateLoss),
        baseline: Float64Array.from(c.baselineLoss),
        estimator: c.estimator,
        lag: c.lag === null ? { kind: 'auto' } : { kind: 'fixed', lag: c.lag },
        degreesOfFreedom: c.degreesOfFreedom,
        horizon: c.horizon,
        tail: c.tail,
      });
      expect(found).not.toBeNull();
      expect(found!.set).toHaveLength(1);
      const [piece] = found!.set;
      const close = (got: number | null, want: number) =>
        expect(Math.abs(got! - want)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(want)));
      close(found!.critical, c.critical);
      close(piece!.lower, c.lower);
      close(piece!.upper, c.upper);
    });
  }
});
