import type { SeriesScale, SeriesScaleState } from './seriesScale.js';

/** A series that has no usable scale, and why. */
export interface MissingScale {
  readonly series: string;
  /** `absent` when the scales have no entry for the series. */
  readonly state: Exclude<SeriesScaleState, 'ok'> | 'absent';
  readonly note: string;
}

export type ScaledLosses =
  | { readonly state: 'ok'; readonly baseline: Float64Array; readonly candidate: Float64Array }
  | { readonly state: 'unavailable'; readonly missing: readonly MissingScale[] };

/**
 * Divides both models' row losses by their series' scale, L̃_i = L_i / scale_{s(i)}, so series on
 * different scales can be pooled (for the seasonal naive scale this turns absolute errors into
 * the terms of the mean absolute scaled error of Hyndman & Koehler 2006). The differential of
 * the scaled losses is d̃_i = d_i / scale_{s(i)}.
 *
 * Conventions: every series that has a row must have an `ok` scale; otherwise nothing is scaled
 * and the result lists each series without one (in series-id order), so no series is dropped
 * silently. Series with no rows are not checked.
 *
 * @example scaleLossesBySeries(['a'], Int32Array.of(0, 0), Float64Array.of(2, 4), Float64Array.of(1, 1),
 *   new Map([['a', { state: 'ok', value: 2, terms: 2, note: null }]]))
 *   // { state: 'ok', baseline: [1, 2], candidate: [0.5, 0.5] }
 * @throws RangeError when the arrays differ in length or a series index is out of range.
 */
export function scaleLossesBySeries(
  seriesNames: readonly string[],
  series: Int32Array,
  baseline: Float64Array,
  candidate: Float64Array,
  scales: ReadonlyMap<string, SeriesScale>,
): ScaledLosses {
  const n = series.length;
  if (baseline.length !== n || candidate.length !== n) {
    throw new RangeError(
      `scaleLossesBySeries: ${n} series indices, ${baseline.length} baseline and ` +
        `${candidate.length} candidate losses`,
    );
  }
  const k = seriesNames.length;
  const used = new Uint8Array(k);
  for (let i = 0; i < n; i++) {
    const s = series[i]!;
    if (!(s >= 0 && s < k)) {
      throw new RangeError(
        `scaleLossesBySeries: row ${i + 1} has series index ${s}, not 0..${k - 1}`,
      );
    }
    used[s] = 1;
  }
  const divisor = new Float64Array(k);
  const missing: MissingScale[] = [];
  seriesNames.forEach((name, s) => {
    if (used[s] === 0) return;
    const scale = scales.get(name);
    if (scale === undefined) {
      missing.push({ series: name, state: 'absent', note: 'no scale was given for this series' });
    } else if (scale.state !== 'ok' || scale.value === null) {
      const state = scale.state === 'ok' ? 'zero' : scale.state;
      missing.push({ series: name, state, note: scale.note ?? 'the scale is not usable' });
    } else {
      divisor[s] = scale.value;
    }
  });
  if (missing.length > 0) return { state: 'unavailable', missing };
  const scaledBaseline = new Float64Array(n);
  const scaledCandidate = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const c = divisor[series[i]!]!;
    scaledBaseline[i] = baseline[i]! / c;
    scaledCandidate[i] = candidate[i]! / c;
  }
  return { state: 'ok', baseline: scaledBaseline, candidate: scaledCandidate };
}
