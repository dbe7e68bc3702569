import { bartlettLongRunVariance } from './bartlettLongRunVariance.js';
import { mean } from './mean.js';
import type { LagRule } from './neweyWestLag.js';
import { selectLag } from './neweyWestLag.js';

/** Largest |â| of the AR(1) prewhitening filter (Andrews & Monahan 1992 cap it likewise). */
const PREWHITENING_CAP = 0.97;

export interface PrewhitenedLongRunVariance {
  /** ω̂² of the series. */
  readonly longRunVariance: number;
  /** â, the AR(1) coefficient of the centred series (capped at ±0.97). */
  readonly coefficient: number;
  /** Lag of the Bartlett estimate on the prewhitened residuals. */
  readonly lag: number;
}

/**
 * Long-run variance with AR(1) prewhitening (Andrews & Monahan 1992): centre the series,
 * x_t = y_t − ȳ; fit x_t = a x_{t−1} + e_t by least squares without intercept,
 * â = Σ_{t≥2} x_t x_{t−1} / Σ_{t≥2} x_{t−1}² (capped at ±0.97); take the project's Newey–West
 * (Bartlett) estimate of the residuals e_2 … e_n (`bartlettLongRunVariance`, autocovariances about
 * their own mean, divided by n − 1) with the lag from the project's rule applied to them
 * (`selectLag`: Newey & West 1994 automatic by default, at least h − 1); recolour:
 * ω̂² = ω̂_e² / (1 − â)². Prewhitening removes most of the downward bias of the kernel estimate
 * under positive autocorrelation, which otherwise inflates sup-type statistics (measured in
 * docs/validation.md). Equals R: x <- y - mean(y); a <- ar.ols(x, order.max = 1, aic = FALSE,
 * demean = FALSE, intercept = FALSE)$ar; e <- x[-1] - a * x[-n]; then
 * (n − 1) · sandwich::NeweyWest(lm(e ~ 1), lag = L, prewhite = FALSE, adjust = FALSE) / (1 − a)².
 *
 * @throws RangeError for fewer than 3 values (selectLag needs two residuals).
 */
export function prewhitenedLongRunVariance(
  y: Float64Array,
  rule: LagRule,
  horizon: number,
): PrewhitenedLongRunVariance {
  const n = y.length;
  if (n < 3) throw new RangeError(`prewhitenedLongRunVariance: needs at least 3 values, got ${n}`);
  const centre = mean(y);
  let cross = 0;
  let square = 0;
  for (let t = 1; t < n; t++) {
    const previous = y[t - 1]! - centre;
    cross += (y[t]! - centre) * previous;
    square += previous * previous;
  }
  const raw = square === 0 ? 0 : cross / square;
  const coefficient = Math.max(-PREWHITENING_CAP, Math.min(PREWHITENING_CAP, raw));
  const residuals = new Float64Array(n - 1);
  for (let t = 1; t < n; t++) {
    residuals[t - 1] = y[t]! - centre - coefficient * (y[t - 1]! - centre);
  }
  const lag = selectLag(residuals, rule, horizon).lag;
  const recolour = (1 - coefficient) ** 2;
  return {
    longRunVariance: bartlettLongRunVariance(residuals, lag) / recolour,
    coefficient,
    lag,
  };
}
