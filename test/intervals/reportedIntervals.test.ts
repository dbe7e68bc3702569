import { describe, expect, it } from 'vitest';
import type { LossSeries } from '../../src/aggregation/lossSeries.js';
import { compareLossSeries } from '../../src/comparison/compareLossSeries.js';
import { hypothesisFor } from '../../src/decision/hypothesis.js';
import { relativeChangeText } from '../../src/report/relativeChangeText.js';
import { resolveSettings } from '../../src/settings/resolveSettings.js';

// Invented loss series (a deterministic pattern): these check what the report says, not values.
const scope = { loss: 'squared' as const, horizon: 'all' as const, series: 'all', timestamps: [] };

function series(baseline: number[], candidate: number[]): LossSeries {
  const n = baseline.length;
  return {
    time: Int32Array.from({ length: n }, (_, t) => t),
    baseline: Float64Array.from(baseline),
    candidate: Float64Array.from(candidate),
    rows: new Int32Array(n).fill(1),
    rowCount: n,
    maxHorizon: 1,
  };
}

const wave = (n: number, f: (t: number) => number) => Array.from({ length: n }, (_, t) => f(t));
const settings = (extra: Record<string, string> = {}) =>
  resolveSettings(
    { baseline: 'b.csv', candidate: 'c.csv', resamples: '999', ...extra },
    (name) => `--${name}`,
  );

describe('every interval is for the quantity printed beside it', () => {
  const s = series(
    wave(80, (t) => 10 + 3 * Math.sin(t * 1.7) + (t % 5)),
    wave(80, (t) => 9 + 3 * Math.sin(t * 1.7 + 0.4) + (t % 7)),
  );
  it('with a relative margin, the DM and bootstrap intervals are for E[L_c − L_b]', () => {
    const plain = compareLossSeries(
      s,
      scope,
      hypothesisFor('no-regression', 0, 'relative'),
      settings(),
    );
    const margin = compareLossSeries(
      s,
      scope,
      hypothesisFor('no-regression', 0.1, 'relative'),
      settings({ margin: '0.1' }),
    );
    // The tested differential moved with the margin, the printed difference and its intervals not.
    expect(margin.meanTestedDifferential).not.toBeCloseTo(plain.meanTestedDifferential, 3);
    expect(margin.meanDifference).toBe(plain.meanDifference);
    for (const c of [plain, margin]) {
      for (const interval of [c.dieboldMariano.interval!, c.bootstrap.interval!]) {
        expect(interval.lower).toBeLessThan(c.meanDifference);
        expect(interval.upper).toBeGreaterThan(c.meanDifference);
      }
    }
    expect(margin.dieboldMariano.interval!.lower).toBeCloseTo(
      plain.dieboldMariano.interval!.lower,
      10,
    );
    expect(margin.bootstrap.interval!.upper).toBeCloseTo(plain.bootstrap.interval!.upper, 10);
    // The relative-change interval does not depend on the margin either, and holds the estimate.
    expect(margin.relativeChange).toEqual(plain.relativeChange);
    const rc = margin.relativeChange!;
    expect(rc.level).toBe(0.9);
    expect(rc.lower!).toBeLessThan(rc.estimate);
    expect(rc.upper!).toBeGreaterThan(rc.estimate);
    expect(rc.method).toBe('Fieller (ewc-ar1) ∪ inverted bootstrap');
    expect(relativeChangeText(margin)).toMatch(
      /^[−+-]?\d.*% \[.*%, .*%\]( \(measured coverage [\d.]+%\))?$/,
    );
  });

  it('reports an unbounded set with null ends and its pieces', () => {
    // A baseline whose mean loss is small against its variation: the ratio has no finite bound.
    const noisy = series(
      wave(40, (t) => (t % 20 === 3 ? 20 : 0.01)),
      wave(40, (t) => 1 + (t % 3)),
    );
    const c = compareLossSeries(
      noisy,
      scope,
      hypothesisFor('no-regression', 0, 'relative'),
      settings({ agreement: 'dm' }),
    );
    const rc = c.relativeChange!;
    expect(rc.method).toBe('Fieller (ewc-ar1)');
    // Two rays: the tests reject only for margins between the pieces; the hull is unbounded.
    expect(rc.lower).toBeNull();
    expect(rc.upper).toBeNull();
    expect(rc.pieces).toHaveLength(2);
    expect(rc.pieces![0]!.lower).toBeNull();
    expect(rc.pieces![1]!.upper).toBeNull();
    expect(rc.pieces![0]!.upper!).toBeLessThan(rc.pieces![1]!.lower!);
    expect(relativeChangeText(c)).toMatch(
      /\[−∞, .*%\] ∪ \[.*%, \+∞\]( \(measured coverage .*\))?$/,
    );
  });
});
