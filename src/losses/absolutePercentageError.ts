/**
 * Absolute percentage error in percent, L(y, ŷ) = 100 · |y − ŷ| / |y| (Hyndman & Koehler 2006,
 * §3.2; its mean is the MAPE). Undefined when y = 0: the caller must either refuse such rows or
 * skip and count them (see `zeroActuals` in the settings); this function returns Infinity or NaN
 * there and never hides it. Example: absolutePercentageError(200, 150) = 25.
 */
export function absolutePercentageError(actual: number, prediction: number): number {
  return (100 * Math.abs(actual - prediction)) / Math.abs(actual);
}
