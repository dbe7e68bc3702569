import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { fluctuationTest } from '../../src/stability/fluctuationTest.js';

/** Fixtures from test/reference/scripts/fluctuation_reference.R (R sandwich + stats::filter). */
const fixture = (name: string) =>
  JSON.parse(
    readFileSync(
      path.join(import.meta.dirname, '..', 'reference', 'fixtures', `fluctuation_${name}.json`),
      'utf8',
    ),
  );

describe.each(['nile_mu02', 'airpassengers_mu03'])('fluctuation test against R on %s', (name) => {
  const ref = fixture(name);
  const d = Float64Array.from(ref.candidateLoss as number[], (c, t) => c - ref.baselineLoss[t]);
  const run = (sides: 'one' | 'two') =>
    fluctuationTest(d, { mu: ref.mu, alpha: 0.05, sides, lag: { kind: 'auto' }, horizon: 1 })!;

  it('has the same window, automatic lag and whole-sample long-run variance', () => {
    const r = run('one');
    expect(r.windowSize).toBe(ref.windowSize);
    expect(r.lag).toBe(ref.lag);
    // Tolerance: relative 1e-10 (both are the same sums in double precision).
    expect(Math.abs(r.longRunVariance / ref.longRunVariance - 1)).toBeLessThan(1e-10);
  });

  it('has every rolling statistic within 1e-6 (R: stats::filter sums / sqrt(m σ²))', () => {
    const r = run('one');
    expect(r.path.length).toBe(ref.statistics.length);
    const worst = Math.max(...Array.from(r.path, (f, k) => Math.abs(f - ref.statistics[k])));
    expect(worst).toBeLessThan(1e-6);
  });

  it('peaks where R says, one- and two-sided', () => {
    const one = run('one');
    const two = run('two');
    expect(one.statistic).toBeCloseTo(ref.oneSided, 6);
    expect(one.peakWindow + 1).toBe(ref.oneSidedPeak);
    expect(two.statistic).toBeCloseTo(ref.twoSided, 6);
    expect(two.peakWindow + 1).toBe(ref.twoSidedPeak);
  });
});
