/**
 * Absolute error, L(y, ŷ) = |y − ŷ|. Its mean is the MAE (Hyndman & Koehler 2006, §3.1).
 * Example: absoluteError(3, 1) = 2.
 */
export function absoluteError(actual: number, prediction: number): number {
  return Math.abs(actual - prediction);
}
