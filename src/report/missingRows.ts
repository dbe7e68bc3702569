import type { LackingRows } from '../core/panel.js';
import { POINT_LOSSES, type RowLosses } from '../losses/rowLosses.js';

/** A group of rows the candidate lacks: how many, when, and how hard they were for the baseline. */
export interface MissingRowsGroup {
  readonly key: string;
  readonly rows: number;
  readonly first: string | null;
  readonly last: string | null;
  /** The baseline's mean loss on these rows (point losses with a known actual), else null. */
  readonly meanBaselineLoss: number | null;
}

/**
 * Where the rows the candidate lacks are, so a model cannot pass by skipping hard cases unseen:
 * broken down by series and by horizon, with the time span and the baseline's mean loss on them,
 * next to the baseline's mean loss on the rows both models scored (both are plain means over
 * rows).
 */
export interface MissingRowsSummary {
  readonly rows: number;
  readonly first: string | null;
  readonly last: string | null;
  readonly meanBaselineLoss: number | null;
  readonly meanBaselineLossCommon: number | null;
  /** Rows whose baseline loss could not be computed (no actual, or a loss without a point forecast). */
  readonly rowsWithoutLoss: number;
  readonly bySeries: readonly MissingRowsGroup[];
  readonly byHorizon: readonly MissingRowsGroup[];
}

const GROUPS = 50;

export function missingRowsSummary(
  lacking: LackingRows | undefined,
  losses: RowLosses,
): MissingRowsSummary | null {
  if (lacking === undefined || lacking.series.length === 0) return null;
  const n = lacking.series.length;
  const lossOf =
    losses.loss === 'pinball' || losses.loss === 'interval' ? null : POINT_LOSSES[losses.loss];
  const loss = new Float64Array(n).fill(Number.NaN);
  let withoutLoss = 0;
  for (let k = 0; k < n; k++) {
    const y = lacking.actual[k]!;
    const f = lacking.prediction[k]!;
    const value =
      lossOf !== null && Number.isFinite(y) && Number.isFinite(f) ? lossOf(y, f) : Number.NaN;
    if (Number.isFinite(value)) loss[k] = value;
    else withoutLoss++;
  }
  const group = (keyOf: (k: number) => string, order: (a: string, b: string) => number) => {
    const acc = new Map<string, { rows: number; lo: number; hi: number; sum: number; m: number }>();
    for (let k = 0; k < n; k++) {
      const key = keyOf(k);
      const t = lacking.time[k]!;
      const g = acc.get(key) ?? { rows: 0, lo: t, hi: t, sum: 0, m: 0 };
      g.rows++;
      g.lo = Math.min(g.lo, t);
      g.hi = Math.max(g.hi, t);
      if (Number.isFinite(loss[k]!)) {
        g.sum += loss[k]!;
        g.m++;
      }
      acc.set(key, g);
    }
    return [...acc.entries()]
      .sort((a, b) => b[1].rows - a[1].rows || order(a[0], b[0]))
      .slice(0, GROUPS)
      .map(([key, g]) => ({
        key,
        rows: g.rows,
        first: lacking.timestamps[g.lo] ?? null,
        last: lacking.timestamps[g.hi] ?? null,
        meanBaselineLoss: g.m === 0 ? null : g.sum / g.m,
      }));
  };
  const all = group(
    () => 'all',
    () => 0,
  )[0]!;
  let sum = 0;
  let m = 0;
  for (let i = 0; i < losses.baseline.length; i++) {
    if (losses.included !== null && losses.included[i] === 0) continue;
    sum += losses.baseline[i]!;
    m++;
  }
  return {
    rows: n,
    first: all.first,
    last: all.last,
    meanBaselineLoss: all.meanBaselineLoss,
    meanBaselineLossCommon: m === 0 ? null : sum / m,
    rowsWithoutLoss: withoutLoss,
    bySeries: group(
      (k) => lacking.seriesNames[lacking.series[k]!] ?? '',
      (a, b) => (a < b ? -1 : a > b ? 1 : 0),
    ),
    byHorizon: group(
      (k) => String(lacking.horizon[k]),
      (a, b) => Number(a) - Number(b),
    ),
  };
}
