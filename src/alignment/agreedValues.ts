import { InputError } from '../core/inputError.js';
import type { ForecastTable, ValueColumn } from '../reading/forecastTable.js';
import type { PanelRows } from './actualsJoin.js';
import { gatherRows } from './gatherRows.js';

/** The files of a comparison with the panel's row in each. */
export interface PanelSources {
  readonly baseline: ForecastTable;
  readonly candidate: ForecastTable;
  readonly actuals?: ForecastTable;
  readonly rows: PanelRows;
}

/**
 * The actual and the weight of each panel row, from every file that carries them, which must
 * agree exactly (as parsed numbers). Weights come from the actuals file, or from both predictions
 * files: a weight column in only one predictions file is refused, so one model cannot set the
 * weights. `describeRow` writes panel row p's key for messages.
 */
export function agreedActualAndWeight(
  sources: PanelSources,
  describeRow: (p: number) => string,
): { actual: Float64Array; weight: Float64Array | null } {
  const { baseline, candidate, actuals } = sources;
  const actual = agreedValues(
    valueSources(sources, (t) => t.actual),
    sources.rows.size,
    'actual',
    describeRow,
  );
  const weightSources = valueSources(sources, (t) => t.weight);
  if (weightSources.length === 0) return { actual, weight: null };
  const fromActuals = actuals !== undefined && actuals.weight !== null;
  if (!fromActuals && weightSources.length === 1) {
    const only = weightSources[0]!.table;
    const other = only === baseline ? candidate : baseline;
    throw new InputError(
      `only this file has a weight column (${other.summary.path} has none); weights must come from the actuals file or from both predictions files`,
      { file: only.summary.path, line: 1, column: weightSources[0]!.column.column },
    );
  }
  return {
    actual,
    weight: agreedValues(weightSources, sources.rows.size, 'weight', describeRow),
  };
}

interface ValueSource {
  readonly table: ForecastTable;
  readonly column: ValueColumn;
  /** Row in table for each panel row. */
  readonly rows: Int32Array;
}

/** The files that have the column, the actuals file first, then baseline and candidate. */
function valueSources(
  sources: PanelSources,
  pick: (t: ForecastTable) => ValueColumn | null,
): ValueSource[] {
  const { baseline, candidate, actuals, rows } = sources;
  const list: ValueSource[] = [];
  if (actuals !== undefined) {
    const column = pick(actuals);
    if (column !== null) list.push({ table: actuals, column, rows: rows.actuals });
  }
  const bc = pick(baseline);
  if (bc !== null) list.push({ table: baseline, column: bc, rows: rows.baseline });
  const cc = pick(candidate);
  if (cc !== null) list.push({ table: candidate, column: cc, rows: rows.candidate });
  return list;
}

/** The values of the first source, after checking that every other source agrees exactly. */
function agreedValues(
  sources: readonly ValueSource[],
  size: number,
  what: string,
  describeRow: (p: number) => string,
): Float64Array {
  const first = sources[0]!;
  const values = gatherRows(first.column.values, first.rows);
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
