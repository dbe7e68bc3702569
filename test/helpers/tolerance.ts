import { expect } from 'vitest';

/**
 * How far a computed number may be from the value it is checked against, in the one rule every
 * test of the project uses:
 *
 *   |actual − expected| ≤ absolute + relative · |expected|.
 *
 * Both parts default to 0, so `{ relative: 1e-9 }` is a purely relative check (an expected 0 then
 * demands exactly 0) and `{ absolute: 1e-12 }` a purely absolute one. A check that once read
 * "tol · max(1, |expected|)" is written `{ relative: tol, absolute: tol }`: at most twice as wide,
 * never narrower. null, undefined or NaN never pass.
 */
export interface Tolerance {
  readonly relative?: number;
  readonly absolute?: number;
}

/** What was compared, for the failure message: a label, or the quantity, its source and inputs. */
export type CloseContext = string | { what: string; source?: string; inputs?: unknown };

/**
 * Asserts `actual` is within `tolerance` of `expected` (see `Tolerance`) and, on failure, prints
 * what was compared, the source of the expected value, the inputs, both values, the difference and
 * the allowed difference.
 */
export function expectClose(
  actual: number | null | undefined,
  expected: number,
  tolerance: Tolerance,
  context: CloseContext = '',
): void {
  const relative = tolerance.relative ?? 0;
  const absolute = tolerance.absolute ?? 0;
  const allowed = absolute + relative * Math.abs(expected);
  const difference =
    actual === null || actual === undefined ? Number.NaN : Math.abs(actual - expected);
  const about = typeof context === 'string' ? { what: context } : context;
  const message = [
    about.what,
    ...(about.source === undefined ? [] : [`  source:     ${about.source}`]),
    ...(about.inputs === undefined ? [] : [`  inputs:     ${JSON.stringify(about.inputs)}`]),
    `  expected:   ${expected}`,
    `  actual:     ${actual}`,
    `  difference: ${difference} (allowed ${allowed} = ${absolute} + ${relative} × |expected|)`,
  ].join('\n');
  expect(difference <= allowed, message).toBe(true);
}
