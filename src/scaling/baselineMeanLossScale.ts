import { type SeriesScale, scaleFromSum } from './seriesScale.js';

/**
 * Per-series scale from the baseline's own losses: for each series s, the mean baseline row loss
 * over that series' rows,
 *
 *   scale_s = (1/|R_s|) Σ_{i ∈ R_s} L^base_i,
 *
 * so that, after dividing both models' row losses by scale_s, the baseline's mean loss is 1 in
 * every series and a series with large values no longer dominates the pooled differential. This
 * is the relative-error idea of dividing by a benchmark's error (the relative measures of Hyndman &
 * Koehler 2006), with the baseline as the benchmark and the mean taken per series.
 *
 * Conventions: rows with `included[i] === 0` are left out (as skipped rows are everywhere else);
 * every series in `seriesNames` gets an entry, `too-short` when it has no included row and `zero`
 * when the baseline is exact on all its rows. The scale uses the same rows it then scales, so it
 * is an in-sample normalisation, not an independent benchmark.
 *
 * @example baselineMeanLossScale(['a', 'b'], Int32Array.of(0, 0, 1), Float64Array.of(1, 3, 10))
 *   // Map { 'a' → { state: 'ok', value: 2, terms: 2 }, 'b' → { state: 'ok', value: 10, terms: 1 } }
 * @throws RangeError when the arrays differ in length, a series index is out of range, or an
 *   included loss is negative or not finite.
 */
export function baselineMeanLossScale(
  seriesNames: readonly string[],
  series: Int32Array,
  baselineLoss: Float64Array,
  included: Uint8Array | null = null,
): Map<string, SeriesScale> {
  const n = series.length;
  if (baselineLoss.length !== n || (included !== null && included.length !== n)) {
    throw new RangeError(
      `baselineMeanLossScale: ${n} series indices, ${baselineLoss.length} losses` +
        (included === null ? '' : `, ${included.length} inclusion flags`),
    );
  }
  const k = seriesNames.length;
  const sum = new Float64Array(k);
  const count = new Int32Array(k);
  for (let i = 0; i < n; i++) {
    if (included !== null && included[i] === 0) continue;
    const s = series[i]!;
    if (!(s >= 0 && s < k)) {
      throw new RangeError(
        `baselineMeanLossScale: row ${i + 1} has series index ${s}, not 0..${k - 1}`,
      );
    }
    const loss = baselineLoss[i]!;
    if (!(loss >= 0 && Number.isFinite(loss))) {
      throw new RangeError(`baselineMeanLossScale: row ${i + 1} has baseline loss ${loss}`);
    }
    sum[s]! += loss;
    count[s]!++;
  }
  const scales = new Map<string, SeriesScale>();
  seriesNames.forEach((name, s) => {
    scales.set(name, scaleFromSum(sum[s]!, count[s]!, 'mean baseline loss'));
  });
  return scales;
}
