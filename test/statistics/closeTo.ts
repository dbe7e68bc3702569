import { expect } from 'vitest';

/**
 * Asserts |actual − expected| ≤ relative·|expected| (or ≤ absolute when expected is 0), and on
 * failure prints the label (which names the inputs and the reference's source), expected, actual
 * and the relative difference.
 */
export function expectClose(
  actual: number | null | undefined,
  expected: number,
  relative: number,
  label: string,
  absolute = 1e-12,
): void {
  const diff = actual === null || actual === undefined ? Number.NaN : Math.abs(actual - expected);
  const bound = expected === 0 ? absolute : relative * Math.abs(expected);
  const ok = diff <= bound;
  const rel = expected === 0 ? diff : diff / Math.abs(expected);
  expect(
    ok,
    `${label}\n  expected ${expected}\n  actual   ${actual}\n  |diff|   ${diff} ` +
      `(relative ${rel}, allowed ${bound})`,
  ).toBe(true);
}
