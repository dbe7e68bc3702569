import type { AlignedPanel } from '../core/panel.js';
import type { RowLosses } from '../losses/rowLosses.js';

/**
 * One comparison's losses as a time series: at each time point that has at least one row, the
 * mean loss of each model over the rows with that timestamp (all series and horizons selected),
 * in time order. The bootstrap and the HAC variance then treat whole time points as the unit, so
 * cross-sectional dependence between series at the same time is kept.
 */
export interface LossSeries {
  /** Timestamp rank of each point (ascending; index into panel.timestamps). */
  readonly time: Int32Array;
  readonly baseline: Float64Array;
  readonly candidate: Float64Array;
  /** Rows averaged at each point. */
  readonly rows: Int32Array;
  /** Rows that took part in total. */
  readonly rowCount: number;
  /** Largest horizon among the rows (1 when there is no horizon column). */
  readonly maxHorizon: number;
}

/**
 * Averages row losses by timestamp: L̄_t = (1/m_t) Σ_{rows i at t} L_i, over the listed rows (all
 * rows when omitted) that the losses include. Cost O(rows listed + time points), so one call per
 * series stays linear in the panel overall. With `weights`, the
 * weighted mean L̄_t = Σ w_i L_i / Σ w_i (revenue- or volume-weighted gates); a time point whose
 * selected weights sum to 0 is left out like one without rows.
 */
export function aggregateByTime(
  panel: AlignedPanel,
  losses: RowLosses,
  rows?: ArrayLike<number>,
  weights: Float64Array | null = null,
): LossSeries {
  const points = panel.timestamps.length;
  const sumB = new Float64Array(points);
  const sumC = new Float64Array(points);
  const count = new Int32Array(points);
  const weightSum = weights === null ? null : new Float64Array(points);
  let maxHorizon = 1;
  let rowCount = 0;
  const included = losses.included;
  const total = rows === undefined ? panel.size : rows.length;
  for (let r = 0; r < total; r++) {
    const i = rows === undefined ? r : rows[r]!;
    if (included !== null && included[i] === 0) continue;
    const t = panel.time[i]!;
    const w = weights === null ? 1 : weights[i]!;
    sumB[t]! += w * losses.baseline[i]!;
    sumC[t]! += w * losses.candidate[i]!;
    if (weightSum !== null) weightSum[t]! += w;
    count[t]!++;
    rowCount++;
    const h = panel.horizon[i]!;
    if (h > maxHorizon) maxHorizon = h;
  }
  const denominator = (t: number) => (weightSum === null ? count[t]! : weightSum[t]!);
  let n = 0;
  for (let t = 0; t < points; t++) if (count[t]! > 0 && denominator(t) > 0) n++;
  const time = new Int32Array(n);
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  const rowsAt = new Int32Array(n);
  let k = 0;
  for (let t = 0; t < points; t++) {
    const m = denominator(t);
    if (count[t]! === 0 || m <= 0) continue;
    time[k] = t;
    baseline[k] = sumB[t]! / m;
    candidate[k] = sumC[t]! / m;
    rowsAt[k] = count[t]!;
    k++;
  }
  return { time, baseline, candidate, rows: rowsAt, rowCount, maxHorizon };
}

/**
 * The loss differential tested against zero: d_t = L^cand_t − (1 + r) · L^base_t. With r = 0
 * this is the plain differential of Diebold & Mariano (1995); a relative margin r > 0 tolerates
 * a candidate up to 100·r % worse (docs/design.md, "Margins": "tested exactly as δ = 0 on …").
 */
export function lossDifferential(series: LossSeries, relativeMargin: number): Float64Array {
  const n = series.baseline.length;
  const d = new Float64Array(n);
  const factor = 1 + relativeMargin;
  for (let t = 0; t < n; t++) d[t] = series.candidate[t]! - factor * series.baseline[t]!;
  return d;
}
