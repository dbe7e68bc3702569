import type { QuantileColumn } from '../core/panel.js';
import { ByteInterner } from './byteInterner.js';
import type { Header } from './forecastHeader.js';
import type { IntegerColumn, LabelColumn, ValueColumn } from './forecastTable.js';

/** How a column's fields are read: an interned key, a horizon, a number, a number ≥ 0. */
export const LABEL = 0;
export const HORIZON = 1;
export const VALUE = 2;
export const WEIGHT = 3;
export type ColumnKind = typeof LABEL | typeof HORIZON | typeof VALUE | typeof WEIGHT;

export type ColumnPart =
  | 'series'
  | 'timestamp'
  | 'origin'
  | 'path'
  | 'horizon'
  | 'actual'
  | 'prediction'
  | 'weight'
  | 'quantile';

/**
 * One column a forecast file's reader fills: its part of the table, how its fields are read, the
 * header field it comes from, and the typed array being built (`ints` for keys and horizons,
 * `floats` for numbers).
 */
export interface ForecastColumn {
  readonly part: ColumnPart;
  readonly kind: ColumnKind;
  /** Index of the field in each record. */
  readonly field: number;
  /** The header name. */
  readonly name: string;
  /** The quantile level (quantile columns only; NaN otherwise). */
  readonly level: number;
  readonly labels: ByteInterner | null;
  ints: Int32Array;
  floats: Float64Array;
}

/** The key parts, in the order keys are compared and spelled. */
export const KEY_PARTS = ['series', 'timestamp', 'horizon', 'origin', 'path'] as const;

/**
 * The columns of a file with this header, in the order each row is checked (so the first problem
 * of a row is the one reported): keys, horizon, actual, prediction, weight, then the quantiles by
 * level.
 */
export function forecastColumns(header: Header): ForecastColumn[] {
  const columns: ForecastColumn[] = [];
  const add = (part: ColumnPart, kind: ColumnKind, field: number, level = Number.NaN): void => {
    if (field < 0) return;
    columns.push({
      part,
      kind,
      field,
      name: header.names[field]!,
      level,
      labels: kind === LABEL ? new ByteInterner() : null,
      ints: NO_INTS,
      floats: NO_FLOATS,
    });
  };
  add('series', LABEL, header.series);
  add('timestamp', LABEL, header.timestamp);
  add('origin', LABEL, header.origin);
  add('path', LABEL, header.path);
  add('horizon', HORIZON, header.horizon);
  add('actual', VALUE, header.actual);
  add('prediction', VALUE, header.prediction);
  add('weight', WEIGHT, header.weight);
  for (const q of header.quantiles) add('quantile', VALUE, q.index, q.level);
  return columns;
}

/** Gives every column room for `capacity` rows, keeping what it holds. */
export function growColumns(columns: readonly ForecastColumn[], capacity: number): void {
  for (const column of columns) {
    if (column.kind === LABEL || column.kind === HORIZON) {
      const next = new Int32Array(capacity);
      next.set(column.ints);
      column.ints = next;
    } else {
      const next = new Float64Array(capacity);
      next.set(column.floats);
      column.floats = next;
    }
  }
}

/** The first column of a part, if the file has it. */
export function columnOf(
  columns: readonly ForecastColumn[],
  part: ColumnPart,
): ForecastColumn | undefined {
  return columns.find((c) => c.part === part);
}

/** The table's columns from the first `n` rows read. */
export function tableColumns(
  columns: readonly ForecastColumn[],
  n: number,
): {
  series: LabelColumn | null;
  timestamp: LabelColumn;
  horizon: IntegerColumn | null;
  origin: LabelColumn | null;
  path: LabelColumn | null;
  actual: ValueColumn | null;
  prediction: ValueColumn | null;
  weight: ValueColumn | null;
  quantiles: QuantileColumn[];
} {
  const label = (part: ColumnPart): LabelColumn | null => {
    const c = columnOf(columns, part);
    if (c === undefined) return null;
    return {
      column: c.name,
      ids: c.ints.slice(0, n),
      labels: c.labels!.labels,
      firstLines: Int32Array.from(c.labels!.firstLines),
    };
  };
  const value = (part: ColumnPart): ValueColumn | null => {
    const c = columnOf(columns, part);
    return c === undefined ? null : { column: c.name, values: c.floats.slice(0, n) };
  };
  const horizon = columnOf(columns, 'horizon');
  return {
    series: label('series'),
    timestamp: label('timestamp')!,
    horizon:
      horizon === undefined ? null : { column: horizon.name, values: horizon.ints.slice(0, n) },
    origin: label('origin'),
    path: label('path'),
    actual: value('actual'),
    prediction: value('prediction'),
    weight: value('weight'),
    quantiles: columns
      .filter((c) => c.part === 'quantile')
      .map((c) => ({ level: c.level, column: c.name, values: c.floats.slice(0, n) })),
  };
}

const NO_INTS = new Int32Array(0);
const NO_FLOATS = new Float64Array(0);
