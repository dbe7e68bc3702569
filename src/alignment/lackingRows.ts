import type { LackingRows } from '../core/panel.js';
import type { ForecastTable } from '../reading/forecastTable.js';
import type { KeyColumns, KeyLayout } from './keyLayout.js';

/**
 * The baseline rows the candidate lacks, described for the report: series, timestamp, horizon,
 * and the baseline's prediction and the actual where known (from the baseline file, else the
 * actuals file), so the report can show where they are and how hard they were for the baseline.
 * `actuals` is the actuals file with its key columns, when there is one.
 */
export function lackingRows(
  layout: KeyLayout,
  rows: Int32Array,
  baseline: ForecastTable,
  baselineKeys: KeyColumns,
  actuals: { readonly table: ForecastTable; readonly keys: KeyColumns } | null,
): LackingRows {
  const { series, time, horizons } = layout.dictionaries;
  const timeCount = time.order.labels.length;
  const n = rows.length;
  const out: LackingRows = {
    series: new Int32Array(n),
    seriesNames: series.names,
    time: new Int32Array(n),
    timestamps: time.order.labels,
    horizon: new Int32Array(n),
    actual: new Float64Array(n).fill(Number.NaN),
    prediction: new Float64Array(n).fill(Number.NaN),
  };
  let fromActuals: Map<number, number> | null = null;
  const actualColumn = actuals?.table.actual ?? null;
  if (n > 0 && baseline.actual === null && actuals !== null && actualColumn !== null) {
    fromActuals = new Map();
    const keys = actuals.keys;
    for (let r = 0; r < actuals.table.size; r++) {
      fromActuals.set(keys.series[r]! * timeCount + keys.timestamp[r]!, actualColumn.values[r]!);
    }
  }
  for (let k = 0; k < n; k++) {
    const row = rows[k]!;
    const s = baselineKeys.series[row]!;
    const t = baselineKeys.timestamp[row]!;
    out.series[k] = s;
    out.time[k] = t;
    out.horizon[k] = horizons.values[baselineKeys.horizon![row]!]!;
    if (baseline.prediction !== null) out.prediction[k] = baseline.prediction.values[row]!;
    if (baseline.actual !== null) out.actual[k] = baseline.actual.values[row]!;
    else if (fromActuals !== null) {
      out.actual[k] = fromActuals.get(s * timeCount + t) ?? Number.NaN;
    }
  }
  return out;
}
