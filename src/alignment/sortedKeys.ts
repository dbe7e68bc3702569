import { InputError } from '../core/inputError.js';
import type { ForecastTable } from '../reading/forecastTable.js';
import type { KeyCodes } from './keyCodes.js';
import {
  describeKey,
  type KeyColumns,
  type KeyLayout,
  type KeyPart,
  partColumn,
} from './keyLayout.js';
import { sortByKey } from './keyOrder.js';

/** One file's keys in key order: its key columns, the sorted rows and their codes (see keyCodes). */
export interface SortedKeys {
  readonly table: ForecastTable;
  readonly keys: KeyColumns;
  /** Rows in key order; equal keys would be adjacent, in file order. */
  readonly order: Int32Array;
  /** codes[order[i]]: the codes in key order. */
  readonly sorted: KeyCodes;
}

/**
 * Sorts a file's rows by key (radix sort on the part ids, carrying the codes along) and refuses a
 * key that occurs twice, naming both lines.
 */
export function sortKeys(
  layout: KeyLayout,
  parts: readonly KeyPart[],
  table: ForecastTable,
  keys: KeyColumns,
  codes: KeyCodes,
): SortedKeys {
  const components = parts.map((part) => ({
    values: partColumn(keys, part.name),
    cardinality: part.cardinality,
  }));
  const order = sortByKey(keys.size, components, codes);
  const sorted = order.sorted!;
  for (let i = 1; i < order.order.length; i++) {
    if (sorted[i - 1] === sorted[i]) {
      const a = order.order[i - 1]!;
      const b = order.order[i]!;
      const first = Math.min(table.lines[a]!, table.lines[b]!);
      const second = Math.max(table.lines[a]!, table.lines[b]!);
      throw new InputError(
        `duplicated key ${describeKey(layout, keys, a, parts)}: lines ${first} and ${second} have the same key`,
        { file: table.summary.path, line: second, value: describeKey(layout, keys, b, parts) },
      );
    }
  }
  return { table, keys, order: order.order, sorted };
}
