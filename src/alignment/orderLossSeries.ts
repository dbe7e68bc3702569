import type { LossSeries } from '../aggregation/lossSeries.js';
import { InputError } from '../core/inputError.js';
import type { TimestampKind } from '../core/panel.js';
import type { LossSeriesTable } from '../reading/lossSeriesReader.js';
import type { TimeFormatName } from './timeFormat.js';
import { orderLabels } from './timeOrder.js';

/**
 * Puts a pre-aggregated loss file in time order (numeric, chronological or text, decided as for
 * forecast files) and turns it into the LossSeries the tests take. Two labels for one instant
 * ("2024-01-01" and "2024-01-01T00:00Z") are one time point twice: an InputError.
 */
export function orderLossSeries(
  table: LossSeriesTable,
  timeFormat: TimeFormatName = 'auto',
): {
  series: LossSeries;
  timestamps: string[];
  kind: TimestampKind;
  reason: string;
  format: TimeFormatName;
} {
  const file = table.summary.path;
  const order = orderLabels([{ file, column: table.timestamp }], 'timestamp', timeFormat);
  const ranks = order.ranks[0]!;
  const n = table.size;
  const rowAt = new Int32Array(order.labels.length).fill(-1);
  for (let i = 0; i < n; i++) {
    const rank = ranks[table.timestamp.ids[i]!]!;
    const other = rowAt[rank]!;
    if (other >= 0) {
      throw new InputError(
        `this timestamp denotes the same time as line ${table.lines[other]} (${JSON.stringify(
          table.timestamp.labels[table.timestamp.ids[other]!],
        )})`,
        {
          file,
          line: table.lines[i]!,
          column: table.timestamp.column,
          value: table.timestamp.labels[table.timestamp.ids[i]!]!,
        },
      );
    }
    rowAt[rank] = i;
  }
  const time = new Int32Array(n);
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  const rows = new Int32Array(n);
  let k = 0;
  let rowCount = 0;
  let maxHorizon = 1;
  for (let rank = 0; rank < rowAt.length; rank++) {
    const i = rowAt[rank]!;
    if (i < 0) continue;
    time[k] = rank;
    baseline[k] = table.baseline[i]!;
    candidate[k] = table.candidate[i]!;
    rows[k] = table.rows[i]!;
    rowCount += table.rows[i]!;
    maxHorizon = Math.max(maxHorizon, table.horizon[i]!);
    k++;
  }
  return {
    series: { time, baseline, candidate, rows, rowCount, maxHorizon },
    timestamps: [...order.labels],
    kind: order.kind,
    reason: order.reason,
    format: order.format,
  };
}
