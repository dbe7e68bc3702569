import type { ForecastTable } from '../reading/forecastTable.js';

/**
 * A readable key for row i of a predictions file, for examples in the report:
 * "candidate line 12: series=north timestamp=2024-01-02 horizon=1 origin=2024-01-01".
 */
export function describeTableRow(table: ForecastTable, i: number): string {
  const parts: string[] = [];
  if (table.series !== null) parts.push(`series=${table.series.labels[table.series.ids[i]!]}`);
  parts.push(`timestamp=${table.timestamp.labels[table.timestamp.ids[i]!]}`);
  if (table.horizon !== null) parts.push(`horizon=${table.horizon.values[i]}`);
  if (table.origin !== null) parts.push(`origin=${table.origin.labels[table.origin.ids[i]!]}`);
  if (table.path !== null) parts.push(`path=${table.path.labels[table.path.ids[i]!]}`);
  return `${table.summary.role} line ${table.lines[i]}: ${parts.join(' ')}`;
}
