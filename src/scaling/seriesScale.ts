/**
 * A per-series scale: the positive number a series' losses are divided by before series on
 * different scales are pooled, and why a series has none.
 *
 * - `ok`: `value` is finite and > 0;
 * - `zero`: the defining mean is 0 (e.g. a constant history, or a baseline that is exact on every
 *   row), so dividing by it is undefined;
 * - `too-short`: the mean has no terms (a history no longer than the seasonal period, or a series
 *   without rows).
 */
export type SeriesScaleState = 'ok' | 'zero' | 'too-short';

export interface SeriesScale {
  readonly state: SeriesScaleState;
  /** The scale when `state` is `ok`, else null. */
  readonly value: number | null;
  /** How many terms the defining mean was taken over. */
  readonly terms: number;
  /** Plain words on why there is no scale; null when `state` is `ok`. */
  readonly note: string | null;
}

/**
 * The scale from a sum of non-negative terms: its mean when positive and finite, else the state
 * that says why not. `what` names the mean in the note (e.g. "mean baseline loss").
 * @throws RangeError when the mean overflows to Infinity.
 */
export function scaleFromSum(sum: number, terms: number, what: string): SeriesScale {
  if (terms === 0) {
    return { state: 'too-short', value: null, terms, note: `the ${what} has no terms` };
  }
  const value = sum / terms;
  if (!Number.isFinite(value)) {
    throw new RangeError(`the ${what} is ${value}, too large for double precision`);
  }
  if (value === 0) {
    return {
      state: 'zero',
      value: null,
      terms,
      note: `the ${what} is 0 over ${terms} term${terms === 1 ? '' : 's'}, so it cannot scale`,
    };
  }
  return { state: 'ok', value, terms, note: null };
}
