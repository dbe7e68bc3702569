/**
 * The family of tests a multiplicity adjustment runs over: the p-values that could be computed.
 * A comparison whose test was not computable (too few time points, zero variance, identical
 * forecasts) carries a null p-value; it is passed through as null and left out of the family, so
 * the family size m counts the computed p-values only. This matches R's `stats::p.adjust`, whose
 * default n is the number of non-missing p-values.
 */
export interface TestFamily {
  /** Input positions of the computed p-values, in input order. */
  readonly positions: readonly number[];
  /** The computed p-values, in the order of `positions`. */
  readonly values: readonly number[];
}

/**
 * Splits p-values into the family (non-null entries) and validates them.
 * @throws RangeError when a p-value is not a number in [0, 1] (NaN included), naming its position.
 */
export function testFamily(pValues: readonly (number | null)[], what: string): TestFamily {
  const positions: number[] = [];
  const values: number[] = [];
  pValues.forEach((p, i) => {
    if (p === null) return;
    if (typeof p !== 'number' || !(p >= 0 && p <= 1)) {
      throw new RangeError(`${what}: p-value ${i + 1} is ${p}, not a number in [0, 1]`);
    }
    positions.push(i);
    values.push(p);
  });
  return { positions, values };
}

/**
 * The positions 0..m−1 of `values` sorted by value ascending, ties kept in input order (a stable
 * sort, like R's `order`).
 */
export function ascendingOrder(values: readonly number[]): number[] {
  return values.map((_, i) => i).sort((a, b) => values[a]! - values[b]! || a - b);
}
