import { echo, InputError } from '../core/inputError.js';
import type { AlignedPanel, QuantileColumn } from '../core/panel.js';
import type { ForecastTable, LabelColumn, ValueColumn } from '../reading/forecastTable.js';
import { parseDecimal } from '../reading/numbers.js';
import { compareKeys, type KeyComponent, sortByKey } from './keyOrder.js';
import type { TimeFormatName } from './timeFormat.js';
import { compareCodeUnits, type LabelOrder, orderLabels } from './timeOrder.js';

export interface AlignInput {
  readonly baseline: ForecastTable;
  readonly candidate: ForecastTable;
  /** A separate actuals file keyed on (series, timestamp). */
  readonly actuals?: ForecastTable;
}

const EXAMPLES = 5;

export interface AlignHooks {
  /** Called as the steps finish, with the fraction of the work done (0..1); for long inputs. */
  readonly onProgress?: (fraction: number) => void;
  /** How timestamp and origin labels read (default auto: all numbers or all ISO 8601). */
  readonly timeFormat?: TimeFormatName;
}

/**
 * Matches baseline and candidate rows on the key (series, timestamp, horizon, origin, path) and
 * attaches the actual, never relying on file order. Origin and path are part of the key only when
 * the files have those columns (both predictions files alike, else an error); an actuals file is
 * keyed on (series, timestamp) alone. Pure: tables in, panel out, InputError on bad input.
 *
 * - Timestamps (and origins) are ordered by one kind decided over all files together (see
 *   orderLabels); the panel keeps, per time, the label as written (the smallest if several
 *   labels denote the same time).
 * - Duplicated keys within a file are errors naming both lines.
 * - Actuals come from the actuals file when there is one, else from both predictions files. Every
 *   file that carries an actual for a matched key must agree exactly (as parsed numbers).
 * - Weights come from the actuals file, or from both predictions files (which must agree); a
 *   weight column in only one predictions file is an error, so one model cannot set the weights.
 * - Only what both models provide is compared: the prediction when both have one, and the
 *   quantile levels they share (panel.quantileLevels says which were left out).
 * - Rows come out sorted by (series, timestamp, horizon, origin, path); ids are compact and
 *   sorted (series names in code-unit order, times in time order, paths numerically when all are
 *   numbers, else in code-unit order), so the panel does not depend on the order of rows in
 *   the files.
 */
export function alignPanel(input: AlignInput, hooks: AlignHooks = {}): AlignedPanel {
  const { baseline, candidate, actuals } = input;
  const progress = hooks.onProgress ?? (() => {});
  const bFile = baseline.summary.path;
  const cFile = candidate.summary.path;
  checkSameShape(baseline, candidate, 'series', (t) => t.series);
  checkSameShape(baseline, candidate, 'origin', (t) => t.origin);
  checkSameShape(baseline, candidate, 'path', (t) => t.path);
  if (actuals !== undefined) checkSameShape(baseline, actuals, 'series', (t) => t.series);
  const tables = actuals === undefined ? [baseline, candidate] : [baseline, candidate, actuals];

  // Global dictionaries over all files.
  const series = orderSeries(tables.map((t) => t.series));
  const timeFormat = hooks.timeFormat ?? 'auto';
  const time = orderLabels(
    tables.map((t) => ({ file: t.summary.path, column: t.timestamp })),
    'timestamp',
    timeFormat,
  );
  const hasOrigin = baseline.origin !== null;
  const origin: LabelOrder | null = hasOrigin
    ? orderLabels(
        [baseline, candidate].map((t) => ({ file: t.summary.path, column: t.origin! })),
        'origin',
        timeFormat,
      )
    : null;
  const hasPath = baseline.path !== null;
  const path = hasPath ? orderPaths([baseline.path!, candidate.path!]) : null;
  // Position of the optional components in a predictions key.
  const originAt = 3;
  const pathAt = hasOrigin ? 4 : 3;
  const horizons = orderHorizons([baseline, candidate]);
  progress(0.1);

  const keysOf = (table: ForecastTable, index: number, withHorizon: boolean): KeyComponent[] => {
    const n = table.size;
    const components: KeyComponent[] = [
      { values: mapIds(table.series, series.ids[index]!, n), cardinality: series.names.length },
      {
        values: mapIds(table.timestamp, time.ranks[index]!, n),
        cardinality: time.labels.length,
      },
    ];
    if (withHorizon) {
      const values = new Int32Array(n);
      const h = table.horizon?.values;
      if (h === undefined) values.fill(horizons.rankOf(1));
      else for (let i = 0; i < n; i++) values[i] = horizons.rankOf(h[i]!);
      components.push({ values, cardinality: horizons.values.length });
      if (origin !== null) {
        components.push({
          values: mapIds(table.origin, origin.ranks[index]!, n),
          cardinality: origin.labels.length,
        });
      }
      if (path !== null) {
        components.push({
          values: mapIds(table.path, path.ids[index]!, n),
          cardinality: path.names.length,
        });
      }
    }
    return components;
  };
  const bKeys = keysOf(baseline, 0, true);
  const cKeys = keysOf(candidate, 1, true);
  progress(0.2);
  const bOrder = sortByKey(baseline.size, bKeys);
  progress(0.3);
  const cOrder = sortByKey(candidate.size, cKeys);
  progress(0.4);

  const describeKey = (keys: readonly KeyComponent[], row: number, depth = keys.length): string => {
    const parts: string[] = [];
    if (baseline.series !== null) parts.push(`series=${series.names[keys[0]!.values[row]!]}`);
    parts.push(`timestamp=${time.labels[keys[1]!.values[row]!]}`);
    if (depth > 2) parts.push(`horizon=${horizons.values[keys[2]!.values[row]!]}`);
    if (depth > originAt && origin !== null) {
      parts.push(`origin=${origin.labels[keys[originAt]!.values[row]!]}`);
    }
    if (depth > pathAt && path !== null) {
      parts.push(`path=${path.names[keys[pathAt]!.values[row]!]}`);
    }
    return parts.map((part) => echo(part, 80)).join(' ');
  };
  const checkDuplicates = (table: ForecastTable, keys: KeyComponent[], order: Int32Array): void => {
    for (let i = 1; i < order.length; i++) {
      const a = order[i - 1]!;
      const b = order[i]!;
      if (compareKeys(keys, a, keys, b) === 0) {
        const first = Math.min(table.lines[a]!, table.lines[b]!);
        const second = Math.max(table.lines[a]!, table.lines[b]!);
        throw new InputError(
          `duplicated key ${describeKey(keys, a)}: lines ${first} and ${second} have the same key`,
          { file: table.summary.path, line: second, value: describeKey(keys, b) },
        );
      }
    }
  };
  checkDuplicates(baseline, bKeys, bOrder);
  checkDuplicates(candidate, cKeys, cOrder);
  progress(0.5);

  // Merge join of the two sorted key lists.
  let pairs = new Int32Array(Math.min(baseline.size, candidate.size) * 2);
  let matched = 0;
  let baselineOnly = 0;
  let candidateOnly = 0;
  const examples = { baselineOnly: [] as string[], candidateOnly: [] as string[] };
  {
    let i = 0;
    let j = 0;
    while (i < bOrder.length || j < cOrder.length) {
      const c =
        i >= bOrder.length
          ? 1
          : j >= cOrder.length
            ? -1
            : compareKeys(bKeys, bOrder[i]!, cKeys, cOrder[j]!);
      if (c === 0) {
        pairs[2 * matched] = bOrder[i++]!;
        pairs[2 * matched + 1] = cOrder[j++]!;
        matched++;
      } else if (c < 0) {
        if (baselineOnly++ < EXAMPLES) examples.baselineOnly.push(describeKey(bKeys, bOrder[i]!));
        i++;
      } else {
        if (candidateOnly++ < EXAMPLES) {
          examples.candidateOnly.push(describeKey(cKeys, cOrder[j]!));
        }
        j++;
      }
    }
  }
  if (matched === 0) {
    const eg = (list: string[]): string => (list.length > 0 ? ` (e.g. ${list[0]})` : '');
    throw new InputError(
      `${bFile} and ${cFile} have no key (series, timestamp, horizon${hasOrigin ? ', origin' : ''}${hasPath ? ', path' : ''}) in common: ${baseline.size} baseline rows${eg(examples.baselineOnly)}, ${candidate.size} candidate rows${eg(examples.candidateOnly)}`,
      { file: cFile },
    );
  }

  progress(0.6);

  // Actuals: from the actuals file (joined on series, timestamp) or from the predictions files.
  const actualRow = new Int32Array(matched).fill(-1);
  let withoutActual = 0;
  let actualsUnused = 0;
  const withoutActualExamples: string[] = [];
  if (actuals !== undefined) {
    const aKeys = keysOf(actuals, 2, false);
    const aOrder = sortByKey(actuals.size, aKeys);
    checkDuplicates(actuals, aKeys, aOrder);
    const used = new Uint8Array(actuals.size);
    let k = 0;
    for (let m = 0; m < matched; m++) {
      const b = pairs[2 * m]!;
      let c = 1;
      while (k < aOrder.length) {
        c = compareKeys(bKeys, b, aKeys, aOrder[k]!, 2);
        if (c <= 0) break;
        k++;
      }
      if (k < aOrder.length && c === 0) {
        actualRow[m] = aOrder[k]!;
        used[aOrder[k]!] = 1;
      } else {
        withoutActual++;
        if (withoutActualExamples.length < EXAMPLES) {
          withoutActualExamples.push(describeKey(bKeys, b));
        }
      }
    }
    for (let r = 0; r < actuals.size; r++) if (used[r] === 0) actualsUnused++;
  } else {
    for (const table of [baseline, candidate]) {
      if (table.actual === null) {
        throw new InputError(
          `no actual column and no separate actuals file: each predictions file must then carry the actual values`,
          { file: table.summary.path, line: 1, column: 'actual' },
        );
      }
    }
  }

  // The panel's rows: matched keys that have an actual.
  const size = matched - withoutActual;
  if (size === 0) {
    throw new InputError(
      `none of the ${matched} keys common to ${bFile} and ${cFile} has an actual value in this file`,
      { file: actuals!.summary.path },
    );
  }
  const bRows = new Int32Array(size);
  const cRows = new Int32Array(size);
  const aRows = new Int32Array(size);
  {
    let p = 0;
    for (let m = 0; m < matched; m++) {
      if (actuals !== undefined && actualRow[m] === -1) continue;
      bRows[p] = pairs[2 * m]!;
      cRows[p] = pairs[2 * m + 1]!;
      aRows[p] = actualRow[m]!;
      p++;
    }
  }
  pairs = new Int32Array(0);
  progress(0.7);

  const describeRow = (p: number): string => describeKey(bKeys, bRows[p]!);
  const sources = (pick: (t: ForecastTable) => ValueColumn | null): ValueSource[] => {
    const list: ValueSource[] = [];
    if (actuals !== undefined) {
      const column = pick(actuals);
      if (column !== null) list.push({ table: actuals, column, rows: aRows });
    }
    const bc = pick(baseline);
    if (bc !== null) list.push({ table: baseline, column: bc, rows: bRows });
    const cc = pick(candidate);
    if (cc !== null) list.push({ table: candidate, column: cc, rows: cRows });
    return list;
  };
  const actualSources = sources((t) => t.actual);
  const actual = agreedValues(actualSources, size, 'actual', describeRow);

  const weightSources = sources((t) => t.weight);
  let weight: Float64Array | null = null;
  if (weightSources.length > 0) {
    const fromActuals = actuals !== undefined && actuals.weight !== null;
    if (!fromActuals && weightSources.length === 1) {
      const only = weightSources[0]!.table;
      const other = only === baseline ? candidate : baseline;
      throw new InputError(
        `only this file has a weight column (${other.summary.path} has none); weights must come from the actuals file or from both predictions files`,
        { file: only.summary.path, line: 1, column: weightSources[0]!.column.column },
      );
    }
    weight = agreedValues(weightSources, size, 'weight', describeRow);
  }

  progress(0.8);

  // What the two models can be compared on.
  const bLevels = baseline.quantiles.map((q) => q.level);
  const cLevels = candidate.quantiles.map((q) => q.level);
  const common = bLevels.filter((l) => cLevels.includes(l));
  const bothPredict = baseline.prediction !== null && candidate.prediction !== null;
  if (!bothPredict && common.length === 0) {
    const offer = (t: ForecastTable): string =>
      [
        t.prediction === null ? '' : `point forecasts ("${t.prediction.column}")`,
        t.quantiles.length === 0 ? '' : `quantiles ${t.quantiles.map((q) => q.column).join(', ')}`,
      ]
        .filter((s) => s !== '')
        .join(' and ');
    throw new InputError(
      `nothing to compare: ${bFile} has ${offer(baseline)}, ${cFile} has ${offer(candidate)}`,
      { file: cFile, line: 1 },
    );
  }
  const forecasts = (table: ForecastTable, rows: Int32Array) => ({
    prediction: bothPredict ? gather(table.prediction!.values, rows) : null,
    quantiles: table.quantiles
      .filter((q) => common.includes(q.level))
      .map(
        (q): QuantileColumn => ({
          level: q.level,
          column: q.column,
          values: gather(q.values, rows),
        }),
      ),
  });

  // Compact ids to the values that occur in the panel.
  const seriesIds = compact(gather32(bKeys[0]!.values, bRows), series.names);
  const timeIds = compact(gather32(bKeys[1]!.values, bRows), time.labels);
  const timeInstants =
    time.instants === null
      ? null
      : Float64Array.from(timeIds.kept, (rank) => time.instants![rank]!);
  const horizon = new Int32Array(size);
  for (let p = 0; p < size; p++) horizon[p] = horizons.values[bKeys[2]!.values[bRows[p]!]!]!;
  const originIds =
    origin === null ? null : compact(gather32(bKeys[originAt]!.values, bRows), origin.labels);
  const pathIds =
    path === null ? null : compact(gather32(bKeys[pathAt]!.values, bRows), path.names);
  progress(1);

  return {
    size,
    series: seriesIds.ids,
    seriesNames: seriesIds.names,
    time: timeIds.ids,
    timestamps: timeIds.names,
    timestampKind: time.kind,
    timestampKindReason: time.reason,
    timeFormat: time.format,
    timeInstants,
    horizon,
    origin: originIds === null ? null : originIds.ids,
    origins: originIds === null ? [] : originIds.names,
    originKind: origin === null ? 'text' : origin.kind,
    path: pathIds === null ? null : pathIds.ids,
    paths: pathIds === null ? [] : pathIds.names,
    actual,
    actualSource:
      actuals === undefined
        ? { file: bFile, lines: gather32(baseline.lines, bRows) }
        : { file: actuals.summary.path, lines: gather32(actuals.lines, aRows) },
    baseline: forecasts(baseline, bRows),
    candidate: forecasts(candidate, cRows),
    weight,
    quantileLevels: {
      common,
      baselineOnly: bLevels.filter((l) => !cLevels.includes(l)),
      candidateOnly: cLevels.filter((l) => !bLevels.includes(l)),
    },
    coverage: {
      files: tables.map((t) => t.summary),
      rowsMatched: size,
      baselineOnly,
      candidateOnly,
      withoutActual,
      actualsUnused,
      examples: { ...examples, withoutActual: withoutActualExamples },
    },
  };
}

interface ValueSource {
  readonly table: ForecastTable;
  readonly column: ValueColumn;
  /** Row in table for each panel row. */
  readonly rows: Int32Array;
}

/** The values of the first source, after checking that every other source agrees exactly. */
function agreedValues(
  sources: readonly ValueSource[],
  size: number,
  what: string,
  describeRow: (p: number) => string,
): Float64Array {
  const first = sources[0]!;
  const values = gather(first.column.values, first.rows);
  for (let s = 1; s < sources.length; s++) {
    const other = sources[s]!;
    const v = other.column.values;
    const rows = other.rows;
    for (let p = 0; p < size; p++) {
      const mine = v[rows[p]!]!;
      const theirs = values[p]!;
      if (mine !== theirs) {
        const line = other.table.lines[rows[p]!]!;
        const firstLine = first.table.lines[first.rows[p]!]!;
        throw new InputError(
          `the ${what} differs between files for ${describeRow(p)}: ${theirs} in ${first.table.summary.path} line ${firstLine}, ${mine} in ${other.table.summary.path} line ${line}`,
          {
            file: other.table.summary.path,
            line,
            column: other.column.column,
            value: String(mine),
          },
        );
      }
    }
  }
  return values;
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

/** Union of series labels in code-unit order; per table, local id → global id. */
function orderSeries(columns: readonly (LabelColumn | null)[]): {
  names: string[];
  ids: Int32Array[];
} {
  const all = new Set<string>();
  for (const column of columns) for (const label of column?.labels ?? ['']) all.add(label);
  return numberLabels(columns, [...all].sort(compareCodeUnits));
}

/**
 * Union of path labels, matched exactly (as series are); ordered numerically when every label is
 * a decimal number (ties between spellings of one number in code-unit order), else in code-unit
 * order. Per table, local id → global id.
 */
function orderPaths(columns: readonly LabelColumn[]): { names: string[]; ids: Int32Array[] } {
  const all = new Set<string>();
  for (const column of columns) for (const label of column.labels) all.add(label);
  const names = [...all];
  const values = new Map<string, number>();
  for (const name of names) values.set(name, parseDecimal(name));
  const numeric = names.every((name) => !Number.isNaN(values.get(name)!));
  names.sort(
    numeric
      ? (a, b) => values.get(a)! - values.get(b)! || compareCodeUnits(a, b)
      : compareCodeUnits,
  );
  return numberLabels(columns, names);
}

/** Ids of sorted, distinct names; per column (a missing one is the label ""), local → global. */
function numberLabels(
  columns: readonly (LabelColumn | null)[],
  names: string[],
): { names: string[]; ids: Int32Array[] } {
  const index = new Map<string, number>();
  names.forEach((name, id) => {
    index.set(name, id);
  });
  const ids = columns.map((column) =>
    Int32Array.from(column?.labels ?? [''], (label) => index.get(label)!),
  );
  return { names, ids };
}

function orderHorizons(tables: readonly ForecastTable[]): {
  values: number[];
  rankOf: (horizon: number) => number;
} {
  let max = 1;
  for (const table of tables) {
    const h = table.horizon?.values;
    if (h !== undefined) for (let i = 0; i < h.length; i++) if (h[i]! > max) max = h[i]!;
  }
  if (max <= 1 << 16) {
    // Small horizons (the usual case): a dense lookup table.
    const rank = new Int32Array(max + 1).fill(-1);
    for (const table of tables) {
      const h = table.horizon?.values;
      if (h === undefined) rank[1] = 0;
      else for (let i = 0; i < h.length; i++) rank[h[i]!] = 0;
    }
    const values: number[] = [];
    for (let v = 1; v <= max; v++) if (rank[v] === 0) rank[v] = values.push(v) - 1;
    return { values, rankOf: (horizon) => rank[horizon]! };
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
  return { values, rankOf: (horizon) => rank.get(horizon)! };
}

/** Global id per row: map[local id], or map[0] for a missing column (one implicit label). */
function mapIds(column: LabelColumn | null, map: Int32Array, n: number): Int32Array {
  const out = new Int32Array(n);
  if (column === null) return out.fill(map[0]!);
  const ids = column.ids;
  for (let i = 0; i < n; i++) out[i] = map[ids[i]!]!;
  return out;
}

function gather(values: Float64Array, rows: Int32Array): Float64Array {
  const out = new Float64Array(rows.length);
  for (let p = 0; p < rows.length; p++) out[p] = values[rows[p]!]!;
  return out;
}

function gather32(values: Int32Array, rows: Int32Array): Int32Array {
  const out = new Int32Array(rows.length);
  for (let p = 0; p < rows.length; p++) out[p] = values[rows[p]!]!;
  return out;
}

/** Renumbers ids to 0..k−1 keeping their order, dropping ids that do not occur. */
function compact(
  ids: Int32Array,
  names: readonly string[],
): { ids: Int32Array; names: string[]; kept: number[] } {
  const remap = new Int32Array(names.length).fill(-1);
  for (let p = 0; p < ids.length; p++) remap[ids[p]!] = 0;
  const keptNames: string[] = [];
  const kept: number[] = [];
  for (let id = 0; id < names.length; id++) {
    if (remap[id] === 0) {
      remap[id] = keptNames.length;
      keptNames.push(names[id]!);
      kept.push(id);
    }
  }
  for (let p = 0; p < ids.length; p++) ids[p] = remap[ids[p]!]!;
  return { ids, names: keptNames, kept };
}
