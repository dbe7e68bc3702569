import { type SeriesScale, scaleFromSum } from './seriesScale.js';

/** The loss the seasonal naive errors are measured in. */
export type SeasonalNaiveLoss = 'absolute' | 'squared';

/**
 * In-sample error of the seasonal naive forecast ŷ_t = y_{t−m} on a history y_1..y_T: the scale
 * of the mean absolute scaled error (MASE) of Hyndman & Koehler (2006), who define it with the
 * one-step naive forecast (m = 1); the seasonal version with period m is the usual extension
 * (common practice):
 *
 *   absolute: scale = (1/(T − m)) Σ_{t=m+1..T} |y_t − y_{t−m}|,
 *   squared:  scale = (1/(T − m)) Σ_{t=m+1..T} (y_t − y_{t−m})²,
 *
 * Use the absolute form to scale absolute errors (MASE) and the squared form to scale squared
 * errors, so the scaled loss is unit-free either way; the squared form is the square of the
 * denominator of the root mean squared scaled error used in the M5 competition (Makridakis,
 * Spiliotis & Assimakopoulos 2022; from memory).
 *
 * Conventions: m = 1 is the plain naive (random walk) forecast; the history is in time order and
 * gap-free (the caller lays it out); T ≤ m gives `too-short`, a history whose seasonal differences
 * are all 0 gives `zero`.
 *
 * @example seasonalNaiveScaleOf([1, 3, 2, 6], 1, 'absolute') // (2 + 1 + 4)/3 = 7/3
 * @example seasonalNaiveScaleOf([1, 3, 2, 6], 2, 'squared')  // (1 + 9)/2 = 5
 * @throws RangeError when m is not an integer ≥ 1 or a value is not finite.
 */
export function seasonalNaiveScaleOf(
  history: ArrayLike<number>,
  period: number,
  loss: SeasonalNaiveLoss,
): SeriesScale {
  if (!Number.isInteger(period) || period < 1) {
    throw new RangeError(`seasonalNaiveScale: the period must be an integer ≥ 1, got ${period}`);
  }
  const n = history.length;
  for (let t = 0; t < n; t++) {
    if (!Number.isFinite(history[t]!)) {
      throw new RangeError(`seasonalNaiveScale: value ${t + 1} is ${history[t]}, not finite`);
    }
  }
  let sum = 0;
  for (let t = period; t < n; t++) {
    const e = history[t]! - history[t - period]!;
    sum += loss === 'absolute' ? Math.abs(e) : e * e;
  }
  const what =
    loss === 'absolute'
      ? `mean absolute seasonal naive error (period ${period})`
      : `mean squared seasonal naive error (period ${period})`;
  return scaleFromSum(sum, Math.max(0, n - period), what);
}

/**
 * `seasonalNaiveScaleOf` for every series of a history, keyed by series id, in the map's order.
 * @example seasonalNaiveScale(new Map([['a', [1, 3, 2, 6]], ['b', [5]]]), 1, 'absolute')
 *   // Map { 'a' → ok 7/3, 'b' → too-short }
 * @throws RangeError as `seasonalNaiveScaleOf`, naming the series.
 */
export function seasonalNaiveScale(
  histories: ReadonlyMap<string, ArrayLike<number>>,
  period: number,
  loss: SeasonalNaiveLoss,
): Map<string, SeriesScale> {
  const scales = new Map<string, SeriesScale>();
  for (const [name, history] of histories) {
    try {
      scales.set(name, seasonalNaiveScaleOf(history, period, loss));
    } catch (error) {
      if (error instanceof RangeError) {
        throw new RangeError(`series ${JSON.stringify(name)}: ${error.message}`);
      }
      throw error;
    }
  }
  return scales;
}
