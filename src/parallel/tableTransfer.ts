/**
 * The transfer list of a forecast table: the ArrayBuffers behind its typed columns, each once.
 * Posting a table with this list moves the columns to the receiving thread without copying them
 * (the sender's arrays are detached, length 0, afterwards); the label arrays and the file summary
 * are small and are copied by the structured clone.
 */
import type { ForecastTable, LabelColumn } from '../reading/forecastTable.js';

export function tableBuffers(table: ForecastTable): ArrayBuffer[] {
  const views: ArrayBufferView[] = [table.lines];
  const labels = (column: LabelColumn | null): void => {
    if (column !== null) views.push(column.ids, column.firstLines);
  };
  labels(table.series);
  labels(table.timestamp);
  labels(table.origin);
  labels(table.path);
  if (table.horizon !== null) views.push(table.horizon.values);
  for (const column of [table.actual, table.prediction, table.weight]) {
    if (column !== null) views.push(column.values);
  }
  for (const quantile of table.quantiles) views.push(quantile.values);
  const buffers = new Set<ArrayBuffer>();
  // A SharedArrayBuffer cannot be transferred (and needs no transfer: it is shared already).
  for (const view of views) if (view.buffer instanceof ArrayBuffer) buffers.add(view.buffer);
  return [...buffers];
}
