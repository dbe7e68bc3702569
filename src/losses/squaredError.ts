/**
 * Squared error, L(y, ŷ) = (y − ŷ)². Its mean is the MSE; the loss of Diebold & Mariano (1995),
 * eq. (1). Example: squaredError(3, 1) = 4.
 */
export function squaredError(actual: number, prediction: number): number {
  const e = actual - prediction;
  return e * e;
}
