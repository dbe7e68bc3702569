import { InputError } from '../core/inputError.js';
import type { ForecastTable } from '../reading/forecastTable.js';
import { keyCodes } from './keyCodes.js';
import { type KeyColumns, type KeyLayout, keyColumns } from './keyLayout.js';
import { KEY_EXAMPLES, type KeyMatch } from './mergeJoin.js';
import { type SortedKeys, sortKeys } from './sortedKeys.js';

/** The matched keys joined to a separate actuals file on (series, timestamp). */
export interface ActualsMatch {
  readonly keys: KeyColumns;
  /** Actuals row per matched key (index as in KeyMatch), −1 where the file has none. */
  readonly rows: Int32Array;
  readonly withoutActual: number;
  /** Up to KEY_EXAMPLES matched keys without an actual. */
  readonly withoutActualExamples: string[];
  /** Rows of the actuals file that no matched key uses. */
  readonly unused: number;
}

/**
 * Joins the matched keys (in key order) to the actuals file sorted on (series, timestamp): a
 * merge, since the matched keys are sorted by series and timestamp first. A key occurring twice
 * in the actuals file is refused. `describe` writes a matched baseline row's key.
 */
export function joinActuals(
  layout: KeyLayout,
  baseline: SortedKeys,
  match: KeyMatch,
  actuals: ForecastTable,
  describe: (row: number) => string,
): ActualsMatch {
  const keys = keyColumns(layout, actuals, 'actuals');
  const [bCodes, aCodes] = keyCodes(layout.actual, [baseline.keys, keys]);
  const { order: aOrder, sorted: aSorted } = sortKeys(
    layout,
    layout.actual,
    actuals,
    keys,
    aCodes!,
  );
  const rows = new Int32Array(match.matched).fill(-1);
  const used = new Uint8Array(actuals.size);
  const withoutActualExamples: string[] = [];
  let withoutActual = 0;
  let k = 0;
  for (let m = 0; m < match.matched; m++) {
    const b = match.baselineRows[m]!;
    const code = bCodes![b]!;
    while (k < aOrder.length && aSorted[k]! < code) k++;
    if (k < aOrder.length && aSorted[k] === code) {
      rows[m] = aOrder[k]!;
      used[aOrder[k]!] = 1;
    } else {
      withoutActual++;
      if (withoutActualExamples.length < KEY_EXAMPLES) withoutActualExamples.push(describe(b));
    }
  }
  let unused = 0;
  for (let r = 0; r < actuals.size; r++) if (used[r] === 0) unused++;
  return { keys, rows, withoutActual, withoutActualExamples, unused };
}

/** Without an actuals file, each predictions file must carry the actual values. */
export function checkActualColumns(baseline: ForecastTable, candidate: ForecastTable): void {
  for (const table of [baseline, candidate]) {
    if (table.actual === null) {
      throw new InputError(
        `no actual column and no separate actuals file: each predictions file must then carry the actual values`,
        { file: table.summary.path, line: 1, column: 'actual' },
      );
    }
  }
}

/** The panel's rows in each file: the matched keys that have an actual, in key order. */
export interface PanelRows {
  readonly size: number;
  readonly baseline: Int32Array;
  readonly candidate: Int32Array;
  /** Row in the actuals file (−1 everywhere when there is none). */
  readonly actuals: Int32Array;
}

export function panelRows(match: KeyMatch, actuals: ActualsMatch | null): PanelRows {
  if (actuals === null) {
    const size = match.matched;
    return {
      size,
      baseline: match.baselineRows,
      candidate: match.candidateRows,
      actuals: new Int32Array(size).fill(-1),
    };
  }
  const size = match.matched - actuals.withoutActual;
  const baseline = new Int32Array(size);
  const candidate = new Int32Array(size);
  const rows = new Int32Array(size);
  let p = 0;
  for (let m = 0; m < match.matched; m++) {
    const a = actuals.rows[m]!;
    if (a === -1) continue;
    baseline[p] = match.baselineRows[m]!;
    candidate[p] = match.candidateRows[m]!;
    rows[p] = a;
    p++;
  }
  return { size, baseline, candidate, actuals: rows };
}
