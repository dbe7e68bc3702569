import { InputError } from '../core/inputError.js';
import type { ForecastTable, IntegerColumn, LabelColumn } from '../reading/forecastTable.js';
import { parseDecimal } from '../reading/numbers.js';
import type { TimeFormatName } from './timeFormat.js';
import { compareCodeUnits, type LabelOrder, orderLabels } from './timeOrder.js';

/** The files of one comparison: two predictions files and, optionally, an actuals file. */
export interface ComparisonTables {
  readonly baseline: ForecastTable;
  readonly candidate: ForecastTable;
  readonly actuals?: ForecastTable;
}

/** Which file a table is, for the dictionaries' per-file lookups. */
export type TableRole = 'baseline' | 'candidate' | 'actuals';

/** Sorted distinct labels; per file, local label id → global id. */
export interface LabelDictionary {
  readonly names: readonly string[];
  readonly ids: Readonly<Record<TableRole, Int32Array | null>>;
}

/** The distinct horizons of the predictions files, ascending. */
export interface HorizonDictionary {
  readonly values: readonly number[];
  /** Rank (index into values) of each row's horizon; a file without the column is horizon 1. */
  ranksOf(column: IntegerColumn | null, size: number): Int32Array;
}

/** A time-ordered label column's ranks per file (see orderLabels). */
export interface TimeDictionary {
  readonly order: LabelOrder;
  readonly ranks: Readonly<Record<TableRole, Int32Array | null>>;
}

/**
 * The global dictionaries of a comparison, one per key part: every label of every file gets one
 * id, so keys from different files compare as integers. Origin and path are null when the files
 * have no such column.
 */
export interface KeyDictionaries {
  readonly series: LabelDictionary;
  readonly time: TimeDictionary;
  readonly horizons: HorizonDictionary;
  readonly origin: TimeDictionary | null;
  readonly path: LabelDictionary | null;
}

/**
 * Checks that both predictions files (and the actuals file, for series) have the same key
 * columns, then builds the dictionaries: series names in code-unit order, timestamps and origins
 * in the time order decided over all files together (orderLabels), paths numerically when all
 * are numbers, horizons ascending.
 */
export function keyDictionaries(
  tables: ComparisonTables,
  timeFormat: TimeFormatName,
): KeyDictionaries {
  const { baseline, candidate, actuals } = tables;
  checkSameShape(baseline, candidate, 'series', (t) => t.series);
  checkSameShape(baseline, candidate, 'origin', (t) => t.origin);
  checkSameShape(baseline, candidate, 'path', (t) => t.path);
  if (actuals !== undefined) checkSameShape(baseline, actuals, 'series', (t) => t.series);
  const all = actuals === undefined ? [baseline, candidate] : [baseline, candidate, actuals];
  const series = byRole(
    all.map((t) => t.series),
    orderSeries,
  );
  const time = timeDictionary(
    all.map((t) => t.timestamp),
    all,
    'timestamp',
    timeFormat,
  );
  const origin =
    baseline.origin === null
      ? null
      : timeDictionary([baseline.origin, candidate.origin!], all, 'origin', timeFormat);
  const path =
    baseline.path === null
      ? null
      : byRole([baseline.path, candidate.path!], (columns) => orderPaths(columns as LabelColumn[]));
  return { series, time, horizons: orderHorizons([baseline, candidate]), origin, path };
}

/** Spreads per-column results (in baseline, candidate, actuals order) over the roles. */
function perRole<T>(list: readonly T[]): Record<TableRole, T | null> {
  return {
    baseline: list[0] ?? null,
    candidate: list[1] ?? null,
    actuals: list[2] ?? null,
  };
}

function byRole(
  columns: readonly (LabelColumn | null)[],
  order: (columns: readonly (LabelColumn | null)[]) => string[],
): LabelDictionary {
  const names = order(columns);
  const index = new Map<string, number>();
  names.forEach((name, id) => {
    index.set(name, id);
  });
  // A missing column is one implicit label, "".
  const ids = columns.map((column) =>
    Int32Array.from(column?.labels ?? [''], (label) => index.get(label)!),
  );
  return { names, ids: perRole(ids) };
}

function timeDictionary(
  columns: readonly LabelColumn[],
  tables: readonly ForecastTable[],
  what: string,
  format: TimeFormatName,
): TimeDictionary {
  const order = orderLabels(
    columns.map((column, i) => ({ file: tables[i]!.summary.path, column })),
    what,
    format,
  );
  return { order, ranks: perRole(order.ranks) };
}

function checkSameShape(
  a: ForecastTable,
  b: ForecastTable,
  what: string,
  pick: (t: ForecastTable) => LabelColumn | null,
): void {
  const ca = pick(a);
  const cb = pick(b);
  if ((ca === null) === (cb === null)) return;
  const [has, lacks] = ca === null ? [b, a] : [a, b];
  const column = (pick(has) as LabelColumn).column;
  throw new InputError(
    `this file has no ${what} column but ${has.summary.path} has one ("${column}"), so their keys cannot match`,
    { file: lacks.summary.path, line: 1, column },
  );
}

/** Union of series labels (a missing column is the label "") in code-unit order. */
function orderSeries(columns: readonly (LabelColumn | null)[]): string[] {
  const all = new Set<string>();
  for (const column of columns) for (const label of column?.labels ?? ['']) all.add(label);
  return [...all].sort(compareCodeUnits);
}

/**
 * Union of path labels, matched exactly (as series are); ordered numerically when every label is
 * a decimal number (ties between spellings of one number in code-unit order), else in code-unit
 * order.
 */
function orderPaths(columns: readonly LabelColumn[]): string[] {
  const all = new Set<string>();
  for (const column of columns) for (const label of column.labels) all.add(label);
  const names = [...all];
  const values = new Map<string, number>();
  for (const name of names) values.set(name, parseDecimal(name));
  const numeric = names.every((name) => !Number.isNaN(values.get(name)!));
  return names.sort(
    numeric
      ? (a, b) => values.get(a)! - values.get(b)! || compareCodeUnits(a, b)
      : compareCodeUnits,
  );
}

/** Horizons at most this large are ranked through a dense lookup table (the usual case). */
const DENSE_HORIZONS = 1 << 16;

function orderHorizons(tables: readonly ForecastTable[]): HorizonDictionary {
  let max = 1;
  for (const table of tables) {
    const h = table.horizon?.values;
    if (h !== undefined) for (let i = 0; i < h.length; i++) if (h[i]! > max) max = h[i]!;
  }
  if (max === 1) {
    // Every horizon is 1 (or there is no horizon column): rank 0 for all.
    return { values: [1], ranksOf: (_column, size) => new Int32Array(size) };
  }
  if (max <= DENSE_HORIZONS) {
    const rank = new Int32Array(max + 1).fill(-1);
    for (const table of tables) {
      const h = table.horizon?.values;
      if (h === undefined) rank[1] = 0;
      else for (let i = 0; i < h.length; i++) rank[h[i]!] = 0;
    }
    const values: number[] = [];
    for (let v = 1; v <= max; v++) if (rank[v] === 0) rank[v] = values.push(v) - 1;
    return {
      values,
      ranksOf: (column, size) => {
        const out = new Int32Array(size);
        if (column === null) return out.fill(rank[1]!);
        const h = column.values;
        for (let i = 0; i < size; i++) out[i] = rank[h[i]!]!;
        return out;
      },
    };
  }
  const seen = new Set<number>();
  for (const table of tables) {
    const h = table.horizon?.values;
    if (h === undefined) seen.add(1);
    else for (let i = 0; i < h.length; i++) seen.add(h[i]!);
  }
  const values = [...seen].sort((a, b) => a - b);
  const rank = new Map<number, number>();
  values.forEach((v, r) => {
    rank.set(v, r);
  });
  return {
    values,
    ranksOf: (column, size) => {
      const out = new Int32Array(size);
      if (column === null) return out.fill(rank.get(1)!);
      const h = column.values;
      for (let i = 0; i < size; i++) out[i] = rank.get(h[i]!)!;
      return out;
    },
  };
}
