/**
 * Counts of the bootstrap resample means d̄*_b = d̄ + T_b in `bins` equal-width bins from the
 * smallest to the largest (the last bin closed on the right), for drawing the bootstrap
 * distribution; it carries no inference.
 */
export interface ResampleHistogram {
  readonly lower: number;
  readonly upper: number;
  readonly counts: readonly number[];
}

export function resampleHistogram(
  mean: number,
  deviations: Float64Array,
  bins = 40,
): ResampleHistogram | null {
  if (deviations.length === 0) return null;
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const t of deviations) {
    lo = Math.min(lo, mean + t);
    hi = Math.max(hi, mean + t);
  }
  const counts = new Array<number>(bins).fill(0);
  const width = hi - lo;
  for (const t of deviations) {
    const j = width === 0 ? 0 : Math.min(bins - 1, Math.floor(((mean + t - lo) / width) * bins));
    counts[j]!++;
  }
  return { lower: lo, upper: hi, counts };
}
