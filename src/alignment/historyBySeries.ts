import type { ForecastTable } from '../reading/forecastTable.js';
import type { TimeFormatName } from './timeFormat.js';
import { orderLabels } from './timeOrder.js';

/**
 * Turns an in-sample history file (series, timestamp, actual; read as an actuals table) into one
 * series of actuals per series name, in time order: the input of the seasonal naive scale
 * (Hyndman & Koehler 2006). Duplicated keys were already refused by the reader.
 */
export function historyBySeries(
  table: ForecastTable,
  timeFormat: TimeFormatName = 'auto',
): Map<string, Float64Array> {
  const order = orderLabels(
    [{ file: table.summary.path, column: table.timestamp }],
    'timestamp',
    timeFormat,
  );
  const ranks = order.ranks[0]!;
  const actual = table.actual?.values ?? new Float64Array(table.size);
  const bySeries = new Map<string, { rank: number; value: number }[]>();
  for (let i = 0; i < table.size; i++) {
    const name = table.series === null ? '' : table.series.labels[table.series.ids[i]!]!;
    let list = bySeries.get(name);
    if (list === undefined) {
      list = [];
      bySeries.set(name, list);
    }
    list.push({ rank: ranks[table.timestamp.ids[i]!]!, value: actual[i]! });
  }
  const out = new Map<string, Float64Array>();
  for (const [name, list] of bySeries) {
    list.sort((a, b) => a.rank - b.rank);
    out.set(
      name,
      Float64Array.from(list, (p) => p.value),
    );
  }
  return out;
}
