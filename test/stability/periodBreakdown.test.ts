import { describe, expect, it } from 'vitest';
import type { LossSeries } from '../../src/aggregation/lossSeries.js';
import { periodBreakdown } from '../../src/stability/periodBreakdown.js';

const seriesOf = (baseline: number[], candidate: number[]): LossSeries => ({
  time: Int32Array.from(baseline, (_, t) => t),
  baseline: Float64Array.from(baseline),
  candidate: Float64Array.from(candidate),
  rows: Int32Array.from(baseline, () => 1),
  rowCount: baseline.length,
  maxHorizon: 1,
});

describe('periodBreakdown', () => {
  it('averages each period by hand-checkable means (8 equal-count buckets of 2 points)', () => {
    const b = Array.from({ length: 16 }, (_, t) => 1 + t);
    const c = b.map((x, t) => (t >= 14 ? 1.5 * x : x));
    const timestamps = b.map((_, t) => String(t + 1));
    const { periods } = periodBreakdown(seriesOf(b, c), timestamps, 'number');
    expect(periods).toHaveLength(8);
    expect(periods[0]).toEqual({
      start: '1',
      end: '2',
      n: 2,
      meanBaselineLoss: 1.5,
      meanCandidateLoss: 1.5,
      relativeDifference: 0,
    });
    // Last period: points 15, 16: baseline (15 + 16)/2 = 15.5, candidate 1.5 × that.
    expect(periods[7]).toMatchObject({ start: '15', end: '16', meanBaselineLoss: 15.5 });
    expect(periods[7]!.relativeDifference).toBeCloseTo(0.5, 14);
  });

  it('gives null for a relative difference when the baseline loss is 0, and labels from series.time', () => {
    const series = { ...seriesOf([0, 0, 1], [1, 1, 1]), time: Int32Array.from([1, 3, 4]) };
    const { periods } = periodBreakdown(series, ['a', 'b', 'c', 'd', 'e'], 'text');
    expect(periods.map((p) => [p.start, p.relativeDifference])).toEqual([
      ['b', null],
      ['d', null],
      ['e', 0],
    ]);
  });
});
