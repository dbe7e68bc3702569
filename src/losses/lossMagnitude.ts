/**
 * The largest loss the tests accept. Means, differences and the squares inside long-run variances
 * are computed in double precision: with every |loss| ≤ 1e100, a sum over a billion rows stays
 * below 1e110 and a sum of squared differences below 1e210, far from overflow (≈ 1.8e308). A
 * larger loss — or one that is already infinite, such as a prediction of 1e308 squared — would
 * give Infinity or NaN in the report, so it is refused, naming its row, rather than computed.
 * Data in any real unit is far below the limit; rescaling (thousands, millions) is the fix.
 */
export const MAX_LOSS = 1e100;

/** The first index whose value is not finite or exceeds MAX_LOSS in magnitude, or −1. */
export function firstOversizedLoss(
  values: Float64Array,
  included: Uint8Array | null = null,
): number {
  for (let i = 0; i < values.length; i++) {
    if (included !== null && included[i] === 0) continue;
    const v = values[i]!;
    if (!(Math.abs(v) <= MAX_LOSS)) return i;
  }
  return -1;
}
