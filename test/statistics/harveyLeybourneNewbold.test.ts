import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  harveyLeybourneNewbold,
  harveyLeybourneNewboldFactor,
} from '../../src/statistics/harveyLeybourneNewbold.js';
import { expectClose } from '../helpers/tolerance.js';

describe('harveyLeybourneNewboldFactor: √((n + 1 − 2h + h(h − 1)/n)/n) (HLN 1997)', () => {
  it('n = 100, h = 1 gives √0.99; n = 10, h = 3 gives √0.56 (hand arithmetic)', () => {
    expectClose(
      harveyLeybourneNewboldFactor(100, 1),
      Math.sqrt(0.99),
      { relative: 1e-15 },
      'n = 100, h = 1',
    );
    expectClose(
      harveyLeybourneNewboldFactor(10, 3),
      Math.sqrt(0.56),
      { relative: 1e-15 },
      'n = 10, h = 3',
    );
  });

  it('is undefined (null) when h ≥ n', () => {
    expect(harveyLeybourneNewboldFactor(5, 5)).toBeNull();
    expect(harveyLeybourneNewboldFactor(5, 6)).toBeNull();
    expect(harveyLeybourneNewbold(1, 5, 7)).toBeNull();
  });

  it('property: equals the docs/design.md form √((n + 1 − 2h + h(h − 1)/n)/n) for 1 ≤ h < n', () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 10_000 }), fc.nat(), (n, hSeed) => {
        const h = 1 + (hSeed % (n - 1));
        const ratio = (n + 1 - 2 * h + (h * (h - 1)) / n) / n;
        // the sum form cancels when h is near n: allow its rounding, ε·n² relative to the ratio
        const tolerance = (4 * Number.EPSILON * n * n) / (n * n * ratio) + 1e-14;
        expectClose(
          harveyLeybourneNewboldFactor(n, h),
          Math.sqrt(ratio),
          { relative: tolerance },
          `n = ${n}, h = ${h}`,
        );
      }),
    );
  });
});

describe('harveyLeybourneNewbold', () => {
  it('statistic 2, n = 100, h = 1: 2√0.99 against t_99 (R: pt(2 * sqrt(0.99), 99, lower.tail = FALSE) = 0.02467578814)', () => {
    const result = harveyLeybourneNewbold(2, 100, 1)!;
    expectClose(result.statistic, 2 * Math.sqrt(0.99), { relative: 1e-15 }, 'statistic');
    expect(result.degreesOfFreedom).toBe(99);
    expectClose(result.pValue, 0.02467578814, { relative: 1e-9 }, 'one-sided p');
    // R: 2 * pt(-2 * sqrt(0.99), 99)
    expectClose(result.pValueTwoSided, 0.04935157629, { relative: 1e-9 }, 'two-sided p');
  });
});
