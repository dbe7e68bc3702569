/**
 * Interval score, interval coverage and pinball loss: worked examples by hand, the pinball
 * identity as a property, and a reference check against R on quantile forecasts of open series
 * (test/reference/fixtures/panel_pinball.json, written by test/reference/scripts/panel_pinball.R;
 * the fixture names its source).
 */
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { intervalCoverage } from '../../src/losses/intervalCoverage.js';
import { intervalScore } from '../../src/losses/intervalScore.js';
import { pinballLoss } from '../../src/losses/pinballLoss.js';
import { expectClose } from '../helpers/tolerance.js';

describe('interval score, worked examples (Gneiting & Raftery 2007, eq. 43, by hand)', () => {
  it('inside the interval it is the width', () => {
    // [8, 10], y = 9, α = 0.2: 10 − 8 = 2.
    expect(intervalScore(9, 8, 10, 0.2)).toBe(2);
    // On a bound counts as inside: no penalty.
    expect(intervalScore(8, 8, 10, 0.2)).toBe(2);
    expect(intervalScore(10, 8, 10, 0.2)).toBe(2);
  });
  it('above the interval: width + (2/α)(y − u)', () => {
    // [8, 10], y = 12, α = 0.2: 2 + 10·2 = 22.
    expectClose(
      intervalScore(12, 8, 10, 0.2),
      22,
      { relative: 1e-14, absolute: 1e-14 },
      'IS(12; [8, 10], 0.2)',
    );
  });
  it('below the interval: width + (2/α)(l − y)', () => {
    // [−1, 3], y = −2, α = 0.5: 4 + 4·1 = 8.
    expect(intervalScore(-2, -1, 3, 0.5)).toBe(8);
    // [0, 0] (a point), y = −3, α = 0.1: 0 + 20·3 = 60.
    expectClose(
      intervalScore(-3, 0, 0, 0.1),
      60,
      { relative: 1e-14, absolute: 1e-14 },
      'IS(−3; [0, 0], 0.1)',
    );
  });
  it('a crossed interval (l > u) scores (2/α − 1)(l − u) between the bounds', () => {
    // l = 10, u = 8, y = 9, α = 0.5: −2 + 4·1 + 4·1 = 6 = (4 − 1)·2.
    expect(intervalScore(9, 10, 8, 0.5)).toBe(6);
  });
  it('rejects α outside (0, 1)', () => {
    for (const alpha of [0, 1, -0.1, 1.5, Number.NaN]) {
      expect(() => intervalScore(1, 0, 2, alpha), `α = ${alpha}`).toThrow(RangeError);
    }
  });
});

describe('interval coverage, worked examples', () => {
  it('counts closed intervals; crossed ones cover nothing', () => {
    // 1 ∈ [0, 4], 5 ∈ [0, 5] (on the bound), 9 ∉ [0, 8]: 2/3.
    expectClose(
      intervalCoverage([1, 5, 9], [0, 0, 0], [4, 5, 8])!,
      2 / 3,
      { relative: 1e-15, absolute: 1e-15 },
      'coverage',
    );
    expect(intervalCoverage([1, 1], [2, 0], [0, 2])).toBe(0.5);
    expect(intervalCoverage(new Float64Array([3]), [3], [3])).toBe(1);
  });
  it('is null for no observations and refuses arrays of different lengths', () => {
    expect(intervalCoverage([], [], [])).toBeNull();
    expect(() => intervalCoverage([1, 2], [0], [3, 3])).toThrow(/2 actuals, 1 lower and 2 upper/);
  });
});

const value = fc.double({ min: -1e6, max: 1e6, noNaN: true });
const alpha = fc.double({ min: 0.001, max: 0.999, noNaN: true });

describe('interval score, properties', () => {
  it('equals (2/α)(ρ_{α/2}(y − l) + ρ_{1−α/2}(y − u)), crossed intervals included', () => {
    fc.assert(
      fc.property(value, value, value, alpha, (y, l, u, a) => {
        const pinballForm = (2 / a) * (pinballLoss(y, l, a / 2) + pinballLoss(y, u, 1 - a / 2));
        const score = intervalScore(y, l, u, a);
        // Rounding of the two forms grows with the penalty 2/α and the size of the inputs.
        const size = (2 / a) * (Math.abs(y) + Math.abs(l) + Math.abs(u) + 1);
        const diff = Math.abs(score - pinballForm);
        if (!(diff <= 1e-13 * size)) {
          expect.fail(
            `y ${y}, l ${l}, u ${u}, α ${a}: interval score ${score}, pinball form ${pinballForm}, difference ${diff}`,
          );
        }
      }),
    );
  });
  it('is non-negative, at least the width, and exactly the width when l ≤ y ≤ u', () => {
    fc.assert(
      fc.property(value, value, value, alpha, (y, a1, a2, a) => {
        const l = Math.min(a1, a2);
        const u = Math.max(a1, a2);
        const score = intervalScore(y, l, u, a);
        const context = `y ${y}, [${l}, ${u}], α ${a}: ${score}`;
        expect(score, context).toBeGreaterThanOrEqual(0);
        expect(score, context).toBeGreaterThanOrEqual(u - l);
        if (l <= y && y <= u) expect(score, context).toBe(u - l);
      }),
    );
  });
});

interface PinballCase {
  name: string;
  dataset: string;
  forecast: string;
  actual: number[];
  quantiles: { level: number; values: number[]; rowLoss: number[]; meanLoss: number }[];
  intervals: {
    alpha: number;
    lowerLevel: number;
    upperLevel: number;
    rowScore: number[];
    meanScore: number;
    coverage: number;
  }[];
}
const fixture = JSON.parse(
  readFileSync(
    join(
      dirname(fileURLToPath(import.meta.url)),
      '..',
      'reference',
      'fixtures',
      'panel_pinball.json',
    ),
    'utf8',
  ),
) as { generator: string; source: string; cases: PinballCase[] };

// Row values: 1e-13 relative (one subtraction and one multiplication either side); means over
// ~90 rows: 1e-12 relative (summation order differs from R's long-double sum).
const ROW = 1e-13;
const MEAN = 1e-12;
const mean = (xs: number[]) => xs.reduce((s, x) => s + x, 0) / xs.length;

describe.each(fixture.cases)('against R: $dataset', (c) => {
  const where = `${c.name} (${c.forecast}; ${fixture.source})`;
  it('pinball loss per row and its mean per level', () => {
    expect(c.quantiles.length).toBe(5);
    for (const q of c.quantiles) {
      const rows = c.actual.map((y, i) => pinballLoss(y, q.values[i]!, q.level));
      rows.forEach((r, i) => {
        const context = `${where}: τ = ${q.level}, row ${i + 1}, y ${c.actual[i]}, q ${q.values[i]}`;
        expectClose(r, q.rowLoss[i]!, { relative: ROW, absolute: ROW }, context);
      });
      expectClose(
        mean(rows),
        q.meanLoss,
        { relative: MEAN, absolute: MEAN },
        `${where}: mean pinball loss at τ = ${q.level}`,
      );
    }
  });
  it('interval score per row, its mean, and coverage', () => {
    expect(c.intervals.map((i) => i.alpha)).toEqual([0.1, 0.2]);
    for (const interval of c.intervals) {
      const lower = c.quantiles.find((q) => q.level === interval.lowerLevel)!.values;
      const upper = c.quantiles.find((q) => q.level === interval.upperLevel)!.values;
      const rows = c.actual.map((y, i) => intervalScore(y, lower[i]!, upper[i]!, interval.alpha));
      rows.forEach((r, i) => {
        expectClose(
          r,
          interval.rowScore[i]!,
          { relative: ROW, absolute: ROW },
          `${where}: α = ${interval.alpha}, row ${i + 1}`,
        );
      });
      expectClose(
        mean(rows),
        interval.meanScore,
        { relative: MEAN, absolute: MEAN },
        `${where}: mean interval score`,
      );
      expectClose(
        intervalCoverage(c.actual, lower, upper)!,
        interval.coverage,
        { relative: 1e-15, absolute: 1e-15 },
        `${where}: coverage at α = ${interval.alpha}`,
      );
    }
  });
});
