import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { relativeDifferenceBootstrap } from '../../../src/statistics/bootstrap/relativeDifferenceBootstrap.js';
import {
  type StationaryBootstrapOptions,
  stationaryBootstrap,
} from '../../../src/statistics/bootstrap/stationaryBootstrap.js';
import { expectClose } from '../../helpers/tolerance.js';
import { readSeries } from './bootstrapFixtures.js';

const options: StationaryBootstrapOptions = {
  resamples: 499,
  expectedBlockLength: 3,
  seed: 8,
  confidence: 0.9,
  margin: 0,
};

const losses = fc
  .array(fc.integer({ min: 0, max: 4000 }), { minLength: 3, maxLength: 60 })
  .map((xs) => Float64Array.from(xs, (x) => x / 16));

describe('relativeDifferenceBootstrap', () => {
  it('matches the worked example: losses (2, 2, 2) against (1, 1, 1) are 100% worse, exactly', () => {
    const r = relativeDifferenceBootstrap(
      Float64Array.of(2, 2, 2),
      Float64Array.of(1, 1, 1),
      options,
    );
    expect(r).toMatchObject({
      state: 'ok',
      relativeDifference: 1,
      standardError: 0,
      interval: { lower: 1, upper: 1, method: 'basic' },
    });
  });

  it('resamples with the same blocks and streams as stationaryBootstrap (baseline ≡ 1: θ* = mean* − 1)', () => {
    fc.assert(
      fc.property(losses, fc.nat(1e6), (candidate, seed) => {
        fc.pre(new Set(candidate).size > 1);
        const baseline = new Float64Array(candidate.length).fill(1);
        const relative = relativeDifferenceBootstrap(candidate, baseline, { ...options, seed });
        const absolute = stationaryBootstrap(candidate, { ...options, seed, margin: 1 });
        const source = 'stationaryBootstrap on the same data and seed';
        const about = (what: string) => ({ what, source, inputs: { seed } });
        const within = { relative: 1e-9, absolute: 1e-9 };
        expectClose(relative.standardError!, absolute.standardError!, within, about('SE'));
        expectClose(relative.interval!.lower, absolute.interval!.lower - 1, within, about('lower'));
        expectClose(relative.interval!.upper, absolute.interval!.upper - 1, within, about('upper'));
      }),
      { numRuns: 30 },
    );
  });

  it('does not change when both losses are rescaled (to 1e-12)', async () => {
    const nile = await readSeries('nile_diff');
    const candidate = nile.map((x) => x * x);
    const baseline = nile.map((x, t) => (x + (t % 3) * 20) ** 2);
    const a = relativeDifferenceBootstrap(candidate, baseline, options);
    const b = relativeDifferenceBootstrap(
      candidate.map((x) => x * 1000),
      baseline.map((x) => x * 1000),
      options,
    );
    for (const key of ['lower', 'upper'] as const) {
      expectClose(
        b.interval![key],
        a.interval![key],
        { relative: 1e-12, absolute: 1e-12 },
        {
          what: key,
          source: 'scale invariance of a ratio',
        },
      );
    }
    expectClose(
      b.relativeDifference!,
      a.relativeDifference!,
      { relative: 1e-12, absolute: 1e-12 },
      {
        what: 'θ̂',
        source: 'scale invariance',
      },
    );
    // p-value ≤ α exactly when the relative margin is below the one-sided bound.
    for (const margin of [
      a.oneSidedLower!.lower,
      a.oneSidedLower!.lower - 1e-3,
      a.interval!.upper,
    ]) {
      const r = relativeDifferenceBootstrap(candidate, baseline, { ...options, margin });
      expect(r.pValue! <= r.oneSidedLower!.alpha).toBe(margin < r.oneSidedLower!.lower);
    }
  });

  it('reports identical, too-short and zero-baseline cases as states, and refuses mismatched lengths', () => {
    const x = Float64Array.of(1, 2, 3);
    expect(relativeDifferenceBootstrap(x, x, options)).toMatchObject({
      state: 'identical',
      relativeDifference: 0,
      pValue: 1,
    });
    expect(relativeDifferenceBootstrap(Float64Array.of(1), Float64Array.of(1), options).state).toBe(
      'too-short',
    );
    expect(relativeDifferenceBootstrap(x, new Float64Array(3), options).state).toBe(
      'baseline-zero',
    );
    expect(() => relativeDifferenceBootstrap(x, Float64Array.of(1, 2), options)).toThrow(
      RangeError,
    );
  });
});
