import { describe, expect, it } from 'vitest';
import { stationaryBootstrapVariance } from '../../../src/statistics/bootstrap/stationaryBootstrapVariance.js';
import { mean } from '../../../src/statistics/mean.js';
import { expectClose } from '../../helpers/tolerance.js';
import { readFixture, type SeriesFixture } from './bootstrapFixtures.js';

interface VarianceFixture {
  cases: { series: string; expectedBlockLength: number; variance: number }[];
}

/**
 * Lemma 1 summed over every lag, O(n²), as docs/design.md writes it, centred by the project's
 * `mean` like the code: this oracle checks which lags are skipped, not the centring. (At b = 10⁷
 * the sum cancels to ~10⁻⁷ of γ̂_0, so the last bits of d̄ move it by ~10⁻¹¹ relative: the plain
 * left-to-right mean gives 1.55260994020e-7, the project's 1.55260994024e-7, and 60-digit
 * arithmetic (mpmath) on the same doubles 1.55260994078e-7.)
 */
function fullSum(d: Float64Array, b: number): number {
  const n = d.length;
  const centre = mean(d);
  const u = d.map((x) => x - centre);
  const q = 1 - 1 / b;
  let total = 0;
  for (let k = 0; k < n; k++) {
    let c = 0;
    for (let t = k; t < n; t++) c += u[t]! * u[t - k]!;
    c /= n;
    total += k === 0 ? c : 2 * ((1 - k / n) * q ** k + (k / n) * q ** (n - k)) * c;
  }
  return total / n;
}

describe('stationaryBootstrapVariance (Politis & Romano 1994, Lemma 1)', () => {
  it('matches the worked example: d = (1, 2, 3), b = 2 gives 7/54', () => {
    expectClose(
      stationaryBootstrapVariance(Float64Array.of(1, 2, 3), 2),
      7 / 54,
      { relative: 1e-15, absolute: 1e-15 },
      {
        what: 'Var*(mean*)',
        source: 'hand computation in the doc comment',
      },
    );
  });

  it('agrees with the circular-autocovariance evaluation in R to 1e-9 (relative)', async () => {
    const series = await readFixture<SeriesFixture>('bootstrap_series.json');
    const fixture = await readFixture<VarianceFixture>('bootstrap_variance.json');
    expect(fixture.cases.length).toBe(20);
    for (const c of fixture.cases) {
      const values = series.series.find((s) => s.name === c.series)!.values;
      const actual = stationaryBootstrapVariance(Float64Array.from(values), c.expectedBlockLength);
      const relative = Math.abs(actual / c.variance - 1);
      expect(
        relative <= 1e-9,
        `${c.series}, b = ${c.expectedBlockLength}: R (bootstrap_series.R, circular form) ${c.variance}, actual ${actual}, relative difference ${relative}`,
      ).toBe(true);
    }
  });

  it('skips only negligible lags: equals the full O(n²) sum to 1e-12 (relative)', () => {
    const n = 700;
    const d = Float64Array.from(
      { length: n },
      (_, t) => Math.sin(0.05 * t) + Math.cos(0.9 * t * t),
    );
    for (const b of [1, 1.3, 6, 90, 2000, 1e7]) {
      const actual = stationaryBootstrapVariance(d, b);
      const expected = fullSum(d, b);
      expect(
        Math.abs(actual / expected - 1) <= 1e-12,
        `b ${b}: full sum ${expected}, actual ${actual}`,
      ).toBe(true);
    }
  });

  it('is 0 for a constant series and refuses b < 1', () => {
    expect(stationaryBootstrapVariance(new Float64Array(10).fill(3), 4)).toBe(0);
    expect(() => stationaryBootstrapVariance(Float64Array.of(1, 2), 0.5)).toThrow(RangeError);
  });
});
