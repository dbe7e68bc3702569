import { readFileSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { absoluteError } from '../../src/losses/absoluteError.js';
import { absolutePercentageError } from '../../src/losses/absolutePercentageError.js';
import { pinballLoss } from '../../src/losses/pinballLoss.js';
import { squaredError } from '../../src/losses/squaredError.js';
import { symmetricAbsolutePercentageError } from '../../src/losses/symmetricAbsolutePercentageError.js';
import { expectClose } from '../helpers/tolerance.js';

// Worked by hand from the definitions in each function's doc comment; exact in binary floating
// point (tolerance 1e-12 where a division is involved).
describe('point losses, worked examples', () => {
  it('squared error (y − ŷ)²', () => {
    expect(squaredError(3, 1)).toBe(4);
    expect(squaredError(1, 3)).toBe(4);
  });
  it('absolute error |y − ŷ|', () => {
    expect(absoluteError(3, 1)).toBe(2);
    expect(absoluteError(-1, 2)).toBe(3);
  });
  it('absolute percentage error 100·|y − ŷ|/|y|', () => {
    expect(absolutePercentageError(200, 150)).toBeCloseTo(25, 12);
    expect(absolutePercentageError(-50, -40)).toBeCloseTo(20, 12);
    expect(absolutePercentageError(0, 1)).toBe(Number.POSITIVE_INFINITY);
  });
  it('symmetric APE 200·|y − ŷ|/(|y| + |ŷ|), 0 when both are 0', () => {
    expect(symmetricAbsolutePercentageError(100, 50)).toBeCloseTo(200 / 3, 12);
    expect(symmetricAbsolutePercentageError(0, 0)).toBe(0);
    expect(symmetricAbsolutePercentageError(0, 5)).toBe(200);
  });
  it('pinball loss ρ_τ(y − q)', () => {
    // y = 10, q = 8, τ = 0.9: under-forecast by 2 costs 0.9·2 = 1.8; over-forecast by 2 costs 0.1·2.
    expect(pinballLoss(10, 8, 0.9)).toBeCloseTo(1.8, 12);
    expect(pinballLoss(10, 12, 0.9)).toBeCloseTo(0.2, 12);
    // At τ = 0.5 the pinball loss is half the absolute error.
    expect(pinballLoss(10, 7, 0.5)).toBeCloseTo(1.5, 12);
  });
});

describe('point losses, properties', () => {
  const finite = fc.double({ min: -1e6, max: 1e6, noNaN: true });
  it('are non-negative and zero for a perfect forecast', () => {
    fc.assert(
      fc.property(finite, finite, (y, f) => {
        for (const loss of [squaredError, absoluteError, symmetricAbsolutePercentageError]) {
          expect(loss(y, f)).toBeGreaterThanOrEqual(0);
          expect(loss(y, y)).toBe(0);
        }
      }),
    );
  });
  it('squared and absolute error scale as c² and c', () => {
    fc.assert(
      fc.property(finite, finite, fc.double({ min: 0.01, max: 100, noNaN: true }), (y, f, c) => {
        // c·y − c·f rounds differently from c·(y − f): allow rounding relative to the inputs' size.
        const size = c * (Math.abs(y) + Math.abs(f) + 1);
        expect(
          Math.abs(squaredError(c * y, c * f) - c * c * squaredError(y, f)),
        ).toBeLessThanOrEqual(1e-12 * size * size);
        expect(Math.abs(absoluteError(c * y, c * f) - c * absoluteError(y, f))).toBeLessThanOrEqual(
          1e-12 * size,
        );
      }),
    );
  });
  it('pinball loss averaged over τ and 1 − τ is half the absolute error', () => {
    fc.assert(
      fc.property(finite, finite, fc.double({ min: 0.01, max: 0.99, noNaN: true }), (y, q, tau) => {
        const avg = (pinballLoss(y, q, tau) + pinballLoss(y, q, 1 - tau)) / 2;
        expectClose(
          avg,
          absoluteError(y, q) / 2,
          { relative: 1e-12, absolute: 1e-12 },
          'pinball average',
        );
      }),
    );
  });
});

describe('pinball loss against scikit-learn', () => {
  // Check values: sklearn.metrics.mean_pinball_loss (python3-sklearn), written by
  // test/reference/scripts/panel_pinball_sklearn.py from the Nile and LakeHuron quantile
  // forecasts of panel_pinball.json. Tolerance 1e-12 relative.
  const dir = path.resolve(import.meta.dirname, '..', 'reference', 'fixtures');
  const inputs = JSON.parse(readFileSync(path.join(dir, 'panel_pinball.json'), 'utf8'));
  const expected = JSON.parse(readFileSync(path.join(dir, 'panel_pinball_sklearn.json'), 'utf8'));
  for (const c of inputs.cases as {
    name: string;
    actual: number[];
    quantiles: { level: number; values: number[] }[];
  }[]) {
    it(`${c.name}: mean pinball loss per level`, () => {
      const ref = (
        expected.cases as { name: string; levels: { level: number; meanLoss: number }[] }[]
      ).find((x) => x.name === c.name)!;
      for (const q of c.quantiles) {
        const mean =
          c.actual.reduce((s, y, i) => s + pinballLoss(y, q.values[i]!, q.level), 0) /
          c.actual.length;
        const want = ref.levels.find((l) => l.level === q.level)!.meanLoss;
        expectClose(
          mean,
          want,
          { relative: 1e-12, absolute: 1e-12 },
          `${c.name} τ=${q.level} vs ${expected.source}`,
        );
      }
    });
  }
});
