/**
 * Symmetric absolute percentage error in percent, L(y, ŷ) = 200 · |y − ŷ| / (|y| + |ŷ|), the
 * form used by Hyndman & Koehler (2006, §3.2) for the sMAPE; bounded by 200. Convention: when
 * y = ŷ = 0 the forecast is exact and the loss is 0 (the formula alone would give 0/0).
 * Example: symmetricAbsolutePercentageError(100, 50) = 66.66…
 */
export function symmetricAbsolutePercentageError(actual: number, prediction: number): number {
  const denominator = Math.abs(actual) + Math.abs(prediction);
  return denominator === 0 ? 0 : (200 * Math.abs(actual - prediction)) / denominator;
}
