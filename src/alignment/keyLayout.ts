import { echo } from '../core/inputError.js';
import type { ForecastTable } from '../reading/forecastTable.js';
import type { KeyDictionaries, TableRole } from './keyDictionaries.js';

/** The parts a key can have, most significant first. */
export type KeyPartName = 'series' | 'timestamp' | 'horizon' | 'origin' | 'path';

/**
 * One file's key, column by column: per row, the global id of each part (see KeyDictionaries).
 * Horizon, origin and path are null where the key does not have them (an actuals file is keyed
 * on series and timestamp alone).
 */
export interface KeyColumns {
  readonly size: number;
  readonly series: Int32Array;
  readonly timestamp: Int32Array;
  readonly horizon: Int32Array | null;
  readonly origin: Int32Array | null;
  readonly path: Int32Array | null;
}

/** One part of a key: its name, how many ids it has, and how an id reads in a message. */
export interface KeyPart {
  readonly name: KeyPartName;
  readonly cardinality: number;
  readonly label: (id: number) => string;
}

/**
 * Which parts make a key, in order of significance: a predictions key is (series, timestamp,
 * horizon, origin, path), origin and path only when the files have those columns; an actuals key
 * is (series, timestamp). Rows sort by these parts in this order.
 */
export interface KeyLayout {
  readonly dictionaries: KeyDictionaries;
  readonly prediction: readonly KeyPart[];
  readonly actual: readonly KeyPart[];
  /** Whether messages name the series (not when the files have no series column). */
  readonly namesSeries: boolean;
}

export function keyLayout(dictionaries: KeyDictionaries, namesSeries: boolean): KeyLayout {
  const { series, time, horizons, origin, path } = dictionaries;
  const actual: KeyPart[] = [
    { name: 'series', cardinality: series.names.length, label: (id) => series.names[id]! },
    {
      name: 'timestamp',
      cardinality: time.order.labels.length,
      label: (id) => time.order.labels[id]!,
    },
  ];
  const prediction: KeyPart[] = [
    ...actual,
    {
      name: 'horizon',
      cardinality: horizons.values.length,
      label: (id) => `${horizons.values[id]}`,
    },
  ];
  if (origin !== null) {
    prediction.push({
      name: 'origin',
      cardinality: origin.order.labels.length,
      label: (id) => origin.order.labels[id]!,
    });
  }
  if (path !== null) {
    prediction.push({
      name: 'path',
      cardinality: path.names.length,
      label: (id) => path.names[id]!,
    });
  }
  return { dictionaries, prediction, actual, namesSeries };
}

/** The id column of one part. */
export function partColumn(keys: KeyColumns, part: KeyPartName): Int32Array {
  const column = keys[part];
  if (column === null) throw new Error(`the key has no ${part} part`);
  return column;
}

/**
 * A file's key columns: its labels mapped to the global ids of the dictionaries. A predictions
 * file gets every part of the layout's predictions key, an actuals file series and timestamp.
 */
export function keyColumns(layout: KeyLayout, table: ForecastTable, role: TableRole): KeyColumns {
  const { series, time, horizons, origin, path } = layout.dictionaries;
  const n = table.size;
  const predictions = role !== 'actuals';
  return {
    size: n,
    series: mapIds(table.series?.ids ?? null, series.ids[role]!, n),
    timestamp: mapIds(table.timestamp.ids, time.ranks[role]!, n),
    horizon: predictions ? horizons.ranksOf(table.horizon, n) : null,
    origin:
      predictions && origin !== null ? mapIds(table.origin!.ids, origin.ranks[role]!, n) : null,
    path: predictions && path !== null ? mapIds(table.path!.ids, path.ids[role]!, n) : null,
  };
}

/**
 * The key of one row as a message shows it: "series=north timestamp=2024-01-02 horizon=1", each
 * part cut to 80 characters.
 */
export function describeKey(
  layout: KeyLayout,
  keys: KeyColumns,
  row: number,
  parts: readonly KeyPart[] = keys.horizon === null ? layout.actual : layout.prediction,
): string {
  const shown: string[] = [];
  for (const part of parts) {
    if (part.name === 'series' && !layout.namesSeries) continue;
    shown.push(echo(`${part.name}=${part.label(partColumn(keys, part.name)[row]!)}`, 80));
  }
  return shown.join(' ');
}

/** Global id per row: map[local id], or map[0] for a missing column (one implicit label). */
function mapIds(ids: Int32Array | null, map: Int32Array, n: number): Int32Array {
  const out = new Int32Array(n);
  if (ids === null) return out.fill(map[0]!);
  for (let i = 0; i < n; i++) out[i] = map[ids[i]!]!;
  return out;
}
