import { expect } from 'vitest';

/**
 * Asserts |actual − expected| ≤ tol · max(1, |expected|) (relative for large values, absolute
 * near zero) and prints what was compared, against what source, on failure.
 */
export function expectClose(actual: number, expected: number, tol: number, what = ''): void {
  const scale = Math.max(1, Math.abs(expected));
  const diff = Math.abs(actual - expected);
  if (!(diff <= tol * scale)) {
    expect.fail(
      `${what}: expected ${expected}, got ${actual}, difference ${diff} > tolerance ${tol} × ${scale}`,
    );
  }
}
